import { useMutation, useQueryClient } from '@tanstack/react-query';

import { SessionSchema, type Session, type SetPasswordWithToken } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';

/** Sets the password from an invitation or reset link; the server signs the person in. */
export async function completeToken(input: SetPasswordWithToken): Promise<Session> {
  return SessionSchema.parse(await apiClient.post('/api/auth/tokens/complete', input));
}

export function useCompleteToken() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: completeToken, onSuccess: (session) => startSession(queryClient, session) });
}
