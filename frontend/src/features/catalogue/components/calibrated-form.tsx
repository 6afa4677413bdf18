import type { ReactNode } from 'react';
import { useFormContext } from 'react-hook-form';

import { FormError } from '../../../components/ui/form-error';
import { TextAreaField } from '../../../components/ui/text-area-field';
import { TextField } from '../../../components/ui/text-field';
import { FormActions } from './form-actions';
import { useFieldProps } from './use-field-props';

type CalibratedFormProps = { label: string; onSubmit: () => void; saveLabel: string; isPending: boolean; cancelPath: string; children: ReactNode };

/** The frame the three calibrated kinds share: their own fields, then calibration due and notes. */
export function CalibratedForm({ label, onSubmit, saveLabel, isPending, cancelPath, children }: CalibratedFormProps) {
  const field = useFieldProps<{ calibrationDueOn: string | null; notes: string }>();
  const { formState } = useFormContext();
  return (
    <form onSubmit={onSubmit} noValidate aria-label={label} className="flex max-w-xl flex-col gap-6">
      <FormError message={formState.errors.root?.server?.message} />
      {children}
      <TextField
        label="Calibration due"
        type="date"
        help="Optional. Leave empty when this equipment is not calibrated."
        className="max-w-xs"
        {...field.optionalText('calibrationDueOn')}
      />
      <TextAreaField label="Notes" {...field.text('notes')} />
      <FormActions saveLabel={saveLabel} isPending={isPending} cancelPath={cancelPath} />
    </form>
  );
}
