import type { RecipeStep } from '../../schemas/recipe-step.schema';

const MS_PER_SECOND = 1000;
const MS_PER_MINUTE = 60_000;

export interface RunTimer {
  startedAt: Date;
  stoppedAt: Date | null;
}

export interface TimerOutcome {
  elapsedMinutes: number;
  /** Stopped before the step's shortest time (exactly at it is on time). */
  endedEarly: boolean;
  /** Stopped after the step's longest time (exactly at it is on time). */
  overMaximum: boolean;
}

function elapsedMs(startedAt: Date, end: Date): number {
  // A tablet clock behind the server's can put the end before the start: count that as no time.
  return Math.max(0, end.getTime() - startedAt.getTime());
}

/**
 * Whole seconds a timer has run: up to `now` while running, up to its stop once stopped.
 * @example
 * timerElapsedSeconds({ startedAt: new Date('2026-12-02T10:00:00Z'), stoppedAt: null }, new Date('2026-12-02T10:01:30.900Z')) // → 90
 */
export function timerElapsedSeconds(timer: RunTimer, now: Date): number {
  return Math.floor(elapsedMs(timer.startedAt, timer.stoppedAt ?? now) / MS_PER_SECOND);
}

/**
 * Seconds left of a timer's planned length; it keeps counting past zero, so a negative number
 * is how long it has run over.
 * @example
 * // a 10-minute timer 11 minutes after its start → -60
 * timerRemainingSeconds({ startedAt, stoppedAt: null, plannedSeconds: 600 }, new Date(startedAt.getTime() + 660_000))
 */
export function timerRemainingSeconds(timer: RunTimer & { plannedSeconds: number }, now: Date): number {
  return timer.plannedSeconds - timerElapsedSeconds(timer, now);
}

/**
 * How a stopped timer compares with its step's shortest and longest times (either may be
 * missing: then that side cannot be broken). Exactly at a bound is on time. Minutes are exact,
 * not rounded, so a stop one second short of the minimum still counts as early.
 *
 * @example
 * // a 10–15 min dry stopped after 9.5 min → { elapsedMinutes: 9.5, endedEarly: true, overMaximum: false }
 * timerOutcome({ minMinutes: 10, maxMinutes: 15 }, { startedAt }, new Date(startedAt.getTime() + 570_000))
 */
export function timerOutcome(
  step: Pick<RecipeStep, 'minMinutes' | 'maxMinutes'>,
  timer: Pick<RunTimer, 'startedAt'>,
  stoppedAt: Date,
): TimerOutcome {
  const elapsedMinutes = elapsedMs(timer.startedAt, stoppedAt) / MS_PER_MINUTE;
  return {
    elapsedMinutes,
    endedEarly: step.minMinutes !== null && elapsedMinutes < step.minMinutes,
    overMaximum: step.maxMinutes !== null && elapsedMinutes > step.maxMinutes,
  };
}
