import { useMutation, useQueryClient } from '@tanstack/react-query';

import { type SaveDraftInput, RecipeVersionViewSchema, type RecipeVersionView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { storeVersion } from './version-cache';

export type SaveDraftVariables = { versionId: number; input: SaveDraftInput };

/** The whole content plus the lock version it was based on; a stale lock version answers 409. */
export async function saveDraft({ versionId, input }: SaveDraftVariables): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.put(`/api/recipe-versions/${versionId}`, input));
}

export function useSaveDraft() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: saveDraft, onSuccess: (view) => storeVersion(queryClient, view) });
}
