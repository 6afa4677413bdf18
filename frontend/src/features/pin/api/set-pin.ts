import { useMutation, useQueryClient } from '@tanstack/react-query';

import type { SetPinInput } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { sessionKeys } from '../../../lib/session';
import { pinKeys } from './pin-keys';

export async function setPin(input: SetPinInput): Promise<void> {
  await apiClient.put('/api/auth/pin', input);
}

export function useSetPin() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: setPin,
    // `hasPin` lives in the session; the tablet roster may now include this person.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: sessionKeys.all }),
        queryClient.invalidateQueries({ queryKey: pinKeys.all }),
      ]),
  });
}
