import { queryOptions } from '@tanstack/react-query';

import { InstrumentListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getInstruments(signal?: AbortSignal) {
  return InstrumentListSchema.parse(await apiClient.get('/api/instruments', { signal })).instruments;
}

export const instrumentsQueryOptions = () => queryOptions({ queryKey: runKeys.source('instruments'), queryFn: ({ signal }) => getInstruments(signal), staleTime: 60_000 });
