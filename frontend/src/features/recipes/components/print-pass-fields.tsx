import { SelectField } from '../../../components/ui/select-field';
import { recordOptions } from '../utils/record-options';
import { fieldError } from '../utils/step-form-types';
import { ArtworkField } from './artwork-field';
import { CheckboxField } from './checkbox-field';
import { NumberField } from './number-field';
import { RecordSelect } from './record-select';
import type { KindFieldsProps } from './step-fields-context';

export function PrintPassFields(props: KindFieldsProps) {
  const { form, records, setup } = props;
  const printer = records.printers.find((p) => p.id === setup.printerId);
  const inkName = (id: number | undefined) => records.inks.find((i) => i.id === id)?.name;
  const planned = (channel: string) => setup.channelPlan.find((c) => c.channel === channel)?.inkId;
  const channel = form.watch('params.channel') as string;
  const channels = printer?.channels.map((c) => c.name) ?? [];
  if (channel && !channels.includes(channel)) channels.push(channel);
  const { onChange, ...channelField } = form.register('params.channel');

  return (
    <>
      <SelectField
        label="Channel"
        help={printer ? `Channels of ${printer.name}, with the ink the setup loads in each.` : 'Pick the printer in the setup first.'}
        error={fieldError(form, 'params.channel')}
        {...channelField}
        onChange={async (event) => {
          await onChange(event);
          // The channel's planned ink is the one this pass prints; it can still be changed below.
          const inkId = planned(event.target.value);
          if (inkId !== undefined) form.setValue('params.inkId', inkId, { shouldValidate: true });
        }}
      >
        <option value="">Pick a channel</option>
        {channels.map((name) => (
          <option key={name} value={name}>
            {inkName(planned(name)) ? `${name}: ${inkName(planned(name))}` : `${name}: nothing planned`}
          </option>
        ))}
      </SelectField>
      <RecordSelect form={form} name="params.inkId" label="Ink" emptyLabel="Pick an ink" options={recordOptions(records.inks, form.watch('params.inkId') as number | null)} />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField form={form} name="params.dpi" label="Resolution" unit="dpi" />
        <NumberField form={form} name="params.passes" label="Passes" help="Layers printed on top of each other." />
      </div>
      <NumberField form={form} name="params.platenTempC" label="Platen temperature" unit="°C" help="Leave empty for an unheated platen." />
      <CheckboxField label="Nozzle check before printing" help="The operator prints and looks at the nozzle pattern first." {...form.register('params.nozzleCheckRequired')} />
      <ArtworkField {...props} />
    </>
  );
}
