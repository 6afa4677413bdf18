import { queryOptions, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';

import { SessionSchema, type Session } from '@tracewright/shared';

import { apiClient } from './api-client';
import { cacheSessionForOffline } from './offline-session';

// The session lives in lib because the shell, the guards and several features read it.
export const sessionKeys = {
  all: ['session'] as const,
  current: () => [...sessionKeys.all, 'current'] as const,
};

export async function getSession({ signal }: { signal?: AbortSignal } = {}): Promise<Session> {
  return SessionSchema.parse(await apiClient.get('/api/auth/session', { signal }));
}

export const sessionQueryOptions = () =>
  queryOptions({ queryKey: sessionKeys.current(), queryFn: getSession, staleTime: 5 * 60_000 });

/** For components under the signed-in shell, whose loader has already ensured the session. */
export function useSession(): Session {
  return useSuspenseQuery(sessionQueryOptions()).data;
}

/**
 * A new person now owns this browser tab: drop everything cached for the previous one, then
 * seed the session so the shell does not ask again.
 */
export function startSession(queryClient: QueryClient, session: Session): void {
  queryClient.clear();
  queryClient.setQueryData(sessionKeys.current(), session);
  cacheSessionForOffline();
}
