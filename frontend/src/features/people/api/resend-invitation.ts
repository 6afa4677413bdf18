import { useMutation } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';

export async function resendInvitation(id: number): Promise<void> {
  await apiClient.post(`/api/users/${id}/invitation`);
}

export function useResendInvitation() {
  return useMutation({ mutationFn: resendInvitation });
}
