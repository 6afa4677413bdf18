import type { RecipeStep } from '@tracewright/shared';

/**
 * How long a step's timer runs, in seconds: a cure's time at temperature, a transfer's press
 * time, else the step's shortest time (or its longest when only that is given). Null: no timer.
 * @example plannedTimerSeconds({ kind: 'dry', minMinutes: 10, maxMinutes: 15, … }) // → 600
 */
export function plannedTimerSeconds(step: RecipeStep): number | null {
  if (step.kind === 'cure') return Math.round(step.params.minutes * 60);
  if (step.kind === 'transfer') return Math.round(step.params.seconds);
  const minutes = step.minMinutes ?? step.maxMinutes;
  return minutes === null || minutes <= 0 ? null : Math.round(minutes * 60);
}
