import { SelectField } from '../../../components/ui/select-field';
import { describeHeatSource, recordOptions } from '../utils/record-options';
import { fieldError } from '../utils/step-form-types';
import { PEEL_LABELS } from '../utils/step-labels';
import { NumberField } from './number-field';
import { RecordSelect } from './record-select';
import type { KindFieldsProps } from './step-fields-context';

export function TransferFields({ form, records }: KindFieldsProps) {
  const current = form.watch('params.heatSourceId') as number | null;
  return (
    <>
      <RecordSelect form={form} name="params.heatSourceId" label="Heat press" emptyLabel="Not named" options={recordOptions(records.heatSources, current, describeHeatSource)} />
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberField form={form} name="params.temperatureC" label="Press temperature" unit="°C" />
        <NumberField form={form} name="params.pressureKPa" label="Pressure" unit="kPa" />
        <NumberField form={form} name="params.seconds" label="Press time" unit="s" />
      </div>
      <SelectField label="Peel" error={fieldError(form, 'params.peel')} {...form.register('params.peel')}>
        <option value="hot">{PEEL_LABELS.hot}</option>
        <option value="cold">{PEEL_LABELS.cold}</option>
      </SelectField>
    </>
  );
}
