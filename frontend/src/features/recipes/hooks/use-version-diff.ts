import { useMemo } from 'react';

import { versionDiff, type VersionDiff, type RecipeVersionView } from '@tracewright/shared';

import { useOptionalRecipeVersion } from '../api/get-recipe-version';

export type LoadedDiff = { from: RecipeVersionView; to: RecipeVersionView; diff: VersionDiff };

/** Both versions' content and what changed between them (the shared diff rule). */
export function useVersionDiff(fromId: number | null, toId: number | null) {
  const from = useOptionalRecipeVersion(fromId);
  const to = useOptionalRecipeVersion(toId);
  const loaded = useMemo<LoadedDiff | null>(() => {
    if (!from.data || !to.data) return null;
    return { from: from.data, to: to.data, diff: versionDiff(from.data.content, to.data.content) };
  }, [from.data, to.data]);
  return { loaded, isLoading: from.isLoading || to.isLoading, error: from.error ?? to.error };
}
