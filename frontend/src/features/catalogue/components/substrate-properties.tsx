import type { Substrate } from '@tracewright/shared';

import { SUBSTRATE_CLASS_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';
import { DetailList } from './detail-list';
import { DetailSection } from './detail-section';

export function SubstrateProperties({ substrate: s }: { substrate: Substrate }) {
  return (
    <>
      <DetailSection title="Temperature limits">
        <DetailList
          items={[
            { label: 'Continuous maximum', value: formatValue(s.maxContinuousTempC), unit: '°C' },
            { label: 'Short-exposure maximum', value: `${formatValue(s.maxShortExposureTempC)} °C for up to ${formatValue(s.maxShortExposureSeconds)} s` },
          ]}
        />
      </DetailSection>
      <DetailSection title="Properties">
        <DetailList
          items={[
            { label: 'Class', value: SUBSTRATE_CLASS_LABELS[s.substrateClass] },
            { label: 'Manufacturer', value: s.manufacturer || '—' },
            { label: 'Thickness', value: formatValue(s.thicknessUm), unit: 'µm' },
            { label: 'Maximum strain', value: formatValue(s.maxStrainPercent), unit: '%' },
            { label: 'Transfer carrier', value: s.isTransferCarrier ? 'Yes' : 'No' },
            { label: 'Water contact angle', value: formatValue(s.waterContactAngleDeg), unit: '°' },
            { label: 'Diiodomethane contact angle', value: formatValue(s.diiodomethaneContactAngleDeg), unit: '°' },
            { label: 'Surface energy, dispersive', value: formatValue(s.surfaceEnergyDispersiveMilliNPerM), unit: 'mN/m' },
            { label: 'Surface energy, polar', value: formatValue(s.surfaceEnergyPolarMilliNPerM), unit: 'mN/m' },
          ]}
        />
        {s.notes ? <p className="mt-4 max-w-prose whitespace-pre-line">{s.notes}</p> : null}
      </DetailSection>
    </>
  );
}
