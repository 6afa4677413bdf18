import type { HeatSourceView } from '@tracewright/shared';

import { calibrationColumns } from '../components/calibration-columns';
import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { HEAT_SOURCE_KIND_LABELS } from '../utils/catalogue-labels';
import { formatValue } from '../utils/format-value';

const NAME: Column<HeatSourceView> = { key: 'name', label: 'Name', sortValue: (h) => h.name, render: (h) => h.name };

const COLUMNS: Column<HeatSourceView>[] = [
  { key: 'kind', label: 'Kind', sortValue: (h) => HEAT_SOURCE_KIND_LABELS[h.kind], render: (h) => HEAT_SOURCE_KIND_LABELS[h.kind] },
  { key: 'max', label: 'Maximum', unit: '°C', isNumeric: true, sortValue: (h) => h.maxTempC, render: (h) => formatValue(h.maxTempC) },
  ...calibrationColumns<HeatSourceView>(),
];

export function HeatSourcesPage() {
  return (
    <RecordListView
      kind="heatSources"
      title="Heat sources"
      description="Ovens, hot plates, heat presses and heat guns, with their top temperature and calibration."
      plural="heat sources"
      newLabel="New heat source"
      basePath="/equipment/heat-sources"
      filterHelp="Part of a name or kind."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(h) => `${h.name} ${HEAT_SOURCE_KIND_LABELS[h.kind]}`}
    />
  );
}
