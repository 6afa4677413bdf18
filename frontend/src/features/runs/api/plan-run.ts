import { useMutation, useQueryClient } from '@tanstack/react-query';

import { RunDetailSchema, type PlanRunInput, type RunDetail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function planRun(input: PlanRunInput): Promise<RunDetail> {
  return RunDetailSchema.parse(await apiClient.post('/api/runs', input));
}

export function usePlanRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: planRun,
    onSuccess: (run) => {
      queryClient.setQueryData(runKeys.detail(run.id), run);
      return queryClient.invalidateQueries({ queryKey: runKeys.lists() });
    },
  });
}
