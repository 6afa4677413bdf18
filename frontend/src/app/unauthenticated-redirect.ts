import type { QueryClient } from '@tanstack/react-query';
import type { createBrowserRouter } from 'react-router';

import { isApiError } from '../lib/api-error';
import { sessionKeys } from '../lib/session';
import { signInPath } from '../lib/sign-in-path';

type AppRouter = ReturnType<typeof createBrowserRouter>;

/**
 * Any query answering 401 after the page has loaded (session ended, signed out in another tab)
 * sends the person to sign in and back. While a navigation runs, the loaders' own guards decide,
 * so we stay out of their way. Returns the unsubscribe function.
 */
export function redirectOnUnauthenticated(queryClient: QueryClient, router: AppRouter): () => void {
  return queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'updated' || event.action.type !== 'error' || !isApiError(event.action.error, 401)) return;
    const { initialized, navigation, location } = router.state;
    if (!initialized || navigation.state !== 'idle' || location.pathname.startsWith('/sign-in')) return;
    // Leave the page first, so nothing still mounted refetches the session we are about to drop.
    void router.navigate(signInPath(location), { replace: true }).then(() => queryClient.removeQueries({ queryKey: sessionKeys.all }));
  });
}
