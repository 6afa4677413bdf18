import { z } from 'zod';

import { ConfirmLotInputSchema, CorrectReadingInputSchema, CureLogInputSchema, IdParamsSchema, IdSchema, PERMISSIONS } from '@tracewright/shared';
import { NozzleCheckInputSchema, RecordReadingInputSchema, ReportProblemInputSchema } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { sendWrite, tabletWrite } from '../middleware/idempotency';
import { correctReading, recordReading } from '../services/run-readings.service';
import { reportProblem } from '../services/run-problems.service';
import { confirmLot, recordCureLog, recordNozzleCheck } from '../services/run-records.service';
import { route, type RouteSpec } from './route-table';

const ReadingParamsSchema = z.object({ id: IdSchema, readingId: IdSchema });

/** Tablet writes of what was measured, logged, confirmed and reported; each may carry an Idempotency-Key. */
export function runRecordRoutes(ctx: AppContext): RouteSpec[] {
  const idOf = (params: unknown) => IdParamsSchema.parse(params).id;
  return [
    route('post', '/api/runs/:id/readings', PERMISSIONS.workRuns, async (req, res) => {
      sendWrite(res, await recordReading(ctx, tabletWrite(req), idOf(req.params), RecordReadingInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/readings/:readingId/correct', PERMISSIONS.workRuns, async (req, res) => {
      const { id, readingId } = ReadingParamsSchema.parse(req.params);
      sendWrite(res, await correctReading(ctx, tabletWrite(req), id, readingId, CorrectReadingInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/cure-logs', PERMISSIONS.workRuns, async (req, res) => {
      sendWrite(res, await recordCureLog(ctx, tabletWrite(req), idOf(req.params), CureLogInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/lot-confirmations', PERMISSIONS.workRuns, async (req, res) => {
      sendWrite(res, await confirmLot(ctx, tabletWrite(req), idOf(req.params), ConfirmLotInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/nozzle-checks', PERMISSIONS.workRuns, async (req, res) => {
      sendWrite(res, await recordNozzleCheck(ctx, tabletWrite(req), idOf(req.params), NozzleCheckInputSchema.parse(req.body)));
    }),
    route('post', '/api/runs/:id/problems', PERMISSIONS.workRuns, async (req, res) => {
      sendWrite(res, await reportProblem(ctx, tabletWrite(req), idOf(req.params), ReportProblemInputSchema.parse(req.body)));
    }),
  ];
}
