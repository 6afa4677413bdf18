import { SortableContext, verticalListSortingStrategy } from '@dnd-kit/sortable';

import type { Ink, RecipeStep } from '@tracewright/shared';

import type { DraftEvaluation } from '../utils/evaluate-draft';
import { stepSummary } from '../utils/step-summary';
import { SequenceEndZone } from './sequence-end-zone';
import { SortableStepCard, type StepCardProps } from './sortable-step-card';
import type { CardFocusTarget } from './step-card-actions';

type Commands = Pick<StepCardProps, 'onSelect' | 'onMove' | 'onDuplicate' | 'onRemove' | 'onFocused'>;

type StepSequenceProps = Commands & {
  steps: readonly RecipeStep[];
  inks: readonly Ink[];
  evaluation: Pick<DraftEvaluation, 'marks' | 'invalidStepIds'>;
  selectedId: string | null;
  isEditable: boolean;
  focus: { stepId: string; target: CardFocusTarget } | null;
  announcement: string;
};

/** The recipe's steps in order, as cards; drag by the handle or use the selected card's buttons. */
export function StepSequence({ steps, inks, evaluation, selectedId, isEditable, focus, announcement, ...commands }: StepSequenceProps) {
  return (
    <section aria-labelledby="sequence-title" className="flex min-w-0 flex-col gap-3">
      <div className="flex items-baseline justify-between gap-2">
        <h2 id="sequence-title" className="text-lg font-bold">
          Sequence
        </h2>
        <span className="tabular text-sm text-graphite-600">
          {steps.length} {steps.length === 1 ? 'step' : 'steps'}
        </span>
      </div>
      <SortableContext items={steps.map((s) => s.id)} strategy={verticalListSortingStrategy}>
        <ol className="flex flex-col gap-2" aria-labelledby="sequence-title">
          {steps.map((step, index) => (
            <SortableStepCard
              key={step.id}
              step={step}
              index={index}
              count={steps.length}
              summary={stepSummary(step, inks)}
              marks={evaluation.marks.get(step.id)}
              isInvalid={evaluation.invalidStepIds.has(step.id)}
              isSelected={step.id === selectedId}
              isEditable={isEditable}
              focusTarget={focus?.stepId === step.id ? focus.target : null}
              {...commands}
            />
          ))}
        </ol>
      </SortableContext>
      {isEditable ? <SequenceEndZone isEmpty={steps.length === 0} /> : null}
      <p role="status" className="sr-only">
        {announcement}
      </p>
    </section>
  );
}
