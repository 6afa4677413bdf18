import type { QueryClient } from '@tanstack/react-query';
import { data, redirect } from 'react-router';

import type { Role, Session } from '@tracewright/shared';

import type { ForbiddenData } from '../components/errors/forbidden-data';
import { isApiError } from '../lib/api-error';
import { sessionQueryOptions } from '../lib/session';
import { signInPath } from '../lib/sign-in-path';

/** Loader guard for the signed-in shell: no session means sign in first, then come back here. */
export async function requireSession(queryClient: QueryClient, request: Request): Promise<Session> {
  try {
    return await queryClient.ensureQueryData(sessionQueryOptions());
  } catch (error) {
    if (isApiError(error, 401)) {
      const url = new URL(request.url);
      throw redirect(signInPath({ pathname: url.pathname, search: url.search }));
    }
    throw error;
  }
}

/** Loader guard for role pages: a 403 the route's error element turns into "not for your role". */
export async function requireRole(queryClient: QueryClient, request: Request, allowed: readonly Role[]): Promise<Session> {
  const session = await requireSession(queryClient, request);
  if (!allowed.includes(session.user.role)) {
    const body: ForbiddenData = { allowed: [...allowed], current: session.user.role };
    throw data(body, { status: 403 });
  }
  return session;
}
