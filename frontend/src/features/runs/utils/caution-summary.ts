import type { SafetyNote, TravellerStep } from '@tracewright/shared';

export type CautionLine = { note: SafetyNote; stepNumbers: number[] };

/**
 * Every caution of the run once, with the steps it applies to, dangers first: the short list
 * printed at the top of the traveller (each step repeats its own).
 * @example cautionSummary([step1WithHotSurface, step4WithHotSurface]) // → [{ note: hot-surface, stepNumbers: [1, 4] }]
 */
export function cautionSummary(steps: readonly TravellerStep[]): CautionLine[] {
  const lines = new Map<string, CautionLine>();
  for (const step of steps) {
    for (const note of step.cautions) {
      // Same code, other words (a hot surface at 120 °C and at 150 °C) are two lines.
      const key = `${note.code}|${note.text}`;
      const line = lines.get(key);
      if (line) line.stepNumbers.push(step.number);
      else lines.set(key, { note, stepNumbers: [step.number] });
    }
  }
  const rank = (line: CautionLine) => (line.note.severity === 'danger' ? 0 : 1);
  return [...lines.values()].sort((a, b) => rank(a) - rank(b));
}
