import { useCallback, type Dispatch } from 'react';

import type { RecipeStep } from '@tracewright/shared';

import type { ProcessRecords } from '../api/get-process-records';
import type { useStepCommands } from '../hooks/use-step-commands';
import type { DraftAction, DraftState } from '../utils/draft-reducer';
import type { DraftEvaluation } from '../utils/evaluate-draft';
import { BuilderDnd } from './builder-dnd';
import { StepForm } from './step-form';
import { StepPalette } from './step-palette';
import { StepSequence } from './step-sequence';

type BuilderWorkbenchProps = {
  draft: DraftState;
  dispatch: Dispatch<DraftAction>;
  evaluation: DraftEvaluation;
  records: ProcessRecords;
  isEditable: boolean;
  commands: ReturnType<typeof useStepCommands>;
};

/** Palette, sequence and the selected step's form, side by side, in one drag-and-drop space. */
export function BuilderWorkbench({ draft, dispatch, evaluation, records, isEditable, commands }: BuilderWorkbenchProps) {
  const steps = draft.content.steps;
  const index = steps.findIndex((s) => s.id === draft.selectedId);
  const selected = steps[index];
  const onStepChange = useCallback((step: RecipeStep) => dispatch({ type: 'update-step', step }), [dispatch]);
  const columns = isEditable ? 'lg:grid-cols-[12rem_minmax(0,1fr)_minmax(0,1.3fr)]' : 'lg:grid-cols-[minmax(0,1fr)_minmax(0,1.3fr)]';

  return (
    <BuilderDnd steps={steps} onAddAt={commands.addAt} onMoveTo={(id, to) => commands.move(id, to)}>
      <div className={`mb-8 grid items-start gap-6 ${columns}`}>
        {isEditable ? <StepPalette onAdd={commands.add} hasSelection={selected !== undefined} /> : null}
        <StepSequence
          steps={steps}
          inks={records.inks}
          evaluation={evaluation}
          selectedId={draft.selectedId}
          isEditable={isEditable}
          focus={commands.focus}
          announcement={commands.announcement}
          onSelect={commands.select}
          onMove={commands.move}
          onDuplicate={commands.duplicate}
          onRemove={commands.remove}
          onFocused={commands.clearFocus}
        />
        <div className="min-w-0 rounded-md border border-graphite-300 bg-white p-4 lg:sticky lg:top-4">
          {selected ? (
            <StepForm
              key={`${selected.id}:${draft.generation}`}
              step={selected}
              index={index}
              isEditable={isEditable}
              isInvalid={evaluation.invalidStepIds.has(selected.id)}
              records={records}
              setup={draft.content}
              derivedNotes={evaluation.safetyNotes.get(selected.id)}
              onChange={onStepChange}
            />
          ) : (
            <p className="text-graphite-600">{steps.length === 0 ? 'Add a first step to start.' : 'Select a step to see its settings.'}</p>
          )}
        </div>
      </div>
    </BuilderDnd>
  );
}
