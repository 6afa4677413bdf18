import { queryOptions } from '@tanstack/react-query';

import { HeatSourceListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

/** Planning offers machines in use; a traveller also names ones archived since the run was planned. */
export async function getHeatSources(includeArchived: boolean, signal?: AbortSignal) {
  const query = { archived: includeArchived ? 'all' : undefined };
  return HeatSourceListSchema.parse(await apiClient.get('/api/heat-sources', { query, signal })).heatSources;
}

export const heatSourcesQueryOptions = (includeArchived = false) =>
  queryOptions({
    queryKey: runKeys.source(includeArchived ? 'heat-sources-all' : 'heat-sources'),
    queryFn: ({ signal }) => getHeatSources(includeArchived, signal),
    staleTime: 60_000,
  });
