import { INK_FUNCTIONS, type InkInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { INK_FUNCTION_LABELS } from '../utils/catalogue-labels';
import { FormSection } from './form-section';
import { useFieldProps } from './use-field-props';

export function InkIdentityFields() {
  const field = useFieldProps<InkInput>();
  return (
    <FormSection legend="Ink">
      <TextField label="Name" autoComplete="off" help="As it reads on the bottle, so the bench finds the right one." {...field.text('name')} />
      <TextField label="Manufacturer" autoComplete="off" {...field.text('manufacturer')} />
      <SelectField label="Function" className="max-w-xs" help="A conductor also needs its sheet resistance per pass." {...field.text('function')}>
        {INK_FUNCTIONS.map((fn) => (
          <option key={fn} value={fn}>
            {INK_FUNCTION_LABELS[fn]}
          </option>
        ))}
      </SelectField>
    </FormSection>
  );
}
