import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';

import { PageHeader } from '../../../components/ui/page-header';
import { auditEventsQueryOptions } from '../api/get-audit-events';
import { AuditFilters } from '../components/audit-filters';
import { AuditPager } from '../components/audit-pager';
import { AuditTable } from '../components/audit-table';
import { parseAuditSearch } from '../utils/audit-search';

export function AuditPage() {
  const [params] = useSearchParams();
  const query = parseAuditSearch(params);
  const { data } = useSuspenseQuery(auditEventsQueryOptions(query));

  return (
    <>
      <PageHeader
        title="Audit log"
        description="Every change to people, settings and records: who made it, when, and the values before and after. Entries are never edited or removed."
      />
      {/* Keyed by the address so the fields show the applied filters after back/forward. */}
      <AuditFilters key={params.toString()} query={query} />
      <AuditTable events={data.events} />
      <AuditPager page={query.page} pageSize={query.pageSize} total={data.total} />
    </>
  );
}
