import { queryOptions } from '@tanstack/react-query';

import { InvitationPreviewSchema, OneTimeTokenSchema, type InvitationPreview } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { authKeys } from './auth-keys';

/** A link that no longer works is an expected answer here, not a failure of the page. */
export type TokenPreview =
  | { state: 'valid'; preview: InvitationPreview }
  | { state: 'unknown' }
  | { state: 'expired' }
  | { state: 'used' }
  | { state: 'malformed' };

export async function getTokenPreview(token: string, signal?: AbortSignal): Promise<TokenPreview> {
  if (!OneTimeTokenSchema.safeParse(token).success) return { state: 'malformed' };
  try {
    const body = await apiClient.get(`/api/auth/tokens/${encodeURIComponent(token)}`, { signal });
    return { state: 'valid', preview: InvitationPreviewSchema.parse(body) };
  } catch (error) {
    if (isApiError(error, 404)) return { state: 'unknown' };
    if (isApiError(error, 410)) return { state: goneReason(error.details) === 'used' ? 'used' : 'expired' };
    throw error;
  }
}

const goneReason = (details: unknown) =>
  typeof details === 'object' && details !== null && 'reason' in details ? (details as { reason: unknown }).reason : null;

export const tokenPreviewQueryOptions = (token: string) =>
  queryOptions({
    queryKey: authKeys.token(token),
    queryFn: ({ signal }) => getTokenPreview(token, signal),
    // The token is single-use; refetching after it was spent would flash "link expired".
    staleTime: Infinity,
  });
