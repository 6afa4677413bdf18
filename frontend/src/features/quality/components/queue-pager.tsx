import { Link } from 'react-router';

import type { DeviationQuery } from '@tracewright/shared';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';
import { deviationSearchFor } from '../utils/deviation-search';

export function QueuePager({ query, total }: { query: DeviationQuery; total: number }) {
  const pages = Math.max(1, Math.ceil(total / query.pageSize));
  if (pages <= 1) return null;
  const { page } = query;
  return (
    <nav aria-label="Pages of deviations" className="mt-4 flex flex-wrap items-center gap-3">
      {page > 1 ? (
        <Link to={{ search: deviationSearchFor({ ...query, page: page - 1 }) }} className={buttonClasses('secondary')}>
          <Icon name="arrowLeft" />
          Previous page
        </Link>
      ) : null}
      <p className="tabular">
        Page {page} of {pages}
      </p>
      {page < pages ? (
        <Link to={{ search: deviationSearchFor({ ...query, page: page + 1 }) }} className={buttonClasses('secondary')}>
          Next page
          <Icon name="chevronRight" />
        </Link>
      ) : null}
    </nav>
  );
}
