import { queryOptions } from '@tanstack/react-query';

import { RunDetailSchema, type RunDetail } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

export async function getRun(id: number, signal?: AbortSignal): Promise<RunDetail> {
  return RunDetailSchema.parse(await apiClient.get(`/api/runs/${id}`, { signal }));
}

export const runQueryOptions = (id: number) => queryOptions({ queryKey: runKeys.detail(id), queryFn: ({ signal }) => getRun(id, signal) });
