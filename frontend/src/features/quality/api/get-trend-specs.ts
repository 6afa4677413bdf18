import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';

import { TrendSpecListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export type TrendSpecOption = z.infer<typeof TrendSpecListSchema>['specs'][number];

export async function getTrendSpecs(signal?: AbortSignal): Promise<TrendSpecOption[]> {
  return TrendSpecListSchema.parse(await apiClient.get('/api/trends/specs', { signal })).specs;
}

export const trendSpecsQueryOptions = () =>
  queryOptions({ queryKey: qualityKeys.trendSpecs(), queryFn: ({ signal }) => getTrendSpecs(signal) });
