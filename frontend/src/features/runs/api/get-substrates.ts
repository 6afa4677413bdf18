import { queryOptions } from '@tanstack/react-query';

import { SubstrateListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getSubstrates(signal?: AbortSignal) {
  return SubstrateListSchema.parse(await apiClient.get('/api/substrates', { signal })).substrates;
}

export const substratesQueryOptions = () => queryOptions({ queryKey: runKeys.source('substrates'), queryFn: ({ signal }) => getSubstrates(signal), staleTime: 60_000 });
