import type { QueryClient } from '@tanstack/react-query';
import { createBrowserRouter } from 'react-router';

import { createRoutes, deskRouterOptions } from './routes';
import { redirectOnUnauthenticated } from './unauthenticated-redirect';

export function createAppRouter(queryClient: QueryClient) {
  const router = createBrowserRouter(createRoutes(queryClient), deskRouterOptions(queryClient));
  redirectOnUnauthenticated(queryClient, router);
  return router;
}
