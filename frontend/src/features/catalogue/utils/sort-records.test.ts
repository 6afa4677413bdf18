import { describe, expect, it } from 'vitest';

import { filterAndSortRecords, type SortDirection, type SortValue } from './sort-records';

type Row = { name: string; viscosity: number | null; archived: boolean };
const ROWS: Row[] = [
  { name: 'Silver flake B', viscosity: 12, archived: false },
  { name: 'Carbon paste', viscosity: null, archived: false },
  { name: 'Silver nano A10', viscosity: 8.5, archived: true },
  { name: 'Silver nano A9', viscosity: 30, archived: false },
];

const run = (text: string, showArchived: boolean, direction: SortDirection, value: (r: Row) => SortValue) =>
  filterAndSortRecords(ROWS, { text, searchText: (r) => r.name, showArchived, isArchived: (r) => r.archived }, { direction, value }).map((r) => r.name);

describe('filterAndSortRecords', () => {
  it.each<[string, boolean, SortDirection, string[]]>([
    ['', false, 'ascending', ['Carbon paste', 'Silver flake B', 'Silver nano A9']],
    ['', true, 'ascending', ['Carbon paste', 'Silver flake B', 'Silver nano A9', 'Silver nano A10']],
    ['', true, 'descending', ['Silver nano A10', 'Silver nano A9', 'Silver flake B', 'Carbon paste']],
    ['  NANO ', true, 'ascending', ['Silver nano A9', 'Silver nano A10']],
    ['nothing like it', true, 'ascending', []],
  ])('when filtering %j (archived shown: %s) by name %s, then the rows are %j', (text, showArchived, direction, expected) => {
    expect(run(text, showArchived, direction, (r) => r.name)).toEqual(expected);
  });

  it.each<[SortDirection, string[]]>([
    ['ascending', ['Silver nano A10', 'Silver flake B', 'Silver nano A9', 'Carbon paste']],
    ['descending', ['Silver nano A9', 'Silver flake B', 'Silver nano A10', 'Carbon paste']],
  ])('when sorting by a number %s, then it sorts numerically and an empty value goes last', (direction, expected) => {
    expect(run('', true, direction, (r) => r.viscosity)).toEqual(expected);
  });

  it('when sorting, then the given rows are left untouched', () => {
    const before = ROWS.map((r) => r.name);
    run('', true, 'descending', (r) => r.name);
    expect(ROWS.map((r) => r.name)).toEqual(before);
  });
});
