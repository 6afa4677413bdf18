import type { QueryClient } from '@tanstack/react-query';

import { usersQueryOptions } from '../api/get-users';

export const peopleLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(usersQueryOptions());
  return null;
};
