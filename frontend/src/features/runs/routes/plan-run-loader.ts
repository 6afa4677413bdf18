import type { QueryClient } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';

import { labSettingsQueryOptions } from '../api/get-lab-settings';
import { recipeVersionQueryOptions } from '../api/get-recipe-version';
import { releasedRecipesQueryOptions } from '../api/get-released-recipes';
import { ensurePlanSources } from '../hooks/use-plan-sources';
import { versionParam } from '../utils/version-param';

export const planRunLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    const versionId = versionParam(new URL(request.url).searchParams);
    await Promise.all([
      queryClient.ensureQueryData(releasedRecipesQueryOptions()),
      queryClient.ensureQueryData(labSettingsQueryOptions()),
      ensurePlanSources(queryClient),
    ]);
    // A version named in the address may be gone; its own section says so instead of the whole page.
    if (versionId !== null) void queryClient.prefetchQuery(recipeVersionQueryOptions(versionId));
    return null;
  };
