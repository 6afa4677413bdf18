import { queryOptions, useQuery, useSuspenseQuery } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** One version's content, state, people and the checks the server worked out. */
export async function getRecipeVersion(id: number, signal?: AbortSignal): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.get(`/api/recipe-versions/${id}`, { signal }));
}

export const recipeVersionQueryOptions = (id: number) =>
  queryOptions({ queryKey: recipeKeys.version(id), queryFn: ({ signal }) => getRecipeVersion(id, signal) });

export const useRecipeVersion = (id: number) => useSuspenseQuery(recipeVersionQueryOptions(id)).data;

/** For the diff: a version that may not be picked yet. */
export const useOptionalRecipeVersion = (id: number | null) =>
  useQuery({ ...recipeVersionQueryOptions(id ?? 0), enabled: id !== null });
