import type { QueryClient } from '@tanstack/react-query';

import { settingsQueryOptions } from '../api/get-settings';

export const settingsLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(settingsQueryOptions());
  return null;
};
