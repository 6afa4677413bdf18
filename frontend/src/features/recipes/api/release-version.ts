import { useMutation, useQueryClient } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView, type ReleaseVersionInput } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { storeVersion } from './version-cache';

export type ReleaseVariables = { versionId: number; input: ReleaseVersionInput };

/** In review → released: an e-signature (password again, the meaning, the content hash reviewed). */
export async function releaseVersion({ versionId, input }: ReleaseVariables): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.post(`/api/recipe-versions/${versionId}/release`, input));
}

export function useReleaseVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: releaseVersion, onSuccess: (view) => storeVersion(queryClient, view) });
}
