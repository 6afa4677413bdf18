import { useDndContext, useDroppable } from '@dnd-kit/core';

import { dragDataOf, SEQUENCE_END_ID } from '../utils/drag-data';

/** Below the last step: where a step kind dropped goes in at the end (and an empty recipe starts). */
export function SequenceEndZone({ isEmpty }: { isEmpty: boolean }) {
  const { active } = useDndContext();
  const isCarryingKind = active !== null && dragDataOf(active)?.type === 'palette';
  const { setNodeRef, isOver } = useDroppable({ id: SEQUENCE_END_ID, disabled: !isCarryingKind && !isEmpty });
  const look = isOver ? 'border-copper-600 bg-copper-50 text-copper-800' : 'border-graphite-300 text-graphite-600';
  if (!isEmpty && !isCarryingKind) return <div ref={setNodeRef} />;
  return (
    <div ref={setNodeRef} className={`mt-2 rounded-md border-2 border-dashed p-4 text-center text-sm ${look}`}>
      {isEmpty ? 'No steps yet. Add a step kind from the list, or drag one here.' : 'Drop here to add at the end.'}
    </div>
  );
}
