import { HEAT_SOURCE_KINDS, type HeatSourceInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { HEAT_SOURCE_KIND_LABELS } from '../utils/catalogue-labels';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

export function HeatSourceFields() {
  const field = useFieldProps<HeatSourceInput>();
  return (
    <>
      <TextField label="Name" autoComplete="off" {...field.text('name')} />
      <SelectField label="Kind" className="max-w-xs" {...field.text('kind')}>
        {HEAT_SOURCE_KINDS.map((k) => (
          <option key={k} value={k}>
            {HEAT_SOURCE_KIND_LABELS[k]}
          </option>
        ))}
      </SelectField>
      <QuantityField label="Maximum temperature" unit="°C" help="The highest set point it can hold." {...field.number('maxTempC')} />
    </>
  );
}
