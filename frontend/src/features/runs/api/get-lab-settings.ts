import { queryOptions } from '@tanstack/react-query';

import { LabSettingsSchema, type LabSettings } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { runKeys } from './run-keys';

/** Paper size for the print pages, the lab's name for their heading, its time zone for "today". */
export async function getLabSettings(signal?: AbortSignal): Promise<LabSettings> {
  return LabSettingsSchema.parse(await apiClient.get('/api/settings', { signal }));
}

export const labSettingsQueryOptions = () =>
  queryOptions({ queryKey: runKeys.source('settings'), queryFn: ({ signal }) => getLabSettings(signal), staleTime: 5 * 60_000 });
