import { IdParamsSchema, SaveDraftInputSchema, PERMISSIONS } from '@tracewright/shared';
import { SendBackInputSchema, VersionDiffQuerySchema } from '@tracewright/shared';
import { ReleaseVersionInputSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { signatureLimiter } from '../middleware/rate-limits';
import * as review from '../services/recipe-review.service';
import * as versions from '../services/recipe-version.service';
import { route, type RouteSpec } from './route-table';

export function recipeVersionRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  return [
    route('get', '/api/recipe-versions/:id', 'signed-in', async (req, res) => {
      res.json(await versions.getVersion(idOf(req.params)));
    }),
    route('put', '/api/recipe-versions/:id', PERMISSIONS.authorRecipes, async (req, res) => {
      res.json(await versions.saveDraft(ctx, currentUser(req), idOf(req.params), SaveDraftInputSchema.parse(req.body)));
    }),
    route('get', '/api/recipe-versions/:id/diff', 'signed-in', async (req, res) => {
      res.json(await versions.diffVersions(idOf(req.params), VersionDiffQuerySchema.parse(req.query).against));
    }),
    route('post', '/api/recipe-versions/:id/submit', PERMISSIONS.authorRecipes, async (req, res) => {
      res.json(await review.submitVersion(ctx, currentUser(req), idOf(req.params)));
    }),
    route('post', '/api/recipe-versions/:id/release', PERMISSIONS.reviewRecipes, async (req, res) => {
      const input = ReleaseVersionInputSchema.parse(req.body);
      res.json(await review.releaseVersion(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
    route('post', '/api/recipe-versions/:id/send-back', PERMISSIONS.reviewRecipes, async (req, res) => {
      res.json(await review.sendBackVersion(ctx, currentUser(req), idOf(req.params), SendBackInputSchema.parse(req.body)));
    }),
  ];
}
