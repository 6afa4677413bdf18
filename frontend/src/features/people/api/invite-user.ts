import { useMutation, useQueryClient } from '@tanstack/react-query';

import { UserSchema, type InviteUserInput, type User } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';

export async function inviteUser(input: InviteUserInput): Promise<User> {
  return UserSchema.parse(await apiClient.post('/api/users', input));
}

export function useInviteUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: inviteUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
}
