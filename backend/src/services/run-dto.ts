import type { DeviationSummary, ReadingView, StepRecordView, TimerView } from '@tracewright/shared';

import type { DeviationModel } from '../models/deviation.model';
import type { RunLotConfirmationModel } from '../models/run-lot-confirmation.model';
import type { RunNozzleCheckModel } from '../models/run-nozzle-check.model';
import type { RunReadingModel } from '../models/run-reading.model';
import type { RunStepRecordModel } from '../models/run-step-record.model';
import type { RunTimerModel } from '../models/run-timer.model';
import type { RunModel } from '../models/run.model';
import { deviationFacts } from './deviation-record';
import { personRef } from './recipe-dto';

export type People = Map<number, string>;

const iso = (d: Date | null | undefined) => (d ? d.toISOString() : null);

/** The run as the audit trail keeps it (before/after of state changes). */
export const runRecord = (row: RunModel) => ({
  id: row.id,
  code: row.code,
  versionId: row.versionId,
  state: row.state,
  quantity: row.quantity,
  dueOn: row.dueOn,
  holdReason: row.holdReason ?? null,
  version: row.version,
});

/** A step record with the lots confirmed at it and its latest nozzle check. */
export function toStepRecordView(
  row: RunStepRecordModel,
  people: People,
  confirmations: ReadonlyArray<Pick<RunLotConfirmationModel, 'stepId' | 'lotId'>>,
  nozzleChecks: ReadonlyArray<Pick<RunNozzleCheckModel, 'id' | 'stepId' | 'passed' | 'photoFileId' | 'checkedAt'>>,
): StepRecordView {
  const latestCheck = nozzleChecks.filter((c) => c.stepId === row.stepId).sort((a, b) => b.id - a.id)[0];
  return {
    stepId: row.stepId,
    state: row.state,
    safetyAcknowledgedAt: iso(row.safetyAcknowledgedAt),
    safetyAcknowledgedBy: personRef(people, row.safetyAcknowledgedBy),
    startedAt: iso(row.startedAt),
    startedBy: personRef(people, row.startedBy),
    completedAt: iso(row.completedAt),
    completedBy: personRef(people, row.completedBy),
    notDoneReason: row.notDoneReason ?? null,
    note: row.note ?? '',
    confirmedLotIds: confirmations.filter((c) => c.stepId === row.stepId).map((c) => c.lotId),
    nozzleCheck: latestCheck ? { passed: Boolean(latestCheck.passed), photoFileId: latestCheck.photoFileId, at: latestCheck.checkedAt.toISOString() } : null,
    hasDeviceTime: Boolean(row.hasDeviceTime),
  };
}

export const toTimerView = (row: RunTimerModel, people: People): TimerView => ({
  id: row.id,
  stepId: row.stepId,
  label: row.label,
  plannedSeconds: row.plannedSeconds,
  startedAt: row.startedAt.toISOString(),
  stoppedAt: iso(row.stoppedAt),
  startedOnDeviceClock: Boolean(row.startedOnDeviceClock),
  startedBy: personRef(people, row.startedBy),
});

export const toReadingView = (row: RunReadingModel, people: People): ReadingView => ({
  id: row.id,
  stepId: row.stepId,
  specId: row.specId,
  pieceId: row.pieceId,
  value: row.value,
  unit: row.unit,
  correctedValue: row.correctedValue,
  ambientTempC: row.ambientTempC,
  instrumentId: row.instrumentId,
  outOfLimits: Boolean(row.outOfLimits),
  recordedAt: row.recordedAt.toISOString(),
  recordedBy: personRef(people, row.recordedBy),
  supersededById: row.supersededById ?? null,
  correctionReason: row.correctionReason ?? null,
});

export const toDeviationSummary = (row: DeviationModel, people: People): DeviationSummary => ({
  ...deviationFacts(row),
  createdAt: row.createdAt.toISOString(),
  createdBy: personRef(people, row.createdBy),
});
