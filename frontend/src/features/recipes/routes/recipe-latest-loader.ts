import type { QueryClient } from '@tanstack/react-query';
import { data, redirect, type LoaderFunctionArgs } from 'react-router';

import { recipeQueryOptions } from '../api/get-recipe';
import { recipeVersionPath } from '../utils/recipe-paths';
import { routeId } from './route-ids';

/** /recipes/:recipeId opens the newest version (the list is newest first). */
export const recipeLatestLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const recipe = await queryClient.ensureQueryData(recipeQueryOptions(routeId(params, 'recipeId')));
    const latest = recipe.versions[0];
    if (!latest) throw data(null, { status: 404 });
    return redirect(recipeVersionPath(recipe.id, latest.id));
  };
