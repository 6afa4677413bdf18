import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';

/** The free-entry process calculator. */
export function calculatorRoutes(_queryClient: QueryClient, _guarded: Guard): RouteObject[] {
  return [];
}
