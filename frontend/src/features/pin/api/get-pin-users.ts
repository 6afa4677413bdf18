import { queryOptions } from '@tanstack/react-query';

import { PinUsersSchema, type PinUser } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { pinKeys } from './pin-keys';

/** 401 here means "this tablet is not trusted yet", a state the page explains, not a failure. */
export type PinRoster = { isTrustedDevice: true; users: PinUser[] } | { isTrustedDevice: false; users: [] };

export async function getPinUsers(signal?: AbortSignal): Promise<PinRoster> {
  try {
    const { users } = PinUsersSchema.parse(await apiClient.get('/api/auth/pin-users', { signal }));
    return { isTrustedDevice: true, users: [...users].sort((a, b) => a.name.localeCompare(b.name)) };
  } catch (error) {
    if (isApiError(error, 401)) return { isTrustedDevice: false, users: [] };
    throw error;
  }
}

export const pinUsersQueryOptions = () =>
  queryOptions({ queryKey: pinKeys.users(), queryFn: ({ signal }) => getPinUsers(signal) });
