import type { LotView } from '@tracewright/shared';

import { LotFlags } from '../components/lot-flags';
import { RecordListView } from '../components/record-list-view';
import type { Column } from '../components/record-table';

const KIND_WORDS = { ink: 'Ink', substrate: 'Substrate' } as const;

const NAME: Column<LotView> = { key: 'lotNumber', label: 'Lot number', sortValue: (l) => l.lotNumber, render: (l) => l.lotNumber };

const COLUMNS: Column<LotView>[] = [
  { key: 'material', label: 'Material', sortValue: (l) => l.materialName, render: (l) => l.materialName },
  { key: 'kind', label: 'Kind', sortValue: (l) => KIND_WORDS[l.materialType], render: (l) => KIND_WORDS[l.materialType] },
  { key: 'received', label: 'Received', sortValue: (l) => l.receivedOn, render: (l) => <span className="tabular whitespace-nowrap">{l.receivedOn}</span> },
  { key: 'opened', label: 'Opened', sortValue: (l) => l.openedOn, render: (l) => <span className="tabular whitespace-nowrap">{l.openedOn ?? '—'}</span> },
  { key: 'expires', label: 'Expires', sortValue: (l) => l.expiresOn, render: (l) => <span className="tabular whitespace-nowrap">{l.expiresOn ?? '—'}</span> },
  // Flagged lots first when sorted ascending: they need someone's attention.
  { key: 'flags', label: 'Flags', sortValue: (l) => -l.status.flags.length, render: (l) => <LotFlags status={l.status} /> },
];

export function LotsPage() {
  return (
    <RecordListView
      kind="lots"
      title="Lots"
      description="Every lot of ink and substrate on the shelf, with its dates and today’s flags."
      plural="lots"
      newLabel="New lot"
      basePath="/materials/lots"
      filterHelp="Part of a lot number or material name."
      nameColumn={NAME}
      columns={COLUMNS}
      searchText={(l) => `${l.lotNumber} ${l.materialName}`}
    />
  );
}
