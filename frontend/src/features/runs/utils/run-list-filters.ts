import { RunStateSchema } from '@tracewright/shared';

import type { RunListFilters } from '../api/run-keys';

export const RUNS_PAGE_SIZE = 25;

/** The list's filters live in the address, so a filtered list can be bookmarked and shared. */
export function filtersFromSearch(search: URLSearchParams): RunListFilters {
  const state = RunStateSchema.safeParse(search.get('state'));
  const page = Number(search.get('page'));
  return {
    state: state.success ? state.data : '',
    q: (search.get('q') ?? '').trim(),
    page: Number.isInteger(page) && page > 1 ? page : 1,
    pageSize: RUNS_PAGE_SIZE,
  };
}

/** The address search for filters, leaving out what is at its default. */
export function searchFor(filters: Pick<RunListFilters, 'state' | 'q' | 'page'>): string {
  const params = new URLSearchParams();
  if (filters.state) params.set('state', filters.state);
  if (filters.q) params.set('q', filters.q);
  if (filters.page > 1) params.set('page', String(filters.page));
  const text = params.toString();
  return text ? `?${text}` : '';
}
