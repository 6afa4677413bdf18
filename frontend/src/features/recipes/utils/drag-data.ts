import type { Active, Over } from '@dnd-kit/core';

import type { RecipeStep, StepKind } from '@tracewright/shared';

/** What a dragged thing is: a step kind from the palette, or a step of the sequence. */
export type DragData = { type: 'palette'; kind: StepKind } | { type: 'step' };

export const SEQUENCE_END_ID = 'sequence-end';
export const paletteDragId = (kind: StepKind) => `palette:${kind}`;

export function dragDataOf(active: Pick<Active, 'data'>): DragData | null {
  const data = active.data.current as DragData | undefined;
  return data?.type === 'palette' || data?.type === 'step' ? data : null;
}

/**
 * Where a drop lands in the sequence: on a step means that step's place (a new step goes in
 * before it; a moved step takes its position); on the end zone means after the last step.
 */
export function dropIndex(over: Pick<Over, 'id'> | null, steps: readonly Pick<RecipeStep, 'id'>[], isNewStep: boolean): number | null {
  if (!over) return null;
  if (over.id === SEQUENCE_END_ID) return isNewStep ? steps.length : Math.max(0, steps.length - 1);
  const index = steps.findIndex((s) => s.id === over.id);
  return index === -1 ? null : index;
}
