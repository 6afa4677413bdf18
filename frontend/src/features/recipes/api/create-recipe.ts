import { useMutation, useQueryClient } from '@tanstack/react-query';

import { type RecipeInput, RecipeDetailSchema, type RecipeDetail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { recipeKeys } from './recipe-keys';

/** Creates the recipe and its draft version 1. */
export async function createRecipe(input: RecipeInput): Promise<RecipeDetail> {
  return RecipeDetailSchema.parse(await apiClient.post('/api/recipes', input));
}

export function useCreateRecipe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createRecipe,
    onSuccess: (recipe) => {
      queryClient.setQueryData(recipeKeys.detail(recipe.id), recipe);
      return queryClient.invalidateQueries({ queryKey: recipeKeys.list() });
    },
  });
}
