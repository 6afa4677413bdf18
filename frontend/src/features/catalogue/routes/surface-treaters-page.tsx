import type { SurfaceTreaterView } from '@tracewright/shared';

import { calibrationColumns } from '../components/calibration-columns';
import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { TREATMENT_METHOD_LABELS } from '../utils/catalogue-labels';

const NAME: Column<SurfaceTreaterView> = { key: 'name', label: 'Name', sortValue: (t) => t.name, render: (t) => t.name };

const COLUMNS: Column<SurfaceTreaterView>[] = [
  { key: 'method', label: 'Method', sortValue: (t) => TREATMENT_METHOD_LABELS[t.method], render: (t) => TREATMENT_METHOD_LABELS[t.method] },
  ...calibrationColumns<SurfaceTreaterView>(),
];

export function SurfaceTreatersPage() {
  return (
    <RecordListView
      kind="surfaceTreaters"
      title="Surface treaters"
      description="Plasma, corona and UV-ozone units, primer coats and solvent wipes used to prepare a surface before printing."
      plural="surface treaters"
      newLabel="New surface treater"
      basePath="/equipment/surface-treaters"
      filterHelp="Part of a name or method."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(t) => `${t.name} ${TREATMENT_METHOD_LABELS[t.method]}`}
    />
  );
}
