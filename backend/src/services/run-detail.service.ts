import type { RunDetail } from '@tracewright/shared';
import { substitutedContent } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { notFound } from '../errors/app-error';
import { DeviationModel } from '../models/deviation.model';
import { RecipeVersionModel } from '../models/recipe-version.model';
import { RecipeModel } from '../models/recipe.model';
import { RunEquipmentModel } from '../models/run-equipment.model';
import { RunLotConfirmationModel } from '../models/run-lot-confirmation.model';
import { RunNozzleCheckModel } from '../models/run-nozzle-check.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import { RunStepRecordModel } from '../models/run-step-record.model';
import { RunTimerModel } from '../models/run-timer.model';
import { peopleNames, versionContent } from './recipe-dto';
import { loadReferences } from './recipe-references';
import { loadRun, substitutionsOf } from './run-content';
import { equipmentViews, instrumentChoices, lotViews } from './run-detail-parts';
import { toDeviationSummary, toReadingView, toStepRecordView, toTimerView } from './run-dto';
import { safetyNotesByStep } from './run-step-context';
import { runSummary } from './run-summary';

/** GET /api/runs/:id: everything the tablet needs to run, and to cache for working offline. */
export async function getRun(ctx: AppContext, id: number): Promise<RunDetail> {
  const run = await loadRun(id);
  const byRun = { where: { runId: id } };
  const [version, recipe, equipment, pieces, records, confirmations, checks, timers, readings, deviations] = await Promise.all([
    RecipeVersionModel.findByPk(run.versionId),
    RecipeModel.findByPk(run.recipeId),
    RunEquipmentModel.findAll(byRun),
    RunPieceModel.findAll({ ...byRun, order: [['number', 'ASC']] }),
    RunStepRecordModel.findAll(byRun),
    RunLotConfirmationModel.findAll({ ...byRun, order: [['id', 'ASC']] }),
    RunNozzleCheckModel.findAll(byRun),
    RunTimerModel.findAll({ ...byRun, order: [['id', 'ASC']] }),
    RunReadingModel.findAll({ ...byRun, order: [['recordedAt', 'ASC'], ['id', 'ASC']] }),
    DeviationModel.findAll({ ...byRun, order: [['id', 'ASC']] }),
  ]);
  if (!version || !recipe) throw notFound('Recipe version', run.versionId);
  // The operator follows the machines the run uses, so the content carries them in place.
  const content = substitutedContent(versionContent(version), substitutionsOf(equipment));
  const people = await peopleNames([
    run.createdBy,
    ...records.flatMap((r) => [r.safetyAcknowledgedBy, r.startedBy, r.completedBy]),
    ...timers.map((t) => t.startedBy),
    ...readings.map((r) => r.recordedBy),
    ...deviations.map((d) => d.createdBy),
  ]);
  const [refs, lots, machines, instruments] = await Promise.all([
    loadReferences(content),
    lotViews(ctx, id),
    equipmentViews(equipment),
    instrumentChoices(readings.map((r) => r.instrumentId)),
  ]);
  const recordOf = new Map(records.map((r) => [r.stepId, r]));
  const openDeviations = deviations.filter((d) => d.state !== 'closed').length;
  return {
    ...runSummary(run, recipe, version, content, { records, openByRun: new Map([[id, openDeviations]]) }, people),
    notes: run.notes,
    holdReason: run.holdReason ?? null,
    content,
    pieces: pieces.map((p) => ({ id: p.id, code: p.code, number: p.number })),
    lots,
    equipment: machines,
    steps: content.steps.flatMap((s) => {
      const record = recordOf.get(s.id);
      return record ? [toStepRecordView(record, people, confirmations, checks)] : [];
    }),
    timers: timers.map((t) => toTimerView(t, people)),
    readings: readings.map((r) => toReadingView(r, people)),
    deviations: deviations.map((d) => toDeviationSummary(d, people)),
    safetyNotes: safetyNotesByStep(content, refs),
    inks: refs.inks,
    instruments,
    serverTime: ctx.clock.now().toISOString(),
    travellerUrl: `${ctx.env.PUBLIC_URL}/run/${id}`,
  };
}
