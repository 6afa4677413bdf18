import { useMutation, useQueryClient } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { storeVersion } from './version-cache';

export type NewVersionVariables = { recipeId: number; fromVersionId: number };

/** A new draft copied from the version named (the server allows one open version at a time). */
export async function startNewVersion({ recipeId, fromVersionId }: NewVersionVariables): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.post(`/api/recipes/${recipeId}/versions`, { fromVersionId }));
}

export function useStartNewVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: startNewVersion, onSuccess: (view) => storeVersion(queryClient, view) });
}
