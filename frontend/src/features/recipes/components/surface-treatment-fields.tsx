import { TREATMENT_METHODS } from '@tracewright/shared';

import { SelectField } from '../../../components/ui/select-field';
import { TextField } from '../../../components/ui/text-field';
import { recordOptions } from '../utils/record-options';
import { fieldError } from '../utils/step-form-types';
import { TREATMENT_METHOD_LABELS } from '../utils/step-labels';
import { NumberField } from './number-field';
import { RecordSelect } from './record-select';
import { SolventFields } from './solvent-fields';
import type { KindFieldsProps } from './step-fields-context';

export function SurfaceTreatmentFields(props: KindFieldsProps) {
  const { form, records } = props;
  const method = form.watch('params.method');
  const current = form.watch('params.treaterId') as number | null;
  const treaters = records.surfaceTreaters.filter((t) => t.method === method || t.id === current);
  return (
    <>
      <SelectField label="Method" error={fieldError(form, 'params.method')} {...form.register('params.method')}>
        {TREATMENT_METHODS.map((m) => (
          <option key={m} value={m}>
            {TREATMENT_METHOD_LABELS[m]}
          </option>
        ))}
      </SelectField>
      <RecordSelect form={form} name="params.treaterId" label="Treater" emptyLabel="Not named" options={recordOptions(treaters, current)} />
      <TextField label="Settings" help="Power, time, gas, distance: as the treater's panel shows them." error={fieldError(form, 'params.settings')} {...form.register('params.settings')} />
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberField form={form} name="params.targetSurfaceEnergyMilliNPerM" label="Target surface energy" unit="mN/m" />
        <NumberField form={form} name="params.targetWaterContactAngleDeg" label="Target water contact angle" unit="°" />
      </div>
      <NumberField form={form} name="params.maxWaitBeforePrintMinutes" label="Longest wait before printing" unit="min" help="Treated surfaces lose their effect; the sequence checks hold the print to this." />
      {method === 'solvent-wipe' ? <SolventFields {...props} /> : null}
    </>
  );
}
