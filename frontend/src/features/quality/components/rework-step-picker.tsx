import { useQuery } from '@tanstack/react-query';
import type { UseFormRegisterReturn } from 'react-hook-form';

import { StepKindLabel } from '../../../components/step-glyphs/step-kind-label';
import { LoadingState } from '../../../components/ui/loading-state';
import { runStepsQueryOptions } from '../api/get-run-steps';
import { ChoiceBox } from './choice-box';
import { ChoiceFieldset } from './choice-fieldset';

type ReworkStepPickerProps = { runId: number; registration: UseFormRegisterReturn; error?: string };

/** For rework: the recipe steps the pieces go through again, in the recipe's order. */
export function ReworkStepPicker({ runId, registration, error }: ReworkStepPickerProps) {
  const steps = useQuery(runStepsQueryOptions(runId));
  if (steps.isPending) return <LoadingState label="Loading the run's steps…" />;
  if (steps.isError) return <p className="font-bold text-oxide-700">The run's steps could not be loaded: {steps.error.message}</p>;
  return (
    <ChoiceFieldset legend="Steps to repeat" help="The rework run repeats these steps for the pieces ticked above." error={error}>
      {steps.data.map((step, index) => (
        <ChoiceBox key={step.id} type="checkbox" value={step.id} {...registration}>
          <span className="tabular">{index + 1}.</span> {step.title} <StepKindLabel kind={step.kind} size="sm" className="ml-2" />
        </ChoiceBox>
      ))}
    </ChoiceFieldset>
  );
}
