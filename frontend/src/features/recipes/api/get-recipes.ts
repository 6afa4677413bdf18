import { queryOptions, useSuspenseQuery } from '@tanstack/react-query';

import { RecipeListSchema, type RecipeSummary } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

export async function getRecipes(signal?: AbortSignal): Promise<RecipeSummary[]> {
  return RecipeListSchema.parse(await apiClient.get('/api/recipes', { signal })).recipes;
}

export const recipesQueryOptions = () => queryOptions({ queryKey: recipeKeys.list(), queryFn: ({ signal }) => getRecipes(signal) });

export const useRecipes = () => useSuspenseQuery(recipesQueryOptions()).data;
