import { queryOptions } from '@tanstack/react-query';

import { InkListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getInks(signal?: AbortSignal) {
  return InkListSchema.parse(await apiClient.get('/api/inks', { signal })).inks;
}

export const inksQueryOptions = () => queryOptions({ queryKey: runKeys.source('inks'), queryFn: ({ signal }) => getInks(signal), staleTime: 60_000 });
