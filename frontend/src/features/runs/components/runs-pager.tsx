import { Link } from 'react-router';

import { Icon } from '../../../components/icons/icon';
import { buttonClasses } from '../../../components/ui/button-styles';
import type { RunListFilters } from '../api/run-keys';
import { searchFor } from '../utils/run-list-filters';

export function RunsPager({ filters, total }: { filters: RunListFilters; total: number }) {
  const pages = Math.max(1, Math.ceil(total / filters.pageSize));
  if (pages <= 1) return null;
  const { page } = filters;
  return (
    <nav aria-label="Pages of runs" className="mt-4 flex flex-wrap items-center gap-3">
      {page > 1 ? (
        <Link to={{ search: searchFor({ ...filters, page: page - 1 }) }} className={buttonClasses('secondary')}>
          <Icon name="arrowLeft" />
          Previous page
        </Link>
      ) : null}
      <p className="tabular">
        Page {page} of {pages}
      </p>
      {page < pages ? (
        <Link to={{ search: searchFor({ ...filters, page: page + 1 }) }} className={buttonClasses('secondary')}>
          Next page
          <Icon name="chevronRight" />
        </Link>
      ) : null}
    </nav>
  );
}
