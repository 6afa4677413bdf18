import { useMutation, useQueryClient } from '@tanstack/react-query';

import { SessionSchema, type Session, type SignInInput } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { startSession } from '../../../lib/session';

export async function signIn(input: SignInInput): Promise<Session> {
  return SessionSchema.parse(await apiClient.post('/api/auth/sign-in', input));
}

export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: signIn, onSuccess: (session) => startSession(queryClient, session) });
}
