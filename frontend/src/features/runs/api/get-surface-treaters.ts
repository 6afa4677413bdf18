import { queryOptions } from '@tanstack/react-query';

import { SurfaceTreaterListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getSurfaceTreaters(signal?: AbortSignal) {
  return SurfaceTreaterListSchema.parse(await apiClient.get('/api/surface-treaters', { signal })).surfaceTreaters;
}

export const surfaceTreatersQueryOptions = () => queryOptions({ queryKey: runKeys.source('surface-treaters'), queryFn: ({ signal }) => getSurfaceTreaters(signal), staleTime: 60_000 });
