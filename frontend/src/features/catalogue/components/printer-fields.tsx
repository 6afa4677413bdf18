import type { PrinterInput } from '@tracewright/shared';

import { TextField } from '../../../components/ui/text-field';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

export function PrinterFields() {
  const field = useFieldProps<PrinterInput>();
  return (
    <FormSection legend="Printer" help="Nozzle diameter and jetting speed are what the jetting checks read.">
      <TextField label="Name" autoComplete="off" {...field.text('name')} />
      <TextField label="Model" autoComplete="off" {...field.text('model')} />
      <QuantityField label="Nozzle diameter" unit="µm" {...field.number('nozzleDiameterUm')} />
      <QuantityField label="Drop volume" unit="pL" {...field.number('dropVolumePl')} />
      <QuantityField label="Typical jetting speed" unit="m/s" {...field.number('jettingSpeedMetresPerSecond')} />
      <QuantityField label="Native resolution" unit="dpi" {...field.number('nativeDpi')} />
    </FormSection>
  );
}
