import { queryOptions } from '@tanstack/react-query';

import { QualityDashboardSchema, type QualityDashboard } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export async function getQualityDashboard(signal?: AbortSignal): Promise<QualityDashboard> {
  return QualityDashboardSchema.parse(await apiClient.get('/api/quality/dashboard', { signal }));
}

export const qualityDashboardQueryOptions = () =>
  queryOptions({ queryKey: qualityKeys.dashboard(), queryFn: ({ signal }) => getQualityDashboard(signal) });
