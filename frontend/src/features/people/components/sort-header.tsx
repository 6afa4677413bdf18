import { Icon } from '../../../components/icons/icon';
import type { PeopleSort, PeopleSortKey } from '../utils/sort-people';

type SortHeaderProps = { label: string; sortKey: PeopleSortKey; sort: PeopleSort; onSort: (key: PeopleSortKey) => void };

/** A column header that sorts; `aria-sort` tells assistive tech the current order. */
export function SortHeader({ label, sortKey, sort, onSort }: SortHeaderProps) {
  const isActive = sort.key === sortKey;
  const icon = !isActive ? 'sortNone' : sort.direction === 'ascending' ? 'sortUp' : 'sortDown';
  return (
    <th scope="col" aria-sort={isActive ? sort.direction : undefined} className="sticky top-0 z-10 bg-graphite-100 p-0 text-left">
      <button type="button" onClick={() => onSort(sortKey)} className="flex min-h-11 w-full items-center gap-1.5 whitespace-nowrap px-3 font-bold hover:bg-graphite-200">
        {label}
        <Icon name={icon} className={`size-4 ${isActive ? '' : 'text-graphite-500'}`} />
      </button>
    </th>
  );
}
