import type { QueryClient } from '@tanstack/react-query';

import { pinUsersQueryOptions } from '../api/get-pin-users';

export const pinSwitchLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(pinUsersQueryOptions());
  return null;
};
