import { useQuery } from '@tanstack/react-query';
import type { FieldErrors, UseFormRegister } from 'react-hook-form';

import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { peopleQueryOptions } from '../api/get-people';
import type { DispositionFormValues } from '../utils/disposition-form-schema';
import { OptionSelect } from './option-select';

type CorrectiveActionFieldsProps = { register: UseFormRegister<DispositionFormValues>; errors: FieldErrors<DispositionFormValues>['correctiveAction'] };

/** What will stop it happening again, who owns that, and by when. */
export function CorrectiveActionFields({ register, errors }: CorrectiveActionFieldsProps) {
  const people = useQuery(peopleQueryOptions('assignees'));
  return (
    <div className="flex flex-col gap-4 border-l-4 border-graphite-300 pl-4">
      <TextAreaField label="Corrective action" rows={3} help="What changes so this does not happen again." error={errors?.note?.message} {...register('correctiveAction.note')} />
      <OptionSelect
        label="Owner"
        anyLabel="Choose a person"
        options={people.data?.map((p) => ({ id: p.id, label: p.name }))}
        isUnavailable={people.isError}
        error={errors?.ownerId?.message}
        {...register('correctiveAction.ownerId')}
      />
      <TextField label="Due on" type="date" error={errors?.dueOn?.message} {...register('correctiveAction.dueOn')} />
    </div>
  );
}
