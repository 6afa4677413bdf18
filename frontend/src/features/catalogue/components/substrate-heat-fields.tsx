import type { SubstrateInput } from '@tracewright/shared';

import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

export function SubstrateHeatFields() {
  const field = useFieldProps<SubstrateInput>();
  return (
    <FormSection legend="Temperature limits" help="From the supplier's data sheet. Heat steps on this substrate are compared with them.">
      <QuantityField label="Continuous maximum temperature" unit="°C" {...field.number('maxContinuousTempC')} />
      <QuantityField label="Short-exposure maximum temperature" unit="°C" help="At or above the continuous maximum." {...field.number('maxShortExposureTempC')} />
      <QuantityField label="Short-exposure time" unit="s" help="How long the short-exposure maximum may last." {...field.number('maxShortExposureSeconds')} />
    </FormSection>
  );
}
