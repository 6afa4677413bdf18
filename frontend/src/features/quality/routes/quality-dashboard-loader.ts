import type { QueryClient } from '@tanstack/react-query';

import { qualityDashboardQueryOptions } from '../api/get-quality-dashboard';

export const qualityDashboardLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(qualityDashboardQueryOptions());
  return null;
};
