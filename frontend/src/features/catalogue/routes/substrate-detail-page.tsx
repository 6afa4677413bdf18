import { useSuspenseQuery } from '@tanstack/react-query';

import { PageHeader } from '../../../components/ui/page-header';
import { StatusBadge } from '../../../components/ui/status-badge';
import { substrateWettingQueryOptions } from '../api/get-substrate-wetting';
import { MaterialLots } from '../components/material-lots';
import { RecordActions } from '../components/record-actions';
import { SubstrateEnergy } from '../components/substrate-energy';
import { SubstrateProperties } from '../components/substrate-properties';
import { SubstrateWettingTable } from '../components/substrate-wetting-table';
import { SUBSTRATE_CLASS_LABELS } from '../utils/catalogue-labels';
import { useRecord } from './use-record';

export function SubstrateDetailPage() {
  const substrate = useRecord('substrates');
  const { data: wetting } = useSuspenseQuery(substrateWettingQueryOptions(substrate.id));
  return (
    <>
      <PageHeader
        title={substrate.name}
        description={
          <span className="flex flex-wrap items-center gap-2">
            {SUBSTRATE_CLASS_LABELS[substrate.substrateClass]}
            {substrate.manufacturer ? ` from ${substrate.manufacturer}` : ''}
            {substrate.archived ? <StatusBadge tone="neutral" label="Archived" icon="archive" /> : null}
          </span>
        }
        actions={<RecordActions kind="substrates" record={substrate} name={substrate.name} editPath={`/materials/substrates/${substrate.id}/edit`} />}
      />
      <div className="flex flex-col gap-6">
        <SubstrateEnergy substrate={substrate} wetting={wetting} />
        <SubstrateWettingTable wetting={wetting} />
        <SubstrateProperties substrate={substrate} />
        <MaterialLots materialType="substrate" materialId={substrate.id} materialName={substrate.name} />
      </div>
    </>
  );
}
