import { queryOptions } from '@tanstack/react-query';

import { RunSignOffViewSchema, type RunSignOffView } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

/** Whether the run's record may be signed off now, the hash it would sign, and the signature once given. */
export async function getRunSignOff(id: number, signal?: AbortSignal): Promise<RunSignOffView> {
  return RunSignOffViewSchema.parse(await apiClient.get(`/api/runs/${id}/sign-off`, { signal }));
}

export const runSignOffQueryOptions = (id: number) => queryOptions({ queryKey: runKeys.signOff(id), queryFn: ({ signal }) => getRunSignOff(id, signal) });
