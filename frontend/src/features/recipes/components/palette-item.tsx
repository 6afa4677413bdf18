import { useDraggable } from '@dnd-kit/core';
import type { PointerEventHandler, TouchEventHandler } from 'react';

import { STEP_KIND_LABELS, type StepKind } from '@tracewright/shared';

import { StepGlyph } from '../../../components/step-glyphs/step-glyph';
import { paletteDragId } from '../utils/drag-data';

type PaletteItemProps = { kind: StepKind; onAdd: (kind: StepKind) => void };

/**
 * A step kind to add. A click, Enter or Space adds it after the selected step; a mouse, pen or
 * finger can also drag it into the sequence. Keyboard drag stays with the sequence's own handles,
 * so Space here keeps meaning "press the button".
 */
export function PaletteItem({ kind, onAdd }: PaletteItemProps) {
  const { listeners, setNodeRef, isDragging } = useDraggable({ id: paletteDragId(kind), data: { type: 'palette', kind } });
  // dnd-kit types its listeners loosely; these two are the mouse/pen and touch sensors' activators.
  const onPointerDown = listeners?.onPointerDown as PointerEventHandler | undefined;
  const onTouchStart = listeners?.onTouchStart as TouchEventHandler | undefined;
  return (
    <li>
      <button
        ref={setNodeRef}
        type="button"
        onClick={() => onAdd(kind)}
        onPointerDown={onPointerDown}
        onTouchStart={onTouchStart}
        aria-label={`Add ${STEP_KIND_LABELS[kind]} step`}
        className={`flex min-h-12 w-full touch-manipulation items-center gap-3 rounded-md border border-l-4 border-graphite-300 border-l-graphite-400 bg-white px-3 py-2 text-left font-bold text-graphite-800 hover:border-copper-600 hover:bg-copper-50 ${isDragging ? 'opacity-50' : ''}`}
      >
        <StepGlyph kind={kind} />
        <span className="flex-1">{STEP_KIND_LABELS[kind]}</span>
        <span aria-hidden="true" className="text-sm font-normal text-graphite-600">
          Add
        </span>
      </button>
    </li>
  );
}
