import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';

import { RecipeDetailSchema, type RecipeDetail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** The recipe with its versions, newest first (no content). */
export async function getRecipe(id: number, signal?: AbortSignal): Promise<RecipeDetail> {
  return RecipeDetailSchema.parse(await apiClient.get(`/api/recipes/${id}`, { signal }));
}

export const recipeQueryOptions = (id: number) => queryOptions({ queryKey: recipeKeys.detail(id), queryFn: ({ signal }) => getRecipe(id, signal) });

export const useRecipe = (id: number) => useSuspenseQuery(recipeQueryOptions(id)).data;
