import { PageHeader } from '../../../components/ui/page-header';
import { StatusBadge } from '../../../components/ui/status-badge';
import { InkCautions } from '../components/ink-cautions';
import { InkJetting } from '../components/ink-jetting';
import { InkProperties } from '../components/ink-properties';
import { MaterialLots } from '../components/material-lots';
import { RecordActions } from '../components/record-actions';
import { INK_FUNCTION_LABELS } from '../utils/catalogue-labels';
import { useRecord } from './use-record';

/** Loaded lazily by its route: the chart library stays out of the first download. */
export function InkDetailPage() {
  const ink = useRecord('inks');
  return (
    <>
      <PageHeader
        title={ink.name}
        description={
          <span className="flex flex-wrap items-center gap-2">
            {INK_FUNCTION_LABELS[ink.function]} ink{ink.manufacturer ? ` from ${ink.manufacturer}` : ''}
            {ink.archived ? <StatusBadge tone="neutral" label="Archived" icon="archive" /> : null}
          </span>
        }
        actions={<RecordActions kind="inks" record={ink} name={ink.name} editPath={`/materials/inks/${ink.id}/edit`} />}
      />
      <div className="flex flex-col gap-6">
        <InkJetting inkId={ink.id} />
        <InkCautions ink={ink} />
        <MaterialLots materialType="ink" materialId={ink.id} materialName={ink.name} />
        <InkProperties ink={ink} />
      </div>
    </>
  );
}
