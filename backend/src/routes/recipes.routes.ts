import { CatalogueQuerySchema, IdParamsSchema, RecipeInputSchema, PERMISSIONS } from '@tracewright/shared';
import { NewVersionInputSchema, RecipeUpdateSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { startNewVersion } from '../services/recipe-version.service';
import * as recipes from '../services/recipe.service';
import { route, type RouteSpec } from './route-table';

export function recipeRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/recipes', 'signed-in', async (req, res) => {
      res.json({ recipes: await recipes.listRecipes(CatalogueQuerySchema.parse(req.query)) });
    }),
    route('post', '/api/recipes', PERMISSIONS.authorRecipes, async (req, res) => {
      res.status(201).json(await recipes.createRecipe(ctx, currentUser(req), RecipeInputSchema.parse(req.body)));
    }),
    route('get', '/api/recipes/:id', 'signed-in', async (req, res) => {
      res.json(await recipes.getRecipe(IdParamsSchema.parse(req.params).id));
    }),
    route('put', '/api/recipes/:id', PERMISSIONS.authorRecipes, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      res.json(await recipes.updateRecipe(ctx, currentUser(req), id, RecipeUpdateSchema.parse(req.body)));
    }),
    route('post', '/api/recipes/:id/versions', PERMISSIONS.authorRecipes, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      // A bare POST (no body) copies the released version.
      res.status(201).json(await startNewVersion(ctx, currentUser(req), id, NewVersionInputSchema.parse(req.body ?? {})));
    }),
  ];
}
