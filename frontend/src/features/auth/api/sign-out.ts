import { useMutation, useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';

import { apiClient } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { forgetOfflineSession } from '../../../lib/offline-session';

export async function signOut(): Promise<void> {
  try {
    await apiClient.post('/api/auth/sign-out');
  } catch (error) {
    // 401: the session had already ended, which is what the person asked for.
    if (!isApiError(error, 401)) throw error;
  }
}

export function useSignOut() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return useMutation({
    mutationFn: signOut,
    onSuccess: async () => {
      // Navigate first so no mounted page refetches (and 401s) against the cleared cache.
      await navigate('/sign-in', { replace: true });
      queryClient.clear();
      await forgetOfflineSession();
    },
  });
}
