import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Role } from '@tracewright/shared';

import { RouteErrorBoundary } from '../components/errors/route-error-boundary';
import type { Guard } from '../lib/route-guard';
import { requireRole } from './guards';

// Every route gets its own error element, so a failing page keeps the shell and navigation.
export const page = (route: RouteObject): RouteObject => ({ ErrorBoundary: RouteErrorBoundary, ...route });

/** The role check runs before the page's own loader, so a refused person never fetches its data. */
export function makeGuard(queryClient: QueryClient): Guard {
  return (roles: readonly Role[], loader) => async (args) => {
    await requireRole(queryClient, args.request, roles);
    return loader(args);
  };
}
