import type { DraftContent } from '../../schemas/recipe.schema';

export interface MaterialsUsed {
  /** Channel plan first, then any ink a print pass names; each once. */
  inkIds: number[];
  /** The print substrate, then the receiving material of a transfer. */
  substrateIds: number[];
}

/**
 * The materials a version uses, in the order a person sets them out: a run picks one lot of each.
 * @example
 * materialsUsed({ channelPlan: [{ channel: 'C1', inkId: 3 }], steps: [printPassWithInk(5)], substrateId: 2, receivingSubstrateId: null, … })
 * // → { inkIds: [3, 5], substrateIds: [2] }
 */
export function materialsUsed(content: Pick<DraftContent, 'channelPlan' | 'steps' | 'substrateId' | 'receivingSubstrateId'>): MaterialsUsed {
  const inks = new Set(content.channelPlan.map((c) => c.inkId));
  for (const step of content.steps) if (step.kind === 'print-pass') inks.add(step.params.inkId);
  const substrates = new Set([content.substrateId, content.receivingSubstrateId].filter((id): id is number => id !== null));
  return { inkIds: [...inks], substrateIds: [...substrates] };
}
