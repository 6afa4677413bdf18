import { queryOptions } from '@tanstack/react-query';

import { SubstrateWettingSchema, type SubstrateWetting } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { catalogueKeys } from './catalogue-keys';

export async function getSubstrateWetting(substrateId: number, signal?: AbortSignal): Promise<SubstrateWetting> {
  return SubstrateWettingSchema.parse(await apiClient.get(`/api/substrates/${substrateId}/wetting`, { signal }));
}

export const substrateWettingQueryOptions = (substrateId: number) =>
  queryOptions({ queryKey: catalogueKeys.wetting(substrateId), queryFn: ({ signal }) => getSubstrateWetting(substrateId, signal) });
