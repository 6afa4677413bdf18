import { queryOptions } from '@tanstack/react-query';

import { LotListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getLots(signal?: AbortSignal) {
  return LotListSchema.parse(await apiClient.get('/api/lots', { signal })).lots;
}

export const lotsQueryOptions = () => queryOptions({ queryKey: runKeys.source('lots'), queryFn: ({ signal }) => getLots(signal), staleTime: 60_000 });
