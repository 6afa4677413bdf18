import { useEffect, useReducer } from 'react';

import type { RecipeVersionView } from '@tracewright/shared';

import { draftReducer, initialDraft } from '../utils/draft-reducer';

/**
 * The builder's working copy of a version. When the server's copy moves on (a refetch after
 * someone else saved, a state change) and there are no edits here, the new copy is taken over;
 * with edits, they stay and the next save meets the conflict instead.
 */
export function useDraft(view: RecipeVersionView) {
  const [draft, dispatch] = useReducer(draftReducer, view, (v) => initialDraft(v.content, v.lockVersion));
  const isBehind = view.lockVersion !== draft.lockVersion;
  useEffect(() => {
    if (isBehind && !draft.isDirty) dispatch({ type: 'load', content: view.content, lockVersion: view.lockVersion });
  }, [isBehind, draft.isDirty, view]);
  return [draft, dispatch] as const;
}
