import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';

/** Materials (inks, substrates, lots) and equipment pages. */
export function catalogueRoutes(_queryClient: QueryClient, _guarded: Guard): RouteObject[] {
  return [];
}
