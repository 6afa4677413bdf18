import type { Announcements, ScreenReaderInstructions } from '@dnd-kit/core';

import { STEP_KIND_LABELS, type RecipeStep } from '@tracewright/shared';

import { dragDataOf, dropIndex } from './drag-data';

export const SCREEN_READER_INSTRUCTIONS: ScreenReaderInstructions = {
  draggable:
    'To move this step, press Space or Enter to pick it up, then the up and down arrow keys to carry it, ' +
    'Space or Enter to put it down, or Escape to leave it where it was. The Move up and Move down buttons do the same.',
};

const capital = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/** What a screen reader hears while something is carried, in our words and with positions from 1. */
export function dndAnnouncements(steps: readonly RecipeStep[]): Announcements {
  const total = steps.length;
  const name = (active: Parameters<Announcements['onDragStart']>[0]['active']) => {
    const data = dragDataOf(active);
    if (data?.type === 'palette') return { isNew: true, label: `a new ${STEP_KIND_LABELS[data.kind]} step` };
    const index = steps.findIndex((s) => s.id === active.id);
    return { isNew: false, label: `step ${index + 1}, ${steps[index]?.title ?? ''}` };
  };
  return {
    onDragStart: ({ active }) => `Picked up ${name(active).label}.`,
    onDragOver: ({ active, over }) => {
      const { isNew, label } = name(active);
      const at = dropIndex(over, steps, isNew);
      if (at === null) return `${capital(label)} is not over the sequence.`;
      return `${capital(label)} would go to position ${at + 1} of ${isNew ? total + 1 : total}.`;
    },
    onDragEnd: ({ active, over }) => {
      const { isNew, label } = name(active);
      const at = dropIndex(over, steps, isNew);
      if (at === null) return `Put down outside the sequence; ${isNew ? 'nothing was added' : `${label} stays where it was`}.`;
      return isNew ? `Added ${label} at position ${at + 1}.` : `Put ${label} down at position ${at + 1} of ${total}.`;
    },
    onDragCancel: ({ active }) => {
      const { isNew, label } = name(active);
      return isNew ? 'Stopped; nothing was added.' : `Stopped moving; ${label} stays where it was.`;
    },
  };
}
