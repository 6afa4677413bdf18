import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { FreezeLimitsInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export type FreezeLimitsInput = z.input<typeof FreezeLimitsInputSchema>;

/** From now on the limits come from the chosen baseline runs, not from every point. */
export async function freezeLimits(input: FreezeLimitsInput): Promise<void> {
  await apiClient.post('/api/trends/freeze', input);
}

export function useFreezeLimits() {
  const queryClient = useQueryClient();
  // The dashboard's low-capability list may change with the new limits too.
  return useMutation({
    mutationFn: freezeLimits,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: qualityKeys.trends() }),
        queryClient.invalidateQueries({ queryKey: qualityKeys.dashboard() }),
      ]),
  });
}
