import { queryOptions } from '@tanstack/react-query';

import { DeviationDetailSchema, type DeviationDetail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export async function getDeviation(id: number, signal?: AbortSignal): Promise<DeviationDetail> {
  return DeviationDetailSchema.parse(await apiClient.get(`/api/deviations/${id}`, { signal }));
}

export const deviationQueryOptions = (id: number) =>
  queryOptions({ queryKey: qualityKeys.detail(id), queryFn: ({ signal }) => getDeviation(id, signal) });
