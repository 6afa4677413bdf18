import type { z } from 'zod';

import { evaluateReading, type ReadingEvaluation, type ReadingSpec, type RecordReadingInput } from '@tracewright/shared';
import type { CorrectReadingInputSchema } from '@tracewright/shared';
import type { ReadingWriteResult } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { badRequest, conflict, notFound, unprocessable } from '../errors/app-error';
import { InstrumentModel } from '../models/instrument.model';
import { RunPieceModel } from '../models/run-piece.model';
import { RunReadingModel } from '../models/run-reading.model';
import type { TabletWrite, WriteResult } from './idempotency.service';
import { peopleNames } from './recipe-dto';
import { loadReferences } from './recipe-references';
import { stampedTime } from './run-clock';
import { stepAt, type StepAt } from './run-content';
import { toReadingView } from './run-dto';
import { readingDeviations } from './run-reading-deviations';
import { conductorAt } from './run-step-context';
import { auditRun, noteDeviceTime, runWrite, type RunScope } from './run-write';

function specAt(at: StepAt, specId: string): ReadingSpec {
  const spec = at.step.readingSpecs.find((s) => s.id === specId);
  if (!spec) throw notFound(`Reading “${specId}” in step ${at.ref.number} “${at.ref.title}”`);
  return spec;
}

/**
 * Judges a value with the shared rule; resistance is corrected to 20 °C with the TCR of the
 * conductor the step measures. Out of limits and not confirmed: 422 with the evaluation, and
 * nothing is stored (the tablet shows it and asks the operator to confirm or re-measure).
 */
async function judge(scope: RunScope, at: StepAt, spec: ReadingSpec, value: number, ambientTempC: number | null, isConfirmed: boolean): Promise<ReadingEvaluation> {
  const { inks } = await loadReferences(scope.content, scope.transaction);
  const evaluation = evaluateReading(spec, value, { ambientTempC, tcrPerK: conductorAt(scope.content, at.index, inks)?.tcrPerK ?? null });
  if (evaluation.outOfLimits && !isConfirmed) {
    throw unprocessable(`${evaluation.message} Measure again, or confirm to record it out of limits (that opens a deviation).`, { evaluation });
  }
  return evaluation;
}

async function result(scope: RunScope, reading: RunReadingModel, superseded: RunReadingModel | null, evaluation: ReadingEvaluation, deviations: ReadingWriteResult['deviations']): Promise<ReadingWriteResult> {
  const people = await peopleNames([reading.recordedBy, superseded?.recordedBy], scope.transaction);
  const view = (row: RunReadingModel) => toReadingView(row, people);
  return { runId: scope.run.id, runState: scope.run.state, deviations, reading: view(reading), superseded: superseded ? view(superseded) : null, evaluation };
}

async function pieceOf(scope: RunScope, spec: ReadingSpec, pieceId: number | null): Promise<RunPieceModel | null> {
  if (pieceId === null) {
    if (!spec.perPiece) return null;
    const message = `${spec.name} is taken on each piece: say which piece this reading is for.`;
    throw badRequest(message, { formErrors: [], fieldErrors: { pieceId: [message] } });
  }
  const piece = await RunPieceModel.findOne({ where: { id: pieceId, runId: scope.run.id }, transaction: scope.transaction });
  if (!piece) throw notFound(`Piece ${pieceId} of run ${scope.run.code}`);
  return piece;
}

async function instrumentOf(scope: RunScope, instrumentId: number | null): Promise<InstrumentModel | null> {
  if (instrumentId === null) return null;
  const instrument = await InstrumentModel.findByPk(instrumentId, { transaction: scope.transaction });
  if (!instrument) throw notFound('Instrument', instrumentId);
  return instrument;
}

/** Records a reading against a spec of a step; out of limits (confirmed) or a meter past calibration raise deviations. */
export function recordReading(ctx: AppContext, write: TabletWrite, runId: number, input: RecordReadingInput): Promise<WriteResult<ReadingWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const at = stepAt(scope.content, scope.run, input.stepId);
    const spec = specAt(at, input.specId);
    const piece = await pieceOf(scope, spec, input.pieceId);
    const instrument = await instrumentOf(scope, input.instrumentId);
    const evaluation = await judge(scope, at, spec, input.value, input.ambientTempC, input.confirmOutOfLimits);
    const time = stampedTime(ctx, input);
    const reading = await RunReadingModel.create(
      {
        runId: scope.run.id, stepId: at.step.id, specId: spec.id, pieceId: piece?.id ?? null, value: input.value, unit: spec.unit,
        correctedValue: evaluation.correctedValue, ambientTempC: input.ambientTempC, instrumentId: instrument?.id ?? null, outOfLimits: evaluation.outOfLimits,
        recordedBy: scope.actor.id, recordedAt: time.at, deviceTime: time.deviceTime, madeOffline: input.madeOffline,
      },
      { transaction: scope.transaction },
    );
    await noteDeviceTime(scope, at.step.id, time);
    await auditRun(scope, { action: 'run-reading.recorded', entityType: 'run-reading', entityId: reading.id, after: { runId: scope.run.id, ...toReadingView(reading, new Map()), evaluation } });
    const deviations = await readingDeviations(scope, { at, spec, reading, evaluation, piece, instrument });
    return result(scope, reading, null, evaluation, deviations);
  });
}

/**
 * Corrects a reading: the new value is a new row; the original stays as it was taken and only
 * learns which row replaced it and why. Only the latest value of a reading can be corrected.
 */
export function correctReading(ctx: AppContext, write: TabletWrite, runId: number, readingId: number, input: z.infer<typeof CorrectReadingInputSchema>): Promise<WriteResult<ReadingWriteResult>> {
  return runWrite(ctx, write, runId, 201, async (scope) => {
    const { transaction } = scope;
    const original = await RunReadingModel.findOne({ where: { id: readingId, runId: scope.run.id }, transaction, lock: transaction.LOCK.UPDATE });
    if (!original) throw notFound(`Reading ${readingId} of run ${scope.run.code}`);
    if (original.supersededById !== null) {
      throw conflict(`Reading ${readingId} was already corrected by reading ${original.supersededById}; correct that one instead.`, { supersededById: original.supersededById });
    }
    const at = stepAt(scope.content, scope.run, original.stepId);
    const spec = specAt(at, original.specId);
    const evaluation = await judge(scope, at, spec, input.value, original.ambientTempC, input.confirmOutOfLimits);
    const time = stampedTime(ctx, input);
    const { id: _id, supersededById: _s, correctionReason: _c, ...kept } = original.get({ plain: true });
    const reading = await RunReadingModel.create(
      { ...kept, value: input.value, correctedValue: evaluation.correctedValue, outOfLimits: evaluation.outOfLimits, correctionReason: input.reason, recordedBy: scope.actor.id, recordedAt: time.at, deviceTime: time.deviceTime, madeOffline: input.madeOffline },
      { transaction },
    );
    const before = toReadingView(original, new Map());
    await original.update({ supersededById: reading.id, correctionReason: input.reason }, { transaction });
    await noteDeviceTime(scope, at.step.id, time);
    await auditRun(scope, { action: 'run-reading.corrected', entityType: 'run-reading', entityId: original.id, before, after: { runId: scope.run.id, replacedBy: toReadingView(reading, new Map()), evaluation }, reason: input.reason });
    const [piece, instrument] = await Promise.all([
      original.pieceId === null ? null : RunPieceModel.findByPk(original.pieceId, { transaction }),
      instrumentOf(scope, original.instrumentId),
    ]);
    const deviations = await readingDeviations(scope, { at, spec, reading, evaluation, piece, instrument });
    return result(scope, reading, original, evaluation, deviations);
  });
}
