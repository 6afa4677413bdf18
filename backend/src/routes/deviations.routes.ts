import { AssignDeviationInputSchema, CloseDeviationInputSchema, CommentInputSchema, DeviationQuerySchema, DispositionInputSchema, IdParamsSchema, type Role } from '@tracewright/shared';

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

/** Who reads deviations, trends and the quality dashboard: engineers learn from them, admins oversee. */
export const QUALITY_READERS: readonly Role[] = ['admin', 'engineer', 'quality'];

/** "Quality dispositions deviations": only quality assigns, comments, dispositions, closes and curates trends. */
export const QUALITY_WRITERS: readonly Role[] = ['quality'];

export function deviationRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  return [
    route('get', '/api/deviations', QUALITY_READERS, async (req, res) => {
      res.json(await listDeviations(ctx, DeviationQuerySchema.parse(req.query)));
    }),
    // Declared before /:id, which would otherwise take these names for ids.
    route('get', '/api/deviations/assignees', QUALITY_READERS, async (_req, res) => {
      res.json(await listAssignees());
    }),
    route('get', '/api/deviations/operators', QUALITY_READERS, async (_req, res) => {
      res.json(await listOperators(ctx));
    }),
    route('post', '/api/deviations/digest', ['admin', 'quality'], async (req, res) => {
      res.json(await sendDeviationDigest(ctx, currentUser(req).id));
    }),
    route('get', '/api/deviations/:id', QUALITY_READERS, async (req, res) => {
      res.json(await getDeviation(ctx, idOf(req.params)));
    }),
    route('post', '/api/deviations/:id/assign', QUALITY_WRITERS, async (req, res) => {
      res.json(await assignDeviation(ctx, currentUser(req), idOf(req.params), AssignDeviationInputSchema.parse(req.body)));
    }),
    route('post', '/api/deviations/:id/comments', QUALITY_WRITERS, async (req, res) => {
      res.status(201).json(await commentOnDeviation(ctx, currentUser(req), idOf(req.params), CommentInputSchema.parse(req.body)));
    }),
    route('post', '/api/deviations/:id/disposition', QUALITY_WRITERS, async (req, res) => {
      const input = DispositionInputSchema.parse(req.body);
      res.json(await dispositionDeviation(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
    route('post', '/api/deviations/:id/close', QUALITY_WRITERS, async (req, res) => {
      const input = CloseDeviationInputSchema.parse(req.body);
      res.json(await closeDeviation(ctx, currentUser(req), idOf(req.params), input, req.ip ?? null));
    }, [signatureLimiter(ctx)]),
  ];
}
