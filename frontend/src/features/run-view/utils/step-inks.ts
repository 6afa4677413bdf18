import type { Ink, RecipeStep } from '@tracewright/shared';

/**
 * The inks printed up to and including a step, in order of first use: what a cure step cures
 * and what a reading after printing measures.
 * @example inksPrintedBy(steps, 'cure-1', inks) // → [silver] when one silver pass comes before the cure
 */
export function inksPrintedBy(steps: readonly RecipeStep[], stepId: string, inks: readonly Ink[]): Ink[] {
  const upTo = steps.findIndex((s) => s.id === stepId);
  const ids = new Set<number>();
  for (const step of steps.slice(0, upTo === -1 ? steps.length : upTo + 1)) {
    if (step.kind === 'print-pass') ids.add(step.params.inkId);
  }
  return [...ids].map((id) => inks.find((ink) => ink.id === id)).filter((ink): ink is Ink => ink !== undefined);
}

/**
 * The temperature coefficient used to correct a resistance reading to 20 °C: the conductor
 * printed so far, when there is exactly one with a coefficient on record. With two conductors
 * the tablet cannot tell which trace is measured, so it judges the raw value and says so.
 */
export function readingTcr(steps: readonly RecipeStep[], stepId: string, inks: readonly Ink[]): number | null {
  const conductors = inksPrintedBy(steps, stepId, inks).filter((ink) => ink.function === 'conductor');
  return conductors.length === 1 ? (conductors[0]?.tcrPerK ?? null) : null;
}
