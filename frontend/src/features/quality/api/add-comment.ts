import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiClient } from '../../../lib/api-client';
import { invalidateDeviations } from './invalidate-deviation';

export type CommentVariables = { id: number; text: string };

export async function addComment({ id, text }: CommentVariables): Promise<void> {
  await apiClient.post(`/api/deviations/${id}/comments`, { text });
}

export function useAddComment() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: addComment, onSuccess: () => invalidateDeviations(queryClient) });
}
