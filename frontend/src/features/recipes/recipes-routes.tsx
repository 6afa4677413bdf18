import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';
import { recipeBuilderLoader } from './routes/recipe-builder-loader';
import { recipeLatestLoader } from './routes/recipe-latest-loader';
import { recipesLoader } from './routes/recipes-loader';
import { RecipesPage } from './routes/recipes-page';

/**
 * Recipes: the list, and the builder for one version (which is also where quality reviews and
 * releases). Everyone signed in reads; the builder decides what each role may change. The
 * builder is loaded lazily, so drag-and-drop code comes only with it.
 */
export function recipesRoutes(queryClient: QueryClient, _guarded: Guard): RouteObject[] {
  return [
    { path: 'recipes', loader: recipesLoader(queryClient), Component: RecipesPage },
    { path: 'recipes/:recipeId', loader: recipeLatestLoader(queryClient) },
    {
      path: 'recipes/:recipeId/versions/:versionId',
      loader: recipeBuilderLoader(queryClient),
      lazy: async () => {
        const { RecipeBuilderPage } = await import('./routes/recipe-builder-page');
        return { Component: RecipeBuilderPage };
      },
    },
  ];
}
