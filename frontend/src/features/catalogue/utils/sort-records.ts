export type SortDirection = 'ascending' | 'descending';
export type RecordSort = { key: string; direction: SortDirection };
export type SortValue = string | number | null;

/**
 * Keeps the rows whose search text holds the filter (any part, any case), then sorts them by the
 * given value. Empty values go last in either direction: a missing number is not a small one.
 * The input is left untouched.
 */
export function filterAndSortRecords<T>(
  rows: readonly T[],
  filter: { text: string; searchText: (row: T) => string; showArchived: boolean; isArchived: (row: T) => boolean },
  sort: { direction: SortDirection; value: (row: T) => SortValue },
): T[] {
  const needle = filter.text.trim().toLowerCase();
  const kept = rows.filter(
    (row) => (filter.showArchived || !filter.isArchived(row)) && (!needle || filter.searchText(row).toLowerCase().includes(needle)),
  );
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return kept.sort((a, b) => {
    const x = sort.value(a);
    const y = sort.value(b);
    if (x === null || x === '') return y === null || y === '' ? 0 : 1;
    if (y === null || y === '') return -1;
    const order = typeof x === 'number' && typeof y === 'number' ? x - y : String(x).localeCompare(String(y), undefined, { numeric: true });
    return sign * order;
  });
}
