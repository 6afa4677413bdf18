import { ATTACH_METHODS } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { fieldError } from '../utils/step-form-types';
import { ATTACH_METHOD_LABELS } from '../utils/step-labels';
import { NumberField } from './number-field';
import { PartsEditor } from './parts-editor';
import type { KindFieldsProps } from './step-fields-context';

export function AttachPartsFields(props: KindFieldsProps) {
  const { form } = props;
  return (
    <>
      <SelectField label="Attach with" error={fieldError(form, 'params.method')} {...form.register('params.method')}>
        {ATTACH_METHODS.map((m) => (
          <option key={m} value={m}>
            {ATTACH_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
      <NumberField form={form} name="params.temperatureC" label="Working temperature" unit="°C" help="For solder or an adhesive cured warm; leave empty for tape or thread." />
      <PartsEditor form={form} />
    </>
  );
}
