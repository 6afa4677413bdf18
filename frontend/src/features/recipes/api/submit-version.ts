import { useMutation, useQueryClient } from '@tanstack/react-query';

import { RecipeVersionViewSchema, type RecipeVersionView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { storeVersion } from './version-cache';

/** Draft → in review; refused with 422 (and the checks in `details.checks`) while anything blocks. */
export async function submitVersion(versionId: number): Promise<RecipeVersionView> {
  return RecipeVersionViewSchema.parse(await apiClient.post(`/api/recipe-versions/${versionId}/submit`));
}

export function useSubmitVersion() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: submitVersion, onSuccess: (view) => storeVersion(queryClient, view) });
}
