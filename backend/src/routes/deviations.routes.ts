import { AssignDeviationInputSchema, CloseDeviationInputSchema, CommentInputSchema, DeviationQuerySchema, DispositionInputSchema, IdParamsSchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { signatureLimiter } from '../middleware/rate-limits';
import { closeDeviation } from '../services/deviation-close.service';
import { getDeviation } from '../services/deviation-detail.service';
import { sendDeviationDigest } from '../services/deviation-digest.service';
import { dispositionDeviation } from '../services/deviation-disposition.service';
import { listAssignees, listOperators } from '../services/deviation-people';
import { listDeviations } from '../services/deviation-queue.service';
import { assignDeviation, commentOnDeviation } from '../services/deviation-review.service';
import { route, type RouteSpec } from './route-table';

export function deviationRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  return [
    route('get', '/api/deviations', PERMISSIONS.readQuality, async (req, res) => {
      res.json(await listDeviations(ctx, DeviationQuerySchema.parse(req.query)));
    }),
    // Declared before /:id, which would otherwise take these names for ids.
    route('get', '/api/deviations/assignees', PERMISSIONS.readQuality, async (_req, res) => {
      res.json(await listAssignees());
    }),
    route('get', '/api/deviations/operators', PERMISSIONS.readQuality, async (_req, res) => {
      res.json(await listOperators(ctx));
    }),
    route('post', '/api/deviations/digest', PERMISSIONS.sendDigest, async (req, res) => {
      res.json(await sendDeviationDigest(ctx, currentUser(req).id));
    }),
    route('get', '/api/deviations/:id', PERMISSIONS.readQuality, async (req, res) => {
      res.json(await getDeviation(ctx, idOf(req.params)));
    }),
    route('post', '/api/deviations/:id/assign', PERMISSIONS.decideQuality, async (req, res) => {
      res.json(await assignDeviation(ctx, currentUser(req), idOf(req.params), AssignDeviationInputSchema.parse(req.body)));
    }),
    route('post', '/api/deviations/:id/comments', PERMISSIONS.decideQuality, async (req, res) => {
      res.status(201).json(await commentOnDeviation(ctx, currentUser(req), idOf(req.params), CommentInputSchema.parse(req.body)));
    }),
    route('post', '/api/deviations/:id/disposition', PERMISSIONS.decideQuality, async (req, res) => {
      const input = DispositionInputSchema.parse(req.body);
      res.json(await dispositionDeviation(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
    route('post', '/api/deviations/:id/close', PERMISSIONS.decideQuality, async (req, res) => {
      const input = CloseDeviationInputSchema.parse(req.body);
      res.json(await closeDeviation(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
  ];
}
