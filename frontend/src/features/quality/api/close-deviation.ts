import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { CloseDeviationInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { invalidateDeviations } from './invalidate-deviation';

export type CloseVariables = { id: number; input: z.input<typeof CloseDeviationInputSchema> };

/** Closing is signed too: the corrective action has been verified and the record is final. */
export async function closeDeviation({ id, input }: CloseVariables): Promise<void> {
  await apiClient.post(`/api/deviations/${id}/close`, input);
}

export function useCloseDeviation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: closeDeviation, onSuccess: () => invalidateDeviations(queryClient) });
}
