import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { AssignDeviationInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { invalidateDeviations } from './invalidate-deviation';

export type AssignVariables = { id: number; input: z.input<typeof AssignDeviationInputSchema> };

export async function assignDeviation({ id, input }: AssignVariables): Promise<void> {
  await apiClient.post(`/api/deviations/${id}/assign`, input);
}

export function useAssignDeviation() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: assignDeviation, onSuccess: () => invalidateDeviations(queryClient) });
}
