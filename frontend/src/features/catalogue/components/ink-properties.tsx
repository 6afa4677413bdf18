import type { Ink } from '@tracewright/shared';

import { INK_FUNCTION_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';
import { DetailList, type DetailItem } from './detail-list';
import { DetailSection } from './detail-section';

const v = formatValue;

export function InkProperties({ ink }: { ink: Ink }) {
  const items: DetailItem[] = [
    { label: 'Function', value: INK_FUNCTION_LABELS[ink.function] },
    { label: 'Manufacturer', value: ink.manufacturer || '—' },
    { label: 'Viscosity', value: v(ink.viscosityMilliPaS), unit: 'mPa·s' },
    { label: 'Surface tension', value: v(ink.surfaceTensionMilliNPerM), unit: 'mN/m' },
    { label: 'Dispersive part', value: v(ink.surfaceTensionDispersiveMilliNPerM), unit: 'mN/m' },
    { label: 'Polar part', value: v(ink.surfaceTensionPolarMilliNPerM), unit: 'mN/m' },
    { label: 'Density', value: v(ink.densityKgPerM3), unit: 'kg/m³' },
    { label: 'Solids', value: v(ink.solidsWtPercent), unit: 'wt%' },
    { label: 'Solids density', value: v(ink.solidsDensityKgPerM3), unit: 'kg/m³' },
    { label: 'Sheet resistance per pass', value: v(ink.sheetResistanceOhmPerSq), unit: 'Ω/sq' },
    { label: 'Temperature coefficient of resistance', value: v(ink.tcrPerK), unit: '1/K' },
    { label: 'Reference cure', value: ink.cureReferenceTempC === null ? '—' : `${v(ink.cureReferenceTempC)} °C for ${v(ink.cureReferenceMinutes)} min` },
    { label: 'Activation energy', value: v(ink.activationEnergyKJPerMol), unit: 'kJ/mol' },
    { label: 'Minimum effective cure temperature', value: v(ink.minEffectiveCureTempC), unit: '°C' },
    { label: 'Pot life after opening', value: v(ink.potLifeHours), unit: 'h' },
    { label: 'Storage', value: ink.storageNotes || '—' },
  ];
  return (
    <DetailSection title="Properties">
      <DetailList items={items} />
      {ink.notes ? <p className="mt-4 max-w-prose whitespace-pre-line text-graphite-800">{ink.notes}</p> : null}
    </DetailSection>
  );
}
