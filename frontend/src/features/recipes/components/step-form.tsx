import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useRef } from 'react';
import { useForm } from 'react-hook-form';

import { RecipeStepSchema, type RecipeStep, type SafetyNote, type VersionSetup } from '@tracewright/shared';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { TextField } from '../../../components/ui/text-field';
import type { ProcessRecords } from '../api/get-process-records';
import { fieldError, type StepFormValues } from '../utils/step-form-types';
import { InstructionsField } from './instructions-field';
import { KindFields } from './kind-fields';
import { ReadingSpecsEditor } from './reading-specs-editor';
import { SafetyNotesSection } from './safety-notes-section';
import { TimingFields } from './timing-fields';

type StepFormProps = {
  step: RecipeStep;
  index: number;
  isEditable: boolean;
  isInvalid: boolean;
  records: ProcessRecords;
  setup: VersionSetup;
  derivedNotes: readonly SafetyNote[] | undefined;
  onChange: (step: RecipeStep) => void;
};

/**
 * The selected step's form, validated by the step schema as the person types. Every change goes
 * straight into the working copy, so the checks beside it follow each keystroke.
 */
export function StepForm({ step, index, isEditable, isInvalid, records, setup, derivedNotes, onChange }: StepFormProps) {
  const form = useForm<StepFormValues, unknown, RecipeStep>({ resolver: zodResolver(RecipeStepSchema), mode: 'onChange', defaultValues: step });
  const { watch, trigger } = form;

  useEffect(() => {
    // The form's own values object changes in place; the working copy gets a copy of its own.
    const subscription = watch((values) => onChange(structuredClone(values) as RecipeStep));
    return () => subscription.unsubscribe();
  }, [watch, onChange]);

  // A step opened with fields to fix shows its messages at once, not after the next keystroke.
  const wasInvalidOnOpen = useRef(isInvalid);
  useEffect(() => {
    if (wasInvalidOnOpen.current) void trigger();
  }, [trigger]);

  return (
    <form aria-labelledby="step-form-title" noValidate onSubmit={(e) => e.preventDefault()} className="flex flex-col gap-6">
      <div className="flex flex-col gap-1">
        <StepKindLabel kind={step.kind} />
        <h2 id="step-form-title" className="text-xl font-bold">
          Step {index + 1}: {(watch('title') as string) || 'Untitled step'}
        </h2>
      </div>
      <fieldset disabled={!isEditable} className="flex min-w-0 flex-col gap-6">
        <legend className="sr-only">Step {index + 1} settings</legend>
        <TextField label="Step title" autoComplete="off" error={fieldError(form, 'title')} {...form.register('title')} />
        <KindFields kind={step.kind} form={form} records={records} setup={setup} />
        <InstructionsField form={form} />
        <TimingFields form={form} />
        <ReadingSpecsEditor form={form} />
        <SafetyNotesSection form={form} derived={derivedNotes} />
      </fieldset>
    </form>
  );
}
