import { IdParamsSchema, PlanRunInputSchema, RunStateChangeSchema, PERMISSIONS } from '@tracewright/shared';
import { RunListQuerySchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { currentUser } from '../middleware/authenticate';
import { getRun } from '../services/run-detail.service';
import { listRuns } from '../services/run-list.service';
import { planRun } from '../services/run-planning.service';
import { exportReadings } from '../services/run-readings-export';
import { changeRunState, type RunStateAction } from '../services/run-state.service';
import { route, type RouteSpec } from './route-table';

export function runRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  const stateChange = (action: RunStateAction) =>
    route('post', `/api/runs/:id/${action}`, PERMISSIONS.planRuns, async (req, res) => {
      const { reason } = RunStateChangeSchema.parse(req.body);
      res.json(await changeRunState(ctx, currentUser(req), idOf(req.params), action, reason));
    });
  return [
    route('get', '/api/runs', 'signed-in', async (req, res) => {
      res.json(await listRuns(RunListQuerySchema.parse(req.query)));
    }),
    route('post', '/api/runs', PERMISSIONS.planRuns, async (req, res) => {
      res.status(201).json(await planRun(ctx, currentUser(req), PlanRunInputSchema.parse(req.body)));
    }),
    route('get', '/api/runs/:id', 'signed-in', async (req, res) => {
      res.json(await getRun(ctx, idOf(req.params)));
    }),
    stateChange('hold'),
    stateChange('resume'),
    stateChange('cancel'),
    route('get', '/api/runs/:id/readings.csv', 'signed-in', async (req, res) => {
      const { filename, csv } = await exportReadings(idOf(req.params));
      // Run codes are R-year-sequence, so the quoted name needs no escaping.
      res.set('Content-Disposition', `attachment; filename="${filename}"`).type('text/csv; charset=utf-8').send(csv);
    }),
  ];
}
