import { zodResolver } from '@hookform/resolvers/zod';
import { useId, useMemo } from 'react';
import { useForm } from 'react-hook-form';

import { LabSettingsSchema, type LabSettings } from '@tracewright/shared';

import { Button } from '../../../components/ui/button';
import { FormError } from '../../../components/ui/form-error';
import { TextField } from '../../../components/ui/text-field';
import { applyApiErrorToForm } from '../../../lib/form-errors';
import { useUpdateSettings } from '../api/update-settings';
import { PaperSizeField } from './paper-size-field';
import { timeZoneNames } from './time-zone-names';

type LabSettingsFormProps = { settings: LabSettings; onSaved: () => void };

export function LabSettingsForm({ settings, onSaved }: LabSettingsFormProps) {
  const update = useUpdateSettings();
  const zones = useMemo(timeZoneNames, []);
  const listId = useId();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors },
  } = useForm({ resolver: zodResolver(LabSettingsSchema), defaultValues: settings });

  const onSubmit = handleSubmit((input) =>
    update.mutate(input, {
      onSuccess: (saved) => {
        reset(saved);
        onSaved();
      },
      onError: (error) => applyApiErrorToForm(error, setError, ['labName', 'timeZone', 'paperSize']),
    }),
  );

  return (
    <form onSubmit={onSubmit} noValidate className="flex max-w-md flex-col gap-6">
      <FormError message={errors.root?.server?.message} />
      <TextField label="Lab name" help="Shown at the top of every page and on printouts." error={errors.labName?.message} {...register('labName')} />
      <TextField
        label="Time zone"
        list={listId}
        autoComplete="off"
        spellCheck={false}
        help="A zone name such as Europe/Berlin. Start typing to see the choices."
        error={errors.timeZone?.message}
        {...register('timeZone')}
      />
      <datalist id={listId}>
        {zones.map((zone) => (
          <option key={zone} value={zone} />
        ))}
      </datalist>
      <PaperSizeField registration={register('paperSize')} error={errors.paperSize?.message} />
      <Button type="submit" className="self-start" isPending={update.isPending} pendingLabel="Saving…">
        Save settings
      </Button>
    </form>
  );
}
