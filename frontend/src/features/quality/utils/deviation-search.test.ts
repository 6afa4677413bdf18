import { describe, expect, it } from 'vitest';

import { deviationSearchFor, parseDeviationSearch } from './deviation-search';

describe('deviation search', () => {
  it('when the address holds lists and filters, then they are read with the API schema and written back the same', () => {
    const search = '?state=open%2Cin-review&severity=critical&recipeId=12&q=oven&sort=severity&page=3';
    const query = parseDeviationSearch(new URLSearchParams(search));

    expect(query).toMatchObject({ state: ['open', 'in-review'], severity: ['critical'], recipeId: 12, q: 'oven', sort: 'severity', page: 3, pageSize: 50 });
    expect(deviationSearchFor(query)).toBe(search);
  });

  it('when a value in the address is wrong, then only that filter falls back to its default', () => {
    const query = parseDeviationSearch(new URLSearchParams('state=lost&page=abc&q=cure'));

    expect(query.state).toBeUndefined();
    expect(query).toMatchObject({ page: 1, q: 'cure' });
    expect(deviationSearchFor(query)).toBe('?q=cure');
  });
});
