import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { RunSignOffInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';

export type SignOffVariables = { runId: number; input: z.input<typeof RunSignOffInputSchema> };

/** Refused (409) while any deviation of the run is not dispositioned; the message says which. */
export async function signOffRun({ runId, input }: SignOffVariables): Promise<void> {
  await apiClient.post(`/api/runs/${runId}/sign-off`, input);
}

export function useSignOffRun() {
  const queryClient = useQueryClient();
  // A sign-off closes the run: the dashboard, the run's record and lists, and the audit log all change.
  return useMutation({ mutationFn: signOffRun, onSuccess: () => queryClient.invalidateQueries() });
}
