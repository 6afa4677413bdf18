import { queryOptions } from '@tanstack/react-query';

import { LabSettingsSchema, type LabSettings } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { settingsKeys } from './settings-keys';

export async function getSettings(signal?: AbortSignal): Promise<LabSettings> {
  return LabSettingsSchema.parse(await apiClient.get('/api/settings', { signal }));
}

export const settingsQueryOptions = () =>
  queryOptions({ queryKey: settingsKeys.lab(), queryFn: ({ signal }) => getSettings(signal), staleTime: 5 * 60_000 });
