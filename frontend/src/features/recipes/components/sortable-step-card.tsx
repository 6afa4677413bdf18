import { useSortable } from '@dnd-kit/sortable';
import { CSS } from '@dnd-kit/utilities';
import { useEffect, useId, useRef } from 'react';

import type { RecipeStep } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { dragDataOf } from '../utils/drag-data';
import type { StepMarks } from '../utils/evaluate-draft';
import { ArtworkThumbnail } from './artwork-thumbnail';
import { StepCardActions, type CardFocusTarget } from './step-card-actions';
import { StepCardMarks } from './step-card-marks';

export type StepCardProps = {
  step: RecipeStep;
  index: number;
  count: number;
  summary: string;
  marks: StepMarks | undefined;
  isInvalid: boolean;
  isSelected: boolean;
  isEditable: boolean;
  onSelect: (id: string) => void;
  onMove: (id: string, toIndex: number, focus: CardFocusTarget) => void;
  onDuplicate: (id: string) => void;
  onRemove: (id: string) => void;
  focusTarget: CardFocusTarget | null;
  onFocused: () => void;
};

/** One step in the sequence: its handle for dragging, its number, kind, title and settings. */
export function SortableStepCard(props: StepCardProps) {
  const { step, index, count, summary, isSelected, isEditable, onSelect } = props;
  const { attributes, listeners, setNodeRef, setActivatorNodeRef, transform, transition, isDragging, isOver, active } = useSortable({
    id: step.id,
    data: { type: 'step' },
    disabled: !isEditable,
  });
  const summaryId = useId();
  const selectRef = useRef<HTMLButtonElement>(null);
  const { focusTarget, onFocused } = props;
  // After a removal the card that took the removed one's place takes the focus.
  useEffect(() => {
    if (focusTarget !== 'select') return;
    selectRef.current?.focus();
    onFocused();
  }, [focusTarget, onFocused]);
  const isNewStepOver = isOver && active !== null && dragDataOf(active)?.type === 'palette';
  const artworkId = step.kind === 'print-pass' ? step.params.artworkFileId : null;
  const frame = isSelected ? 'border-copper-600 border-l-copper-600 ring-1 ring-copper-600' : 'border-graphite-300 border-l-graphite-400';

  return (
    <li ref={setNodeRef} data-step-card={step.id} style={{ transform: CSS.Translate.toString(transform), transition }} className={isDragging ? 'relative z-10 opacity-80' : ''}>
      {isNewStepOver ? <div aria-hidden="true" className="mb-1 h-1 rounded bg-copper-600" /> : null}
      <article className={`rounded-md border border-l-4 bg-white p-3 ${frame}`}>
        <div className="flex items-start gap-2">
          {isEditable ? (
            <button
              ref={setActivatorNodeRef}
              type="button"
              {...attributes}
              {...listeners}
              aria-roledescription="movable step"
              aria-label={`Move step ${index + 1}, ${step.title}`}
              className="inline-flex size-11 shrink-0 cursor-grab touch-manipulation items-center justify-center rounded-md border border-graphite-300 text-graphite-700 hover:bg-graphite-50"
            >
              <Icon name="sortNone" />
            </button>
          ) : null}
          <button
            ref={selectRef}
            type="button"
            onClick={() => onSelect(step.id)}
            aria-current={isSelected ? 'true' : undefined}
            aria-label={`Step ${index + 1}: ${step.title}`}
            aria-describedby={summaryId}
            className="min-w-0 flex-1 text-left"
          >
            <span className="flex flex-wrap items-center gap-x-3 text-sm text-graphite-600">
              <span className="tabular font-bold">Step {index + 1}</span>
              <StepKindLabel kind={step.kind} size="sm" />
            </span>
            <span className="block break-words text-lg font-bold text-graphite-900">{step.title || 'Untitled step'}</span>
            <span id={summaryId} className="tabular block text-sm text-graphite-700">
              {summary}
            </span>
          </button>
          {artworkId ? <ArtworkThumbnail fileId={artworkId} label={`Artwork of step ${index + 1}`} /> : null}
        </div>
        <StepCardMarks marks={props.marks} isInvalid={props.isInvalid} />
        {isSelected && isEditable ? (
          <StepCardActions
            title={step.title}
            index={index}
            count={count}
            onMove={(to) => props.onMove(step.id, to, to < index ? 'move-up' : 'move-down')}
            onDuplicate={() => props.onDuplicate(step.id)}
            onRemove={() => props.onRemove(step.id)}
            focusTarget={focusTarget}
            onFocused={onFocused}
          />
        ) : null}
      </article>
    </li>
  );
}
