import { Icon } from '../../../components/icons/icon';
import type { RecordSort } from '../utils/sort-records';

type SortHeaderProps = { label: string; unit?: string; sortKey: string; sort: RecordSort; isNumeric?: boolean; onSort: (key: string) => void };

/** A column header that sorts; `aria-sort` tells assistive tech the current order. Units sit in the header, under the name. */
export function SortHeader({ label, unit, sortKey, sort, isNumeric = false, onSort }: SortHeaderProps) {
  const isActive = sort.key === sortKey;
  const icon = !isActive ? 'sortNone' : sort.direction === 'ascending' ? 'sortUp' : 'sortDown';
  return (
    <th scope="col" aria-sort={isActive ? sort.direction : undefined} className="sticky top-0 z-10 bg-graphite-100 p-0">
      <button
        type="button"
        onClick={() => onSort(sortKey)}
        className={`flex min-h-11 w-full items-center gap-1.5 whitespace-nowrap px-3 font-bold hover:bg-graphite-200 ${isNumeric ? 'justify-end' : ''}`}
      >
        {/* The unit goes under the name, so numeric columns stay narrow and the text ones keep the room. */}
        <span className={`flex flex-col leading-tight ${isNumeric ? 'items-end' : 'items-start'}`}>
          <span>{label}</span>
          {unit ? <span className="text-sm font-normal text-graphite-600">({unit})</span> : null}
        </span>
        <Icon name={icon} className={`size-4 ${isActive ? '' : 'text-graphite-500'}`} />
      </button>
    </th>
  );
}
