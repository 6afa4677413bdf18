import { queryOptions } from '@tanstack/react-query';

import { QualityDashboardSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { homeKeys } from './home-keys';

/** The quality overview's figures, for the counts on the home page. */
export const qualityWaitingQueryOptions = () =>
  queryOptions({
    queryKey: homeKeys.quality(),
    staleTime: 0,
    queryFn: async ({ signal }) => QualityDashboardSchema.parse(await apiClient.get('/api/quality/dashboard', { signal })),
  });
