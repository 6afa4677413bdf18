import type { DraftContent, RecipeStep } from '@tracewright/shared';

// Invented values for tests only; they are never used as check values.
// Shared by the recipes and runs features' fixtures, which each bring their own steps.

/** What a step fixture leaves empty unless it says otherwise: no instructions, timings, readings or safety notes. */
export const BLANK_STEP_FIELDS = { instructions: '', minMinutes: null, maxMinutes: null, handsOnMinutes: null, readingSpecs: [], safetyNotes: [] };

/** A recipe's content around `steps`: substrate 1 on printer 1, ink 1 on channel C1, cured in heat source 1. */
export function aDraftContent(steps: RecipeStep[], overrides: Partial<DraftContent> = {}): DraftContent {
  return {
    substrateId: 1,
    receivingSubstrateId: null,
    printerId: 1,
    channelPlan: [{ channel: 'C1', inkId: 1 }],
    heatSourceIds: [1],
    treaterIds: [],
    changeNote: '',
    steps,
    ...overrides,
  };
}
