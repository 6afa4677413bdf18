import { queryOptions } from '@tanstack/react-query';

import { RunListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys, type RunListFilters } from './run-keys';

export async function getRuns(filters: RunListFilters, signal?: AbortSignal) {
  const { state, q, page, pageSize } = filters;
  return RunListSchema.parse(await apiClient.get('/api/runs', { query: { state, q, page, pageSize }, signal }));
}

export const runsQueryOptions = (filters: RunListFilters) =>
  queryOptions({ queryKey: runKeys.list(filters), queryFn: ({ signal }) => getRuns(filters, signal) });
