import { useFormContext, useWatch } from 'react-hook-form';

import type { SubstrateInput } from '@tracewright/shared';

import { owrkPreview } from '../utils/owrk-preview';
import { FormSection } from './form-section';
import { OwrkResult } from './owrk-result';
import { QuantityField } from './quantity-field';
import { useFieldProps } from './use-field-props';

/** Surface energy by its parts, or by two contact angles, with the angles' result shown as typed. */
export function SubstrateSurfaceFields() {
  const field = useFieldProps<SubstrateInput>();
  const { control } = useFormContext<SubstrateInput>();
  const [water, diiodomethane] = useWatch({ control, name: ['waterContactAngleDeg', 'diiodomethaneContactAngleDeg'] });
  const preview = owrkPreview(water, diiodomethane);
  return (
    <FormSection
      legend="Surface energy"
      help="Give the dispersive and polar parts, or the water and diiodomethane contact angles; recorded parts are used first. Both may stay empty."
    >
      <QuantityField label="Surface energy, dispersive" unit="mN/m" {...field.number('surfaceEnergyDispersiveMilliNPerM')} />
      <QuantityField label="Surface energy, polar" unit="mN/m" {...field.number('surfaceEnergyPolarMilliNPerM')} />
      <QuantityField label="Water contact angle" unit="°" {...field.number('waterContactAngleDeg')} />
      <QuantityField label="Diiodomethane contact angle" unit="°" {...field.number('diiodomethaneContactAngleDeg')} />
      <div role="status" aria-live="polite" aria-label="Surface energy from the angles" className="rounded-md bg-graphite-50 p-3">
        <p className="mb-2 text-sm font-bold text-graphite-700">From the angles (Owens & Wendt 1969)</p>
        {'energy' in preview ? <OwrkResult energy={preview.energy} /> : <p className="text-graphite-700">{preview.problem}</p>}
      </div>
    </FormSection>
  );
}
