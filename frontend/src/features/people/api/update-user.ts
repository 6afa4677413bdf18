import { useMutation, useQueryClient } from '@tanstack/react-query';

import { UserSchema, type UpdateUserInput, type User } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';

export type UpdateUserVariables = { id: number; input: UpdateUserInput };

export async function updateUser({ id, input }: UpdateUserVariables): Promise<User> {
  return UserSchema.parse(await apiClient.patch(`/api/users/${id}`, input));
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: updateUser, onSuccess: () => queryClient.invalidateQueries({ queryKey: userKeys.all }) });
}
