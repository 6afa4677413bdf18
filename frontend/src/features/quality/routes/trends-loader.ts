import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { trendSpecsQueryOptions } from '../api/get-trend-specs';
import { trendQueryOptions } from '../api/get-trend';
import { listedChoice, trendChoiceOf } from '../utils/trend-search';

/** The spec list always; the chosen trend too, when the address names one the list has. */
export const trendsLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const asked = trendChoiceOf(new URL(request.url).searchParams);
    const trend = asked ? queryClient.ensureQueryData(trendQueryOptions(asked.recipeId, asked.specId)) : null;
    // Asked for together; a spec the list does not have is not waited for (the page says so), and
    // its refusal is not left unhandled.
    trend?.catch(() => undefined);
    const specs = await queryClient.ensureQueryData(trendSpecsQueryOptions());
    if (listedChoice(asked, specs)) await trend;
    return null;
  };
