import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { z } from 'zod';

import type { TrendPointNoteInputSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { qualityKeys } from './quality-keys';

export type PointNoteInput = z.input<typeof TrendPointNoteInputSchema>;

/** Excludes a point from the limits (or takes it back, or only annotates it), always with a reason. */
export async function noteTrendPoint(input: PointNoteInput): Promise<void> {
  await apiClient.post('/api/trends/points', input);
}

export function useNoteTrendPoint() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: noteTrendPoint,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: qualityKeys.trends() }),
        queryClient.invalidateQueries({ queryKey: qualityKeys.dashboard() }),
      ]),
  });
}
