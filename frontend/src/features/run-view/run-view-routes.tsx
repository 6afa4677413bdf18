import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import { ROLES } from '@tracewright/shared';

import type { Guard } from '../../lib/route-guard';
import { runSnapshotQueryOptions } from './api/get-run-detail';

/**
 * The tablet run view at /run/:runId and the traveller scanner at /run/scan, outside the desk
 * shell. Any signed-in person may open them (the guard sends others to sign in and back); the
 * API decides who may write. Both load lazily, so the builder's and the charts' code never come
 * with them.
 */
export function runViewRoutes(queryClient: QueryClient, guarded: Guard): RouteObject[] {
  return [
    {
      path: 'run/scan',
      loader: guarded(ROLES, async () => null),
      lazy: async () => ({ Component: (await import('./routes/scan-page')).ScanPage }),
    },
    {
      path: 'run/:runId',
      loader: (args) => {
        // Fetched while the session is checked, not after: one slow-link round trip less.
        const loading = import('./routes/run-loader');
        loading.catch(() => undefined);
        return guarded(ROLES, async (inner) => (await loading).runLoader(queryClient)(inner))(args);
      },
      lazy: async () => ({ Component: (await import('./routes/run-page')).RunPage }),
    },
  ];
}

const RUN_PATH = /^\/run\/([1-9][0-9]*)\/?$/;

/**
 * Asks for the run as soon as the app starts when the page is a run view (a scanned traveller), so
 * the run travels while the session is checked and the page's code loads: on a slow tablet the
 * run would otherwise wait for both. The route's loader then finds it in the cache.
 */
export function prefetchRunOfPage(queryClient: QueryClient, pathname: string): void {
  const match = RUN_PATH.exec(pathname);
  if (match) void queryClient.prefetchQuery(runSnapshotQueryOptions(Number(match[1])));
}
