import { SUBSTRATE_CLASSES, type SubstrateInput } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { SUBSTRATE_CLASS_LABELS } from '../utils/catalogue-labels';
import { CheckboxField } from './checkbox-field';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

export function SubstrateIdentityFields() {
  const field = useFieldProps<SubstrateInput>();
  return (
    <FormSection legend="Substrate">
      <TextField label="Name" autoComplete="off" {...field.text('name')} />
      <TextField label="Manufacturer" autoComplete="off" {...field.text('manufacturer')} />
      <SelectField label="Class" className="max-w-sm" {...field.text('substrateClass')}>
        {SUBSTRATE_CLASSES.map((c) => (
          <option key={c} value={c}>
            {SUBSTRATE_CLASS_LABELS[c]}
          </option>
        ))}
      </SelectField>
      <QuantityField label="Thickness" unit="µm" {...field.number('thicknessUm')} />
      <QuantityField label="Maximum strain" unit="%" help="Optional. How far it may stretch in use." {...field.number('maxStrainPercent')} />
      <CheckboxField
        label="Transfer carrier"
        help="Tick when the print leaves this sheet in a transfer step (tattoo or transfer paper)."
        {...field.text('isTransferCarrier')}
      />
    </FormSection>
  );
}
