import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { trendSpecsQueryOptions } from '../api/get-trend-specs';
import { trendQueryOptions } from '../api/get-trend';
import { trendChoiceOf } from '../utils/trend-search';

/** The spec list always; the chosen trend too, when the address names one. */
export const trendsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const choice = trendChoiceOf(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(trendSpecsQueryOptions()),
      choice ? queryClient.ensureQueryData(trendQueryOptions(choice.recipeId, choice.specId)) : null,
    ]);
    return null;
  };
