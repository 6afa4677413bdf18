import {
  closestCenter,
  DndContext,
  DragOverlay,
  KeyboardSensor,
  TouchSensor,
  useSensor,
  useSensors,
  type DragEndEvent,
  type DragStartEvent,
} from '@dnd-kit/core';
import { sortableKeyboardCoordinates } from '@dnd-kit/sortable';
import { useMemo, useState, type ReactNode } from 'react';

import type { RecipeStep, StepKind } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { dndAnnouncements, SCREEN_READER_INSTRUCTIONS } from '../utils/dnd-announcements';
import { dragDataOf, dropIndex } from '../utils/drag-data';
import { MouseAndPenSensor } from '../utils/mouse-and-pen-sensor';

type BuilderDndProps = {
  steps: readonly RecipeStep[];
  onAddAt: (kind: StepKind, index: number) => void;
  onMoveTo: (id: string, index: number) => void;
  children: ReactNode;
};

/** One drag-and-drop space for the palette and the sequence: mouse, pen, touch and keyboard. */
export function BuilderDnd({ steps, onAddAt, onMoveTo, children }: BuilderDndProps) {
  const sensors = useSensors(
    useSensor(MouseAndPenSensor, { activationConstraint: { distance: 6 } }),
    useSensor(TouchSensor, { activationConstraint: { delay: 200, tolerance: 8 } }),
    useSensor(KeyboardSensor, { coordinateGetter: sortableKeyboardCoordinates }),
  );
  const [carriedKind, setCarriedKind] = useState<StepKind | null>(null);
  const announcements = useMemo(() => dndAnnouncements(steps), [steps]);

  const onDragStart = ({ active }: DragStartEvent) => {
    const data = dragDataOf(active);
    setCarriedKind(data?.type === 'palette' ? data.kind : null);
  };
  const onDragEnd = ({ active, over }: DragEndEvent) => {
    setCarriedKind(null);
    const data = dragDataOf(active);
    if (!data) return;
    const index = dropIndex(over, steps, data.type === 'palette');
    if (index === null) return;
    if (data.type === 'palette') onAddAt(data.kind, index);
    else onMoveTo(String(active.id), index);
  };

  return (
    <DndContext
      sensors={sensors}
      collisionDetection={closestCenter}
      accessibility={{ announcements, screenReaderInstructions: SCREEN_READER_INSTRUCTIONS }}
      onDragStart={onDragStart}
      onDragEnd={onDragEnd}
      onDragCancel={() => setCarriedKind(null)}
    >
      {children}
      <DragOverlay dropAnimation={null}>
        {carriedKind ? (
          <div className="rounded-md border-2 border-copper-600 bg-white px-3 py-2 shadow-lg">
            <StepKindLabel kind={carriedKind} />
          </div>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
}
