import { useMutation, useQueryClient } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView, type SendBackInput } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { storeVersion } from './version-cache';

export type SendBackVariables = { versionId: number; input: SendBackInput };

/** In review → draft, with the reviewer's comment for the author. */
export async function sendBackVersion({ versionId, input }: SendBackVariables): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.post(`/api/recipe-versions/${versionId}/send-back`, input));
}

export function useSendBackVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: sendBackVersion, onSuccess: (view) => storeVersion(queryClient, view) });
}
