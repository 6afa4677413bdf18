import type { QueryClient } from '@tanstack/react-query';

import { qualityKeys } from './quality-keys';

/**
 * After any deviation write: the queue, every detail and the dashboard read again, because a
 * write can move a deviation between states (and the counts with it).
 */
export async function invalidateDeviations(queryClient: QueryClient): Promise<void> {
  await Promise.all([
    queryClient.invalidateQueries({ queryKey: qualityKeys.deviations() }),
    queryClient.invalidateQueries({ queryKey: qualityKeys.dashboard() }),
  ]);
}
