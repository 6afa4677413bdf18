import type { InstrumentView } from '@tracewright/shared';

import { calibrationColumns } from '../components/calibration-columns';
import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { INSTRUMENT_KIND_LABELS } from '../utils/catalogue-labels';

const NAME: Column<InstrumentView> = { key: 'name', label: 'Name', sortValue: (i) => i.name, render: (i) => i.name };

const COLUMNS: Column<InstrumentView>[] = [
  { key: 'kind', label: 'Kind', sortValue: (i) => INSTRUMENT_KIND_LABELS[i.kind], render: (i) => INSTRUMENT_KIND_LABELS[i.kind] },
  { key: 'serial', label: 'Serial number', sortValue: (i) => i.serialNumber, render: (i) => <span className="tabular">{i.serialNumber || '—'}</span> },
  ...calibrationColumns<InstrumentView>(),
];

export function InstrumentsPage() {
  return (
    <RecordListView
      kind="instruments"
      title="Instruments"
      description="Meters, probes, goniometers and loggers that take readings, with their calibration."
      plural="instruments"
      newLabel="New instrument"
      basePath="/equipment/instruments"
      filterHelp="Part of a name, kind or serial number."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(i) => `${i.name} ${INSTRUMENT_KIND_LABELS[i.kind]} ${i.serialNumber}`}
    />
  );
}
