import { RunListSchema } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';

/** The run a typed code (R-2026-0007) names, or null when there is none. */
export async function findRunByCode(code: string): Promise<number | null> {
  const { runs } = RunListSchema.parse(await apiClient.get('/api/runs', { query: { q: code } }));
  return runs.find((run) => run.code.toUpperCase() === code.toUpperCase())?.id ?? null;
}
