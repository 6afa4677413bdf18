import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { runsQueryOptions } from '../api/get-runs';
import { filtersFromSearch } from '../utils/run-list-filters';

export const runsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(runsQueryOptions(filtersFromSearch(new URL(request.url).searchParams)));
    return null;
  };
