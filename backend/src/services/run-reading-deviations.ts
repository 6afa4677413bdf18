import { deviationDraft, equipmentChoiceIssues, type DeviationSummary, type ReadingEvaluation, type ReadingSpec } from '@tracewright/shared';

import type { InstrumentModel } from '../models/instrument.model';
import type { RunPieceModel } from '../models/run-piece.model';
import type { RunReadingModel } from '../models/run-reading.model';
import { hasDeviationFor, raiseDeviation } from './deviation.service';
import type { StepAt } from './run-content';
import type { RunScope } from './run-write';

export interface TakenReading {
  at: StepAt;
  spec: ReadingSpec;
  reading: RunReadingModel;
  evaluation: ReadingEvaluation;
  piece: RunPieceModel | null;
  instrument: InstrumentModel | null;
}

/**
 * The deviations a stored reading raises: out of limits (it was confirmed to get here), and a
 * meter past its calibration date (shared equipmentChoiceIssues), once per meter per run: the
 * first reading says it, the rest would repeat it.
 */
export async function readingDeviations(scope: RunScope, taken: TakenReading): Promise<DeviationSummary[]> {
  const { at, spec, reading, evaluation, piece, instrument } = taken;
  const raise = (draft: ReturnType<typeof deviationDraft>, source: { type: string; id: number }) =>
    raiseDeviation(scope.ctx, scope.actor, scope.run.id, draft, { stepId: at.step.id, pieceIds: piece ? [piece.id] : [], source }, scope.transaction);
  const raised: DeviationSummary[] = [];
  if (evaluation.outOfLimits) {
    const context = { step: at.ref, spec, value: reading.value, correctedValue: evaluation.correctedValue, correctedTo: evaluation.correctedTo, pieceCode: piece?.code ?? null };
    raised.push(await raise(deviationDraft('reading-out-of-limits', context), { type: 'reading', id: reading.id }));
  }
  if (instrument) {
    const overdue = equipmentChoiceIssues([{ kind: 'instrument', id: instrument.id, name: instrument.name, calibrationDueOn: instrument.calibrationDueOn }], scope.today);
    const source = { type: 'instrument', id: instrument.id };
    if (overdue.length > 0 && !(await hasDeviationFor(scope.run.id, 'calibration-overdue', source, scope.transaction))) {
      const context = { equipmentName: instrument.name, dueOn: instrument.calibrationDueOn as string, usedOn: scope.today };
      raised.push(await raise(deviationDraft('calibration-overdue', context), source));
    }
  }
  return raised;
}
