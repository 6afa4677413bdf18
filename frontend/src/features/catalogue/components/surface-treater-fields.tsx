import { TREATMENT_METHODS, type SurfaceTreaterInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { TREATMENT_METHOD_LABELS } from '../utils/catalogue-labels';
import { useFieldProps } from './use-field-props';

export function SurfaceTreaterFields() {
  const field = useFieldProps<SurfaceTreaterInput>();
  return (
    <>
      <TextField label="Name" autoComplete="off" {...field.text('name')} />
      <SelectField label="Method" className="max-w-xs" {...field.text('method')}>
        {TREATMENT_METHODS.map((m) => (
          <option key={m} value={m}>
            {TREATMENT_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
    </>
  );
}
