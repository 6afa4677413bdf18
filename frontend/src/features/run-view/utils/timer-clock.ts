import { timerRemainingSeconds } from '@tracewright/shared';

import type { BenchTimer } from './bench-run';

type ClockTimer = Pick<BenchTimer, 'startedAt' | 'stoppedAt' | 'plannedSeconds' | 'startedOnDeviceClock'>;

/**
 * "Now" on the clock a timer was started by: the server's (the tablet's clock plus the measured
 * offset), or this tablet's own for a timer started offline.
 */
export function timerNow(timer: Pick<ClockTimer, 'startedOnDeviceClock'>, deviceNowMs: number, clockOffsetMs: number): Date {
  return new Date(deviceNowMs + (timer.startedOnDeviceClock ? 0 : clockOffsetMs));
}

/** Seconds left (negative: over) by the shared rule, read on the timer's own clock. */
export function remainingSeconds(timer: ClockTimer, deviceNowMs: number, clockOffsetMs: number): number {
  return timerRemainingSeconds(
    { startedAt: new Date(timer.startedAt), stoppedAt: timer.stoppedAt ? new Date(timer.stoppedAt) : null, plannedSeconds: timer.plannedSeconds },
    timerNow(timer, deviceNowMs, clockOffsetMs),
  );
}
