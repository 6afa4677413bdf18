import type { ReportProblemInput } from '@tracewright/shared';

import { bodyRef, pathRef } from '../outbox/outbox-refs';
import type { WriteDraft } from '../outbox/outbox-types';

/** A record the server knows (its id) or one still in the outbox (the write that makes it). */
export type Target = number | string;

const idInPath = (target: Target) => (typeof target === 'number' ? String(target) : pathRef(target));
const idInBody = (target: Target) => (typeof target === 'number' ? target : bodyRef(target));

export type ReadingFields = {
  stepId: string;
  specId: string;
  pieceId: number | null;
  value: number;
  instrumentId: number | null;
  ambientTempC: number | null;
  confirmOutOfLimits: boolean;
};

/** The API's write paths and bodies (see the run routes), one builder per thing an operator does. */
export const writeDrafts = {
  acknowledgeSafety: (runId: number, stepId: string, noteCodes: string[]): WriteDraft => ({ runId, stepId, kind: 'acknowledge-safety', path: `/api/runs/${runId}/steps/${stepId}/acknowledge-safety`, body: { noteCodes } }),
  startStep: (runId: number, stepId: string): WriteDraft => ({ runId, stepId, kind: 'start-step', path: `/api/runs/${runId}/steps/${stepId}/start`, body: {} }),
  completeStep: (runId: number, stepId: string, note = ''): WriteDraft => ({ runId, stepId, kind: 'complete-step', path: `/api/runs/${runId}/steps/${stepId}/complete`, body: { note } }),
  stepNotDone: (runId: number, stepId: string, reason: string): WriteDraft => ({ runId, stepId, kind: 'step-not-done', path: `/api/runs/${runId}/steps/${stepId}/not-done`, body: { reason } }),
  startTimer: (runId: number, stepId: string, label: string, plannedSeconds: number): WriteDraft => ({ runId, stepId, kind: 'start-timer', path: `/api/runs/${runId}/timers`, body: { stepId, label, plannedSeconds } }),
  stopTimer: (runId: number, stepId: string, timer: Target, reason: string | null): WriteDraft => ({ runId, stepId, kind: 'stop-timer', path: `/api/runs/${runId}/timers/${idInPath(timer)}/stop`, body: { reason }, meta: { target: timer } }),
  recordReading: (runId: number, fields: ReadingFields, meta: Record<string, unknown>): WriteDraft => ({ runId, stepId: fields.stepId, kind: 'record-reading', path: `/api/runs/${runId}/readings`, body: { ...fields }, meta }),
  correctReading: (runId: number, stepId: string, reading: Target, value: number, reason: string, confirmOutOfLimits: boolean, meta: Record<string, unknown>): WriteDraft => ({
    runId,
    stepId,
    kind: 'correct-reading',
    path: `/api/runs/${runId}/readings/${idInPath(reading)}/correct`,
    body: { value, reason, confirmOutOfLimits },
    meta: { ...meta, target: reading },
  }),
  cureLog: (runId: number, stepId: string, samples: { minute: number; tempC: number }[]): WriteDraft => ({ runId, stepId, kind: 'cure-log', path: `/api/runs/${runId}/cure-logs`, body: { stepId, samples } }),
  confirmLot: (runId: number, stepId: string, lotId: number): WriteDraft => ({ runId, stepId, kind: 'confirm-lot', path: `/api/runs/${runId}/lot-confirmations`, body: { stepId, lotId } }),
  nozzleCheck: (runId: number, stepId: string, passed: boolean, photo: Target | null): WriteDraft => ({ runId, stepId, kind: 'nozzle-check', path: `/api/runs/${runId}/nozzle-checks`, body: { stepId, passed, photoFileId: photo === null ? null : idInBody(photo) } }),
  uploadPhoto: (runId: number, stepId: string | null, photo: Blob): WriteDraft => ({ runId, stepId, kind: 'upload-photo', path: '/api/files/photos', photo }),
  reportProblem: (runId: number, fields: { stepId: string | null; pieceIds: number[]; description: string; severity: ReportProblemInput['severity'] }, photos: Target[]): WriteDraft => ({
    runId,
    stepId: fields.stepId,
    kind: 'report-problem',
    path: `/api/runs/${runId}/problems`,
    body: { ...fields, photoFileIds: photos.map(idInBody) },
  }),
  holdRun: (runId: number, reason: string): WriteDraft => ({ runId, kind: 'hold-run', path: `/api/runs/${runId}/hold`, body: { reason } }),
  resumeRun: (runId: number, reason: string): WriteDraft => ({ runId, kind: 'resume-run', path: `/api/runs/${runId}/resume`, body: { reason } }),
};
