import { DRY_METHODS } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { describeHeatSource, recordOptions } from '../utils/record-options';
import { fieldError } from '../utils/step-form-types';
import { DRY_METHOD_LABELS } from '../utils/step-labels';
import { NumberField } from './number-field';
import { RecordSelect } from './record-select';
import type { KindFieldsProps } from './step-fields-context';

export function DryFields({ form, records }: KindFieldsProps) {
  const method = form.watch('params.method');
  const current = form.watch('params.heatSourceId') as number | null;
  return (
    <>
      <SelectField label="How" error={fieldError(form, 'params.method')} {...form.register('params.method')}>
        {DRY_METHODS.map((m) => (
          <option key={m} value={m}>
            {DRY_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
      {method === 'air' ? null : (
        <RecordSelect form={form} name="params.heatSourceId" label="Heat source" emptyLabel="Not named" options={recordOptions(records.heatSources, current, describeHeatSource)} />
      )}
      <NumberField form={form} name="params.temperatureC" label="Temperature" unit="°C" help={method === 'air' ? 'Room temperature where the parts dry.' : undefined} />
    </>
  );
}
