import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { DispositionInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { invalidateDeviations } from './invalidate-deviation';

export type DispositionBody = z.input<typeof DispositionInputSchema>;
export type DispositionVariables = { id: number; input: DispositionBody };

/** A signed decision on the pieces: the password again, the rationale, the record's hash. */
export async function dispositionDeviation({ id, input }: DispositionVariables): Promise<void> {
  await apiClient.post(`/api/deviations/${id}/disposition`, input);
}

export function useDispositionDeviation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: dispositionDeviation, onSuccess: () => invalidateDeviations(queryClient) });
}
