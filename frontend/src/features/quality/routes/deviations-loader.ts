import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { deviationQueueQueryOptions } from '../api/get-deviation-queue';
import { parseDeviationSearch } from '../utils/deviation-search';

export const deviationsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    await queryClient.ensureQueryData(deviationQueueQueryOptions(parseDeviationSearch(new URL(request.url).searchParams)));
    return null;
  };
