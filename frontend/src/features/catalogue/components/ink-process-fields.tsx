import type { InkInput } from '@tracewright/shared';

import { TextField } from '../../../components/ui/text-field';
import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

/** Electrical, cure and handling values: what the resistance, cure and lot checks read. */
export function InkProcessFields() {
  const field = useFieldProps<InkInput>();
  return (
    <>
      <FormSection legend="Electrical">
        <QuantityField
          label="Sheet resistance per pass"
          unit="Ω/sq"
          help="After the reference cure below. Required for a conductor."
          {...field.number('sheetResistanceOhmPerSq')}
        />
        <QuantityField
          label="Temperature coefficient of resistance"
          unit="1/K"
          help="Optional, e.g. 0.0039. Used to correct readings to a reference temperature."
          {...field.number('tcrPerK')}
        />
      </FormSection>
      <FormSection legend="Cure" help="The supplier's reference cure. Give the temperature and the time together, or neither.">
        <QuantityField label="Reference cure temperature" unit="°C" {...field.number('cureReferenceTempC')} />
        <QuantityField label="Reference cure time" unit="min" {...field.number('cureReferenceMinutes')} />
        <QuantityField
          label="Activation energy"
          unit="kJ/mol"
          help="Optional. Lets a cure at another temperature be compared with the reference."
          {...field.number('activationEnergyKJPerMol')}
        />
        <QuantityField
          label="Minimum effective cure temperature"
          unit="°C"
          help="Optional. Below this, time at temperature does not count towards the cure."
          {...field.number('minEffectiveCureTempC')}
        />
      </FormSection>
      <FormSection legend="Handling">
        <QuantityField label="Pot life after opening" unit="h" help="Optional. Opened lots older than this are flagged." {...field.number('potLifeHours')} />
        <TextField label="Storage notes" autoComplete="off" help="For example: keep at 4–8 °C, shake before use." {...field.text('storageNotes')} />
      </FormSection>
    </>
  );
}
