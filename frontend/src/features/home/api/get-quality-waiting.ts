import { queryOptions } from '@tanstack/react-query';

import { QualityWaitingSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { homeKeys } from './home-keys';

/** What waits for a quality decision, counted (the overview lists the same). */
export const qualityWaitingQueryOptions = () =>
  queryOptions({
    queryKey: homeKeys.quality(),
    staleTime: 0,
    queryFn: async ({ signal }) => QualityWaitingSchema.parse(await apiClient.get('/api/quality/waiting', { signal })),
  });
