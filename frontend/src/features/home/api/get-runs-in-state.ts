import { queryOptions } from '@tanstack/react-query';

import { RunListSchema, type RunState } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { homeKeys } from './home-keys';

/** The first few runs in one state and how many there are in all. */
export const HOME_RUNS_SHOWN = 5;

export const runsInStateQueryOptions = (state: RunState) =>
  queryOptions({
    queryKey: homeKeys.runs(state),
    staleTime: 0,
    queryFn: async ({ signal }) => RunListSchema.parse(await apiClient.get('/api/runs', { query: { state, page: 1, pageSize: HOME_RUNS_SHOWN }, signal })),
  });
