import type { RecipeStep } from '../../schemas/recipe-step.schema';

const MS_PER_MINUTE = 60_000;

export interface TreatmentWait {
  treatmentStepId: string;
  printStepId: string;
  /** From the treatment's completion to the print's start, or to `now` while the print waits. */
  waitedMinutes: number;
  maxMinutes: number;
  /** Past the longest wait (exactly at it is on time). */
  isExceeded: boolean;
  /** True while the print has not started: the wait is still growing. */
  isWaiting: boolean;
}

export interface StepCompletion {
  stepId: string;
  completedAt: Date | null;
}

function lastCompletion(records: readonly StepCompletion[], stepId: string): Date | null {
  let latest: Date | null = null;
  for (const r of records) {
    if (r.stepId === stepId && r.completedAt !== null && (latest === null || r.completedAt > latest)) latest = r.completedAt;
  }
  return latest;
}

/**
 * The waits that matter now: for each completed surface treatment with a longest wait before
 * printing, the first print pass after it in the recipe (whatever lies between), as long as that
 * print is not completed yet. Minutes run from the treatment's completion to `printStartedAt`
 * (the moment that print starts) or, while it has not, to `now`. A treatment done again counts
 * from its latest completion. Usually one entry; two when two treatments share the same print.
 *
 * @example
 * // plasma (print within 60 min) completed 10:00, print pass started 11:05 → 65 min waited, exceeded
 * treatmentWaitExceeded([plasma, print], [{ stepId: 'plasma-1', completedAt: at('10:00') }], at('11:05'), at('11:05'))
 * // → [{ treatmentStepId: 'plasma-1', printStepId: 'print-1', waitedMinutes: 65, maxMinutes: 60, isExceeded: true, isWaiting: false }]
 */
export function treatmentWaitExceeded(
  steps: readonly RecipeStep[],
  records: readonly StepCompletion[],
  printStartedAt: Date | null,
  now: Date,
): TreatmentWait[] {
  const waits: TreatmentWait[] = [];
  steps.forEach((step, index) => {
    if (step.kind !== 'surface-treatment' || step.params.maxWaitBeforePrintMinutes === null) return;
    const treatedAt = lastCompletion(records, step.id);
    const print = steps.slice(index + 1).find((s) => s.kind === 'print-pass');
    if (treatedAt === null || print === undefined || lastCompletion(records, print.id) !== null) return;
    const end = printStartedAt ?? now;
    // A tablet clock behind the server's can put the start before the treatment: no wait, not negative.
    const waitedMinutes = Math.max(0, end.getTime() - treatedAt.getTime()) / MS_PER_MINUTE;
    const maxMinutes = step.params.maxWaitBeforePrintMinutes;
    waits.push({ treatmentStepId: step.id, printStepId: print.id, waitedMinutes, maxMinutes, isExceeded: waitedMinutes > maxMinutes, isWaiting: printStartedAt === null });
  });
  return waits;
}
