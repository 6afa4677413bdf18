import type { Printer } from '@tracewright/shared';

import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';
import { formatValue } from '../utils/format-value';

const NAME: Column<Printer> = { key: 'name', label: 'Name', sortValue: (p) => p.name, render: (p) => p.name };

const COLUMNS: Column<Printer>[] = [
  { key: 'model', label: 'Model', sortValue: (p) => p.model, render: (p) => p.model || '—' },
  { key: 'nozzle', label: 'Nozzle', unit: 'µm', isNumeric: true, sortValue: (p) => p.nozzleDiameterUm, render: (p) => formatValue(p.nozzleDiameterUm) },
  { key: 'drop', label: 'Drop', unit: 'pL', isNumeric: true, sortValue: (p) => p.dropVolumePl, render: (p) => formatValue(p.dropVolumePl) },
  {
    key: 'speed',
    label: 'Jetting speed',
    unit: 'm/s',
    isNumeric: true,
    sortValue: (p) => p.jettingSpeedMetresPerSecond,
    render: (p) => formatValue(p.jettingSpeedMetresPerSecond),
  },
  { key: 'dpi', label: 'Resolution', unit: 'dpi', isNumeric: true, sortValue: (p) => p.nativeDpi, render: (p) => formatValue(p.nativeDpi) },
  { key: 'channels', label: 'Channels', isNumeric: true, sortValue: (p) => p.channels.length, render: (p) => p.channels.length },
];

export function PrintersPage() {
  return (
    <RecordListView
      kind="printers"
      title="Printers"
      description="Inkjet printers with the nozzle, drop and speed the jetting checks use, and the ink in each channel."
      plural="printers"
      newLabel="New printer"
      basePath="/equipment/printers"
      filterHelp="Part of a name or model."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(p) => `${p.name} ${p.model}`}
    />
  );
}
