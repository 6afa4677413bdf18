import { useSuspenseQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router';

import type { DeviationQuery } from '@tracewright/shared';

import { deviationSearchFor } from '../utils/deviation-search';
import { Pager } from '../../../components/ui/pager';
import { PageHeader } from '../../../components/ui/page-header';
import { deviationQueueQueryOptions } from '../api/get-deviation-queue';
import { OverviewLinkCard } from '../components/overview-link-card';
import { QueueFilterForm } from '../components/queue-filter-form';
import { QueueTable } from '../components/queue-table';
import { SeverityChips } from '../components/severity-chips';
import { StateChips } from '../components/state-chips';
import { parseDeviationSearch } from '../utils/deviation-search';

function countText(query: DeviationQuery, shown: number, total: number): string {
  if (total === 0) return 'No deviations match these filters.';
  const first = (query.page - 1) * query.pageSize + 1;
  return `Deviations ${first}–${first + shown - 1} of ${total}`;
}

export function DeviationsPage() {
  const [search] = useSearchParams();
  const query = parseDeviationSearch(search);
  const { data } = useSuspenseQuery(deviationQueueQueryOptions(query));

  return (
    <>
      <PageHeader title="Deviations" description="Every departure from a recipe, raised by a rule or reported at the bench. Open one to review it and decide what happens to the pieces." />
      <OverviewLinkCard />
      <StateChips query={query} counts={data.countsByState} />
      <SeverityChips query={query} />
      <QueueFilterForm query={query} />
      <p role="status" className="mb-2 text-sm text-graphite-600">
        {countText(query, data.items.length, data.total)}
      </p>
      {data.items.length > 0 ? <QueueTable items={data.items} /> : null}
      <Pager label="Pages of deviations" page={query.page} pageSize={query.pageSize} total={data.total} searchFor={(page) => deviationSearchFor({ ...query, page })} />
    </>
  );
}
