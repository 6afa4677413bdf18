import { queryOptions } from '@tanstack/react-query';

import { TrendSchema, type Trend } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

/** Points, chart numbers and capability come computed from the API (the shared process library). */
export async function getTrend(recipeId: number, specId: string, signal?: AbortSignal): Promise<Trend> {
  return TrendSchema.parse(await apiClient.get('/api/trends', { query: { recipeId, specId }, signal }));
}

export const trendQueryOptions = (recipeId: number, specId: string) =>
  queryOptions({ queryKey: qualityKeys.trend(recipeId, specId), queryFn: ({ signal }) => getTrend(recipeId, specId, signal) });
