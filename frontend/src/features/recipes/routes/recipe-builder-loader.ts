import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';

import { processRecordsQueryOptions } from '../api/get-process-records';
import { recipeQueryOptions } from '../api/get-recipe';
import { recipeVersionQueryOptions } from '../api/get-recipe-version';
import { routeId } from './route-ids';

/** The version, its recipe's history and the lab's records, all before the builder draws. */
export const recipeBuilderLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const recipeId = routeId(params, 'recipeId');
    const versionId = routeId(params, 'versionId');
    const [version] = await Promise.all([
      queryClient.ensureQueryData(recipeVersionQueryOptions(versionId)),
      queryClient.ensureQueryData(recipeQueryOptions(recipeId)),
      queryClient.ensureQueryData(processRecordsQueryOptions()),
    ]);
    if (version.recipeId !== recipeId) throw data(null, { status: 404 });
    return null;
  };
