import { useSuspenseQuery } from '@tanstack/react-query';
import { Link, useSearchParams } from 'react-router';

import { Pager } from '../../../components/ui/pager';
import { searchFor } from '../utils/run-list-filters';
import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';
import { PageHeader } from '../../../components/ui/page-header';
import { useSession } from '../../../lib/session';
import { runsQueryOptions } from '../api/get-runs';
import type { RunListFilters } from '../api/run-keys';
import { RunsFilterForm } from '../components/runs-filter-form';
import { RunsTable } from '../components/runs-table';
import { RUN_PLANNERS } from '../utils/run-actions';
import { filtersFromSearch } from '../utils/run-list-filters';

function countText(filters: RunListFilters, shown: number, total: number): string {
  if (total === 0) return filters.state || filters.q ? 'No runs match these filters.' : 'No runs planned yet.';
  const first = (filters.page - 1) * filters.pageSize + 1;
  return `Runs ${first}–${first + shown - 1} of ${total}`;
}

export function RunsPage() {
  const [search] = useSearchParams();
  const filters = filtersFromSearch(search);
  const { data } = useSuspenseQuery(runsQueryOptions(filters));
  const { user } = useSession();

  return (
    <>
      <PageHeader
        title="Runs"
        description="Each run makes a released recipe version a number of times. Open one for its record, traveller and labels."
        actions={
          RUN_PLANNERS.includes(user.role) ? (
            <Link to="/runs/new" className={buttonClasses('primary')}>
              <Icon name="plus" />
              Plan a run
            </Link>
          ) : null
        }
      />
      <RunsFilterForm filters={filters} />
      <p role="status" className="mb-2 text-sm text-graphite-600">
        {countText(filters, data.runs.length, data.total)}
      </p>
      {data.runs.length > 0 ? <RunsTable runs={data.runs} /> : null}
      <Pager label="Pages of runs" page={filters.page} pageSize={filters.pageSize} total={data.total} searchFor={(page) => searchFor({ ...filters, page })} />
    </>
  );
}
