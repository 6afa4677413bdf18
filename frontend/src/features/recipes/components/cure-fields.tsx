import { describeHeatSource, recordOptions } from '../utils/record-options';
import { NumberField } from './number-field';
import { RecordSelect } from './record-select';
import type { KindFieldsProps } from './step-fields-context';

export function CureFields({ form, records }: KindFieldsProps) {
  const current = form.watch('params.heatSourceId') as number | null;
  return (
    <>
      <RecordSelect form={form} name="params.heatSourceId" label="Heat source" emptyLabel="Not named" options={recordOptions(records.heatSources, current, describeHeatSource)} />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField form={form} name="params.temperatureC" label="Temperature" unit="°C" />
        <NumberField form={form} name="params.minutes" label="Time at temperature" unit="min" />
      </div>
      <NumberField form={form} name="params.rampCPerMinute" label="Ramp" unit="°C/min" help="Optional: how fast it heats from room temperature. The timeline adds the ramp time." />
    </>
  );
}
