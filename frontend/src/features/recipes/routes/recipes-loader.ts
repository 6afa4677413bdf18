import type { QueryClient } from '@tanstack/react-query';

import { recipesQueryOptions } from '../api/get-recipes';

export const recipesLoader = (queryClient: QueryClient) => async () => {
  await queryClient.ensureQueryData(recipesQueryOptions());
  return null;
};
