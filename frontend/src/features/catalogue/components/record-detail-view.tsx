import type { ReactNode } from 'react';

import { PageHeader } from '../../../components/ui/page-header';
import { StatusBadge } from '../../../components/ui/status-badge';
import type { CatalogueKind } from '../api/catalogue-resources';
import { DetailList, type DetailItem } from './detail-list';
import { DetailSection } from './detail-section';
import { RecordActions } from './record-actions';

type RecordDetailViewProps = {
  kind: CatalogueKind;
  record: { id: number; version: number; archived: boolean; notes: string };
  title: string;
  subtitle: string;
  basePath: string;
  items: readonly DetailItem[];
  /** Status shown above the details (flags, calibration), when the record has one. */
  status?: ReactNode;
  children?: ReactNode;
};

/** A record's page for catalogues without calculations: its values, status, notes and actions. */
export function RecordDetailView({ kind, record, title, subtitle, basePath, items, status, children }: RecordDetailViewProps) {
  return (
    <>
      <PageHeader
        title={title}
        description={
          <span className="flex flex-wrap items-center gap-2">
            {subtitle}
            {record.archived ? <StatusBadge tone="neutral" label="Archived" icon="archive" /> : null}
          </span>
        }
        actions={<RecordActions kind={kind} record={record} name={title} editPath={`${basePath}/${record.id}/edit`} />}
      />
      <div className="flex flex-col gap-6">
        {status}
        <DetailSection title="Details">
          <DetailList items={items} />
          {record.notes ? <p className="mt-4 max-w-prose whitespace-pre-line">{record.notes}</p> : null}
        </DetailSection>
        {children}
      </div>
    </>
  );
}
