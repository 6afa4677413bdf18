import { useMutation, useQueryClient } from '@tanstack/react-query';

import { LabSettingsSchema, type LabSettings } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { settingsKeys } from './settings-keys';

export async function updateSettings(input: LabSettings): Promise<LabSettings> {
  return LabSettingsSchema.parse(await apiClient.put('/api/settings', input));
}

export function useUpdateSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateSettings,
    // The answer is the saved state; the header's lab name reads the same query and updates at once.
    onSuccess: (saved) => queryClient.setQueryData(settingsKeys.lab(), saved),
  });
}
