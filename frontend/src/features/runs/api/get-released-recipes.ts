import { queryOptions } from '@tanstack/react-query';

import { RecipeListSchema, type RecipeSummary } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export type ReleasedRecipe = RecipeSummary & { releasedVersion: NonNullable<RecipeSummary['releasedVersion']> };

/** Only a released version can be run; recipes without one are left out of the picker. */
export async function getReleasedRecipes(signal?: AbortSignal): Promise<ReleasedRecipe[]> {
  const { recipes } = RecipeListSchema.parse(await apiClient.get('/api/recipes', { signal }));
  return recipes.filter((r): r is ReleasedRecipe => r.releasedVersion !== null && !r.archived);
}

export const releasedRecipesQueryOptions = () =>
  queryOptions({ queryKey: runKeys.source('released-recipes'), queryFn: ({ signal }) => getReleasedRecipes(signal), staleTime: 60_000 });
