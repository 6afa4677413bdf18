import type { Substrate } from '@tracewright/shared';

import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { SUBSTRATE_CLASS_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';

const NAME: Column<Substrate> = { key: 'name', label: 'Name', sortValue: (s) => s.name, render: (s) => s.name };

const COLUMNS: Column<Substrate>[] = [
  { key: 'class', label: 'Class', sortValue: (s) => SUBSTRATE_CLASS_LABELS[s.substrateClass], render: (s) => SUBSTRATE_CLASS_LABELS[s.substrateClass] },
  { key: 'thickness', label: 'Thickness', unit: 'µm', isNumeric: true, sortValue: (s) => s.thicknessUm, render: (s) => formatValue(s.thicknessUm) },
  {
    key: 'continuous',
    label: 'Continuous max',
    unit: '°C',
    isNumeric: true,
    sortValue: (s) => s.maxContinuousTempC,
    render: (s) => formatValue(s.maxContinuousTempC),
  },
  {
    key: 'short',
    label: 'Short-exposure max',
    unit: '°C',
    isNumeric: true,
    sortValue: (s) => s.maxShortExposureTempC,
    render: (s) => formatValue(s.maxShortExposureTempC),
  },
  { key: 'strain', label: 'Max strain', unit: '%', isNumeric: true, sortValue: (s) => s.maxStrainPercent, render: (s) => formatValue(s.maxStrainPercent) },
  { key: 'carrier', label: 'Transfer carrier', sortValue: (s) => (s.isTransferCarrier ? 'Yes' : 'No'), render: (s) => (s.isTransferCarrier ? 'Yes' : 'No') },
];

export function SubstratesPage() {
  return (
    <RecordListView
      kind="substrates"
      title="Substrates"
      description="Films, papers, sheets and textiles printed on, with the limits every heat step must respect."
      plural="substrates"
      newLabel="New substrate"
      basePath="/materials/substrates"
      filterHelp="Part of a name, manufacturer or class."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(s) => `${s.name} ${s.manufacturer} ${SUBSTRATE_CLASS_LABELS[s.substrateClass]}`}
    />
  );
}
