import { useQueryClient } from '@tanstack/react-query';
import { useState, type Dispatch } from 'react';
import { useNavigate } from 'react-router';

import { DraftContentSchema, type ProcessCheck, type RecipeVersionView } from '@tracewright/shared';

import { useToast } from '../../../components/ui/use-toast';
import { isApiError } from '../../../lib/api-error';
import { recipeVersionQueryOptions } from '../api/get-recipe-version';
import { useSaveDraft } from '../api/save-draft';
import { useStartNewVersion } from '../api/start-new-version';
import { useSubmitVersion } from '../api/submit-version';
import { blockingChecksOf } from '../utils/blocking-checks';
import { describeInvalid } from '../utils/describe-invalid';
import type { DraftAction, DraftState } from '../utils/draft-reducer';
import { recipeVersionPath } from '../utils/recipe-paths';

export type BuilderProblem =
  | { kind: 'conflict'; message: string }
  | { kind: 'blocked'; message: string; checks: ProcessCheck[] }
  | { kind: 'message'; message: string };

const messageOf = (error: unknown) => (error instanceof Error ? error.message : 'Something went wrong. Try again.');

/** Save, send for review, start a new version, and reload after a conflict, with what went wrong. */
export function useBuilderActions(view: RecipeVersionView, draft: DraftState, dispatch: Dispatch<DraftAction>) {
  const [problem, setProblem] = useState<BuilderProblem | null>(null);
  const save = useSaveDraft();
  const submit = useSubmitVersion();
  const newVersion = useStartNewVersion();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const toast = useToast();

  const onSave = () => {
    const parsed = DraftContentSchema.safeParse(draft.content);
    if (!parsed.success) {
      const { stepId, message } = describeInvalid(parsed.error, draft.content);
      if (stepId) dispatch({ type: 'select', id: stepId });
      return setProblem({ kind: 'message', message });
    }
    setProblem(null);
    const sent = draft.content;
    save.mutate(
      { versionId: view.id, input: { ...parsed.data, lockVersion: draft.lockVersion } },
      {
        onSuccess: (saved) => {
          dispatch({ type: 'saved', lockVersion: saved.lockVersion, sent });
          toast.show(`Version ${saved.number} saved.`);
        },
        onError: (error) => setProblem(isApiError(error, 409) ? { kind: 'conflict', message: error.message } : { kind: 'message', message: messageOf(error) }),
      },
    );
  };

  const onSubmit = () => {
    if (draft.isDirty) return setProblem({ kind: 'message', message: 'Save your changes first: quality reviews the saved version.' });
    setProblem(null);
    submit.mutate(view.id, {
      onSuccess: (sent) => toast.show(`Version ${sent.number} is with quality for review.`),
      onError: (error) => {
        const checks = isApiError(error, 422) ? blockingChecksOf(error.details) : [];
        setProblem(checks.length > 0 ? { kind: 'blocked', message: messageOf(error), checks } : { kind: 'message', message: messageOf(error) });
      },
    });
  };

  const onReloadTheirs = async () => {
    const fresh = await queryClient.fetchQuery({ ...recipeVersionQueryOptions(view.id), staleTime: 0 });
    dispatch({ type: 'load', content: fresh.content, lockVersion: fresh.lockVersion });
    setProblem(null);
  };

  const onNewVersion = () =>
    newVersion.mutate(
      { recipeId: view.recipeId, fromVersionId: view.id },
      { onSuccess: (created) => navigate(recipeVersionPath(created.recipeId, created.id)), onError: (error) => setProblem({ kind: 'message', message: messageOf(error) }) },
    );

  return {
    problem,
    dismissProblem: () => setProblem(null),
    onSave,
    onSubmit,
    onReloadTheirs,
    onNewVersion,
    pending: { save: save.isPending, submit: submit.isPending, newVersion: newVersion.isPending },
  };
}
