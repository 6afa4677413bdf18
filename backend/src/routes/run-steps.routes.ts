import { z } from 'zod';

import { CompleteStepInputSchema, DeviceStampSchema, IdParamsSchema, IdSchema, StartTimerInputSchema, StepIdSchema, PERMISSIONS } from '@tracewright/shared';
import { StepNotDoneInputSchema, StopTimerInputSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { sendWrite, tabletWrite } from '../middleware/idempotency';
import * as steps from '../services/run-steps.service';
import * as timers from '../services/run-timers.service';
import { route, type RouteSpec } from './route-table';

const StepParamsSchema = z.object({ id: IdSchema, stepId: StepIdSchema });
const TimerParamsSchema = z.object({ id: IdSchema, timerId: IdSchema });

/** Tablet writes on a run's steps and timers; each may carry an Idempotency-Key. */
export function runStepRoutes(ctx: AppContext): RouteSpec[] {
  const at = (req: { params: unknown }) => StepParamsSchema.parse(req.params);
  return [
    route('post', '/api/runs/:id/steps/:stepId/acknowledge-safety', PERMISSIONS.workRuns, async (req, res) => {
      const { id, stepId } = at(req);
      sendWrite(res, await steps.acknowledgeSafety(ctx, tabletWrite(req), id, stepId, DeviceStampSchema.parse(req.body ?? {})));
    }),
    route('post', '/api/runs/:id/steps/:stepId/start', PERMISSIONS.workRuns, async (req, res) => {
      const { id, stepId } = at(req);
      sendWrite(res, await steps.startStep(ctx, tabletWrite(req), id, stepId, DeviceStampSchema.parse(req.body ?? {})));
    }),
    route('post', '/api/runs/:id/steps/:stepId/complete', PERMISSIONS.workRuns, async (req, res) => {
      const { id, stepId } = at(req);
      sendWrite(res, await steps.completeStep(ctx, tabletWrite(req), id, stepId, CompleteStepInputSchema.parse(req.body ?? {})));
    }),
    route('post', '/api/runs/:id/steps/:stepId/not-done', PERMISSIONS.workRuns, async (req, res) => {
      const { id, stepId } = at(req);
      sendWrite(res, await steps.markStepNotDone(ctx, tabletWrite(req), id, stepId, StepNotDoneInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/timers', PERMISSIONS.workRuns, async (req, res) => {
      const { id } = IdParamsSchema.parse(req.params);
      sendWrite(res, await timers.startTimer(ctx, tabletWrite(req), id, StartTimerInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/timers/:timerId/stop', PERMISSIONS.workRuns, async (req, res) => {
      const { id, timerId } = TimerParamsSchema.parse(req.params);
      sendWrite(res, await timers.stopTimer(ctx, tabletWrite(req), id, timerId, StopTimerInputSchema.parse(req.body ?? {})));
    }),
  ];
}
