import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import { RunSignOffViewSchema, type RunSignOffInputSchema, type RunSignOffView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';

export type SignOffRunVariables = { runId: number; input: z.input<typeof RunSignOffInputSchema> };

/** Refused (409) while a deviation has no disposition, or when the record changed since `contentHash` was read. */
export async function signOffRun({ runId, input }: SignOffRunVariables): Promise<RunSignOffView> {
  return RunSignOffViewSchema.parse(await apiClient.post(`/api/runs/${runId}/sign-off`, input));
}

export function useSignOffRun() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: signOffRun,
    // A sign-off closes the run: its record, the run lists, the quality dashboard and the audit log all change.
    onSuccess: () => queryClient.invalidateQueries(),
  });
}
