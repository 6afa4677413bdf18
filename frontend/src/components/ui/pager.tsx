import { Link } from 'react-router';

import { Icon } from '../icons/icon';
import { buttonClasses } from './button-styles';

type PagerProps = {
  /** What is paged, for the navigation's name: "Pages of runs". */
  label: string;
  page: number;
  pageSize: number;
  total: number;
  /** The address's query string for another page, keeping the list's filters. */
  searchFor: (page: number) => string;
};

/** Previous / next links for a server-paged list; nothing when everything fits on one page. */
export function Pager({ label, page, pageSize, total, searchFor }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  if (pages <= 1) return null;
  return (
    <nav aria-label={label} className="mt-4 flex flex-wrap items-center gap-3">
      {page > 1 ? (
        <Link to={{ search: searchFor(page - 1) }} className={buttonClasses('secondary')}>
          <Icon name="arrowLeft" />
          Previous page
        </Link>
      ) : null}
      <p className="tabular">
        Page {page} of {pages}
      </p>
      {page < pages ? (
        <Link to={{ search: searchFor(page + 1) }} className={buttonClasses('secondary')}>
          Next page
          <Icon name="chevronRight" />
        </Link>
      ) : null}
    </nav>
  );
}
