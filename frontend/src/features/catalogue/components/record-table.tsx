import type { MouseEvent, ReactNode } from 'react';
import { Link, useNavigate } from 'react-router';

import { StatusBadge } from '../../../components/ui/status-badge';
import type { RecordSort, SortValue } from '../utils/sort-records';
import { SortHeader } from './sort-header';

export type Column<T> = {
  key: string;
  label: string;
  unit?: string;
  /** Numbers sit right-aligned, in tabular figures, with the unit in the header. */
  isNumeric?: boolean;
  sortValue: (row: T) => SortValue;
  render: (row: T) => ReactNode;
};

type RecordTableProps<T> = {
  label: string;
  caption: string;
  rows: readonly T[];
  /** The first column names the record and links to it. */
  nameColumn: Column<T>;
  columns: readonly Column<T>[];
  sort: RecordSort;
  onSort: (key: string) => void;
  detailPath: (row: T) => string;
};

const CELL = 'border-t border-graphite-200 px-3 py-2 align-middle';

export function RecordTable<T extends { id: number; archived: boolean }>({ label, caption, rows, nameColumn, columns, sort, onSort, detailPath }: RecordTableProps<T>) {
  const navigate = useNavigate();
  // The whole row opens the record for a pointer; keyboards use the link in its first cell.
  const openRow = (event: MouseEvent, row: T) => {
    if ((event.target as HTMLElement).closest('a, button, input, select')) return;
    navigate(detailPath(row));
  };

  return (
    <div className="max-h-[70vh] overflow-auto rounded-md border border-graphite-300 bg-white" tabIndex={0} role="region" aria-label={label}>
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">{caption}</caption>
        <thead>
          <tr>
            {[nameColumn, ...columns].map((column) => (
              <SortHeader key={column.key} label={column.label} unit={column.unit} isNumeric={column.isNumeric} sortKey={column.key} sort={sort} onSort={onSort} />
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.id} onClick={(event) => openRow(event, row)} className="cursor-pointer hover:bg-copper-50">
              <th scope="row" className={`${CELL} min-w-48 font-bold`}>
                <Link to={detailPath(row)} className="text-graphite-900 underline decoration-graphite-400 underline-offset-4 hover:text-copper-700">
                  {nameColumn.render(row)}
                </Link>
                {row.archived ? (
                  <span className="ml-2 inline-block">
                    <StatusBadge tone="neutral" label="Archived" icon="archive" />
                  </span>
                ) : null}
              </th>
              {columns.map((column) => (
                <td key={column.key} className={`${CELL} ${column.isNumeric ? 'tabular text-right' : ''}`}>
                  {column.render(row)}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
