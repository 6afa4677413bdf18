import type { DeviationSummary, ReadingView, RunDetail, StepRecordView, TimerView } from '@tracewright/shared';

/** A timer as the bench sees it: from the server, or started here and not yet sent. */
export type BenchTimer = TimerView & {
  /** The outbox write that started it, while the tablet still knows it. */
  localRef: string | null;
  /** Stable across the send: what an acknowledged alarm is remembered by. */
  alarmKey: string;
  isPending: boolean;
};

export type BenchReading = ReadingView & { localRef: string | null; isPending: boolean };

export type BenchDeviation = DeviationSummary & { isPending: boolean };

/** The run with the outbox's waiting writes already applied: what the operator sees. */
export type BenchRun = Omit<RunDetail, 'timers' | 'readings' | 'deviations'> & {
  timers: BenchTimer[];
  readings: BenchReading[];
  deviations: BenchDeviation[];
};

/** A step's record, or the blank one a step has before anyone touched it. */
export function recordOf(run: Pick<RunDetail, 'steps'>, stepId: string): StepRecordView {
  return (
    run.steps.find((r) => r.stepId === stepId) ?? {
      stepId,
      state: 'pending',
      safetyAcknowledgedAt: null,
      safetyAcknowledgedBy: null,
      startedAt: null,
      startedBy: null,
      completedAt: null,
      completedBy: null,
      notDoneReason: null,
      note: '',
      confirmedLotIds: [],
      nozzleCheck: null,
      hasDeviceTime: false,
    }
  );
}
