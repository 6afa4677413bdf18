import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';

/** Recipes: list, builder, versions, review and release. */
export function recipesRoutes(_queryClient: QueryClient, _guarded: Guard): RouteObject[] {
  return [];
}
