import { queryOptions } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getRecipeVersion(id: number, signal?: AbortSignal): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.get(`/api/recipe-versions/${id}`, { signal }));
}

// A released version never changes, so once read it stays fresh.
export const recipeVersionQueryOptions = (id: number) =>
  queryOptions({ queryKey: runKeys.version(id), queryFn: ({ signal }) => getRecipeVersion(id, signal), staleTime: Infinity });
