import { describe, expect, it } from 'vitest';

import { filtersFromSearch, RUNS_PAGE_SIZE, searchFor } from './run-list-filters';

describe('run list filters', () => {
  it.each([
    ['', { state: '', q: '', page: 1 }],
    ['?state=on-hold&q=%20TRACE%20&page=3', { state: 'on-hold', q: 'TRACE', page: 3 }],
    ['?state=lost&page=-2', { state: '', q: '', page: 1 }],
    ['?page=2.5', { state: '', q: '', page: 1 }],
  ])('when the address search is "%s", then the filters are %j', (search, expected) => {
    expect(filtersFromSearch(new URLSearchParams(search))).toEqual({ ...expected, pageSize: RUNS_PAGE_SIZE });
  });

  it('when filters are at their defaults, then the address carries none of them', () => {
    expect(searchFor({ state: '', q: '', page: 1 })).toBe('');
    expect(searchFor({ state: 'completed', q: 'heater', page: 2 })).toBe('?state=completed&q=heater&page=2');
  });
});
