import type { QueryClient } from '@tanstack/react-query';

import type { RecipeVersionView } from '@tracewright/shared';

import { recipeKeys } from './recipe-keys';

/** After any change to a version: keep its answer, and refresh the history and the list around it. */
export function storeVersion(queryClient: QueryClient, view: RecipeVersionView): Promise<void> {
  queryClient.setQueryData(recipeKeys.version(view.id), view);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: recipeKeys.detail(view.recipeId) }),
    queryClient.invalidateQueries({ queryKey: recipeKeys.list() }),
  ]).then(() => undefined);
}
