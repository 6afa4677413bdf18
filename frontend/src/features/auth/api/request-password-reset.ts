import { useMutation } from '@tanstack/react-query';

import type { PasswordResetRequest } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';

export async function requestPasswordReset(input: PasswordResetRequest): Promise<void> {
  // The answer is the same whether or not the address exists, so there is nothing to read from it.
  await apiClient.post('/api/auth/password-reset', input);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}
