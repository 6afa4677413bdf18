import type { Ink } from '@tracewright/shared';

import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { INK_FUNCTION_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';

const NAME: Column<Ink> = { key: 'name', label: 'Name', sortValue: (i) => i.name, render: (i) => i.name };

const COLUMNS: Column<Ink>[] = [
  { key: 'function', label: 'Function', sortValue: (i) => INK_FUNCTION_LABELS[i.function], render: (i) => INK_FUNCTION_LABELS[i.function] },
  { key: 'manufacturer', label: 'Manufacturer', sortValue: (i) => i.manufacturer, render: (i) => i.manufacturer || '—' },
  { key: 'viscosity', label: 'Viscosity', unit: 'mPa·s', isNumeric: true, sortValue: (i) => i.viscosityMilliPaS, render: (i) => formatValue(i.viscosityMilliPaS) },
  {
    key: 'surfaceTension',
    label: 'Surface tension',
    unit: 'mN/m',
    isNumeric: true,
    sortValue: (i) => i.surfaceTensionMilliNPerM,
    render: (i) => formatValue(i.surfaceTensionMilliNPerM),
  },
  { key: 'density', label: 'Density', unit: 'kg/m³', isNumeric: true, sortValue: (i) => i.densityKgPerM3, render: (i) => formatValue(i.densityKgPerM3) },
  { key: 'solids', label: 'Solids', unit: 'wt%', isNumeric: true, sortValue: (i) => i.solidsWtPercent, render: (i) => formatValue(i.solidsWtPercent) },
];

export function InksPage() {
  return (
    <RecordListView
      kind="inks"
      title="Inks"
      description="Conductive, dielectric and graphic inks, with the values the jetting, wetting and cure checks read."
      plural="inks"
      newLabel="New ink"
      basePath="/materials/inks"
      filterHelp="Part of a name or manufacturer."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(i) => `${i.name} ${i.manufacturer}`}
    />
  );
}
