import { useMutation, useQueryClient } from '@tanstack/react-query';

import { SessionSchema, type PinSwitchInput, type Session } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';

export async function switchPerson(input: PinSwitchInput): Promise<Session> {
  return SessionSchema.parse(await apiClient.post('/api/auth/pin-switch', input));
}

export function useSwitchPerson() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: switchPerson, onSuccess: (session) => startSession(queryClient, session) });
}
