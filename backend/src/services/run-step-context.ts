import { travellerSteps, type DraftContent, type Ink, type SafetyNote } from '@tracewright/shared';

import type { LoadedReferences } from './recipe-references';

/**
 * Cautions per step, as the traveller shows them: derived from heat, solvents and inks, then
 * the step's own notes (shared travellerSteps; one per code).
 */
export function safetyNotesByStep(content: DraftContent, refs: Pick<LoadedReferences, 'inks' | 'heatSources'>): Record<string, SafetyNote[]> {
  const steps = travellerSteps(content.steps, { inks: refs.inks, heatSources: refs.heatSources });
  return Object.fromEntries(steps.map((s) => [s.stepId, s.cautions]));
}

const printedInk = (content: DraftContent, index: number, inks: readonly Ink[]): Ink | undefined => {
  const step = content.steps[index];
  return step?.kind === 'print-pass' ? inks.find((i) => i.id === step.params.inkId) : undefined;
};

/**
 * The conductor a resistance reading at step `index` measures, for its TCR: the one printed by
 * the nearest print pass at or before the step (the trace just laid down), else the first one
 * the version prints. Null when the version prints no conductor.
 */
export function conductorAt(content: DraftContent, index: number, inks: readonly Ink[]): Ink | null {
  for (let i = Math.min(index, content.steps.length - 1); i >= 0; i -= 1) {
    const ink = printedInk(content, i, inks);
    if (ink?.function === 'conductor') return ink;
  }
  return content.steps.map((_, i) => printedInk(content, i, inks)).find((ink) => ink?.function === 'conductor') ?? null;
}

/**
 * The inks a cure step at `index` is for: those printed since the previous cure step (an ink
 * cured earlier already had its dose, and a second cure over a cover must not be judged
 * against the first ink's reference again). Each once, in print order.
 */
export function inksCuredAt(content: DraftContent, index: number, inks: readonly Ink[]): Ink[] {
  let from = 0;
  for (let i = index - 1; i >= 0; i -= 1) {
    if (content.steps[i]?.kind === 'cure') {
      from = i + 1;
      break;
    }
  }
  const cured = new Map<number, Ink>();
  for (let i = from; i < index; i += 1) {
    const ink = printedInk(content, i, inks);
    if (ink) cured.set(ink.id, ink);
  }
  return [...cured.values()];
}
