import { zodResolver } from '@hookform/resolvers/zod';
import { useQuery } from '@tanstack/react-query';
import { useForm } from 'react-hook-form';
import { z } from 'zod';

import { DEVIATION_SEVERITIES, DeviationSeveritySchema, type DeviationDetail } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { SelectField } from '../../../components/ui/select-field';
import { useToast } from '../../../components/ui/use-toast';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useAssignDeviation } from '../api/assign-deviation';
import { peopleQueryOptions } from '../api/get-people';
import { SEVERITY_LOOK } from '../utils/deviation-looks';
import { DetailSection } from './detail-section';
import { OptionSelect } from './option-select';

// The select holds text; the request takes the shared AssignDeviationInput (ids as numbers).
const AssignFormSchema = z.object({
  assigneeId: z.string().min(1, 'Choose who takes this deviation.'),
  severity: DeviationSeveritySchema,
});

/** Who owns the review, and how severe it is judged to be. */
export function AssignForm({ deviation }: { deviation: DeviationDetail }) {
  const people = useQuery(peopleQueryOptions('assignees'));
  const assign = useAssignDeviation();
  const toast = useToast();
  const { register, handleSubmit, setError, formState } = useForm({
    resolver: zodResolver(AssignFormSchema),
    values: { assigneeId: deviation.assignee ? String(deviation.assignee.id) : '', severity: deviation.severity },
  });
  const { errors } = formState;

  const onSubmit = handleSubmit(({ assigneeId, severity }) =>
    assign.mutate(
      { id: deviation.id, input: { assigneeId: Number(assigneeId), severity } },
      {
        onSuccess: () => toast.show(`Deviation #${deviation.id} assigned.`),
        onError: (error) => applyApiErrorToForm(error, setError, ['assigneeId', 'severity']),
      },
    ),
  );

  return (
    <DetailSection title="Assignee and severity">
      <form noValidate onSubmit={onSubmit} className="flex flex-col gap-4">
        <FormError message={errors.root?.server?.message} />
        <OptionSelect
          label="Assignee"
          anyLabel="Choose a person"
          options={people.data?.map((p) => ({ id: p.id, label: p.name }))}
          isUnavailable={people.isError}
          error={errors.assigneeId?.message}
          {...register('assigneeId')}
        />
        <SelectField label="Severity" error={errors.severity?.message} {...register('severity')}>
          {DEVIATION_SEVERITIES.map((s) => (
            <option key={s} value={s}>
              {SEVERITY_LOOK[s].label}
            </option>
          ))}
        </SelectField>
        <div>
          <Button type="submit" variant="secondary" isPending={assign.isPending} pendingLabel="Saving…">
            Save assignment
          </Button>
        </div>
      </form>
    </DetailSection>
  );
}
