import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import type { RunAction } from '../utils/run-actions';
import { runKeys } from './run-keys';

export type ChangeRunStateVariables = { runId: number; action: RunAction; reason: string };

// The answer's body is not read: the run is fetched again, so the page shows what the server kept.
export async function changeRunState({ runId, action, reason }: ChangeRunStateVariables): Promise<void> {
  await apiClient.post(`/api/runs/${runId}/${action}`, { reason });
}

export function useChangeRunState() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRunState,
    onSuccess: (_data, { runId }) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: runKeys.detail(runId) }),
        queryClient.invalidateQueries({ queryKey: runKeys.lists() }),
      ]),
  });
}
