import { queryOptions } from '@tanstack/react-query';

import { UserListSchema, type User } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { userKeys } from './user-keys';

export async function getUsers(signal?: AbortSignal): Promise<User[]> {
  return UserListSchema.parse(await apiClient.get('/api/users', { signal })).users;
}

export const usersQueryOptions = () => queryOptions({ queryKey: userKeys.list(), queryFn: ({ signal }) => getUsers(signal) });
