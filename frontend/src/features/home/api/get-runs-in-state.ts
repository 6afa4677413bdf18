import { queryOptions } from '@tanstack/react-query';

import { RunListSchema, type RunState } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { homeKeys } from './home-keys';

/** The first `shown` runs in one state and how many there are in all (shown 1 when only the count is read). */
export const runsInStateQueryOptions = (state: RunState, shown: number) =>
  queryOptions({
    queryKey: homeKeys.runs(state, shown),
    staleTime: 0,
    queryFn: async ({ signal }) => RunListSchema.parse(await apiClient.get('/api/runs', { query: { state, page: 1, pageSize: shown }, signal })),
  });
