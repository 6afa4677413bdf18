import type { InkInput } from '@tracewright/shared';

import { FormSection } from './form-section';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

/** What the jetting and wetting checks read: flow, surface tension and solids. */
export function InkFluidFields() {
  const field = useFieldProps<InkInput>();
  return (
    <>
      <FormSection legend="Flow and surface" help="Values at the temperature the ink is jetted at; the printer checks read them.">
        <QuantityField label="Viscosity" unit="mPa·s" {...field.number('viscosityMilliPaS')} />
        <QuantityField label="Surface tension" unit="mN/m" {...field.number('surfaceTensionMilliNPerM')} />
        <QuantityField
          label="Dispersive part"
          unit="mN/m"
          help="Optional. With the polar part it predicts contact angles; the two must add up to the surface tension."
          {...field.number('surfaceTensionDispersiveMilliNPerM')}
        />
        <QuantityField label="Polar part" unit="mN/m" help="Optional; give it together with the dispersive part." {...field.number('surfaceTensionPolarMilliNPerM')} />
        <QuantityField label="Density" unit="kg/m³" {...field.number('densityKgPerM3')} />
      </FormSection>
      <FormSection legend="Solids">
        <QuantityField label="Solids" unit="wt%" help="Share of the ink's mass that stays after drying." {...field.number('solidsWtPercent')} />
        <QuantityField
          label="Solids density"
          unit="kg/m³"
          help="Optional. Lets the checks estimate how much of the wet film stays as solids."
          {...field.number('solidsDensityKgPerM3')}
        />
      </FormSection>
    </>
  );
}
