import { IdParamsSchema, RunSignOffInputSchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { signatureLimiter } from '../middleware/rate-limits';
import { getRunSignOff, signOffRun } from '../services/run-sign-off.service';
import { route, type RouteSpec } from './route-table';

/**
 * A run's sign-off. RunDetail has no field for it (its shape is shared with the tablet), so the
 * printable record reads the signature here; whoever may read the run may read its sign-off.
 */
export function runSignOffRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  return [
    route('get', '/api/runs/:id/sign-off', 'signed-in', async (req, res) => {
      res.json(await getRunSignOff(idOf(req.params)));
    }),
    route('post', '/api/runs/:id/sign-off', PERMISSIONS.decideQuality, async (req, res) => {
      const input = RunSignOffInputSchema.parse(req.body);
      res.json(await signOffRun(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
  ];
}
