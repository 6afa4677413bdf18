import { render } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, RouterProvider } from 'react-router';

import { AppProvider } from '../src/app/provider';
import { createRoutes, deskRouterOptions } from '../src/app/routes';
import { redirectOnUnauthenticated } from '../src/app/unauthenticated-redirect';
import { createQueryClient } from '../src/lib/query-client';

/**
 * Renders the real route tree at `path`, with a fresh QueryClient that never retries, so every
 * test starts from an empty cache and sees a failure the first time the API answers one.
 */
export function renderApp(path: string) {
  const queryClient = createQueryClient({ queries: { retry: false }, mutations: { retry: false } });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path], ...deskRouterOptions(queryClient) });
  redirectOnUnauthenticated(queryClient, router);
  const user = userEvent.setup();
  const view = render(
    <AppProvider queryClient={queryClient}>
      <RouterProvider router={router} />
    </AppProvider>,
  );
  return { ...view, user, router, queryClient };
}
