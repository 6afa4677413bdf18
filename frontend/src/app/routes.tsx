import type { QueryClient } from '@tanstack/react-query';
import type { DOMRouterOpts, RouteObject } from 'react-router';

import { LoadingState } from '../components/ui/loading-state';
import { ForgotPasswordPage } from '../features/auth/routes/forgot-password-page';
import { setPasswordLoader } from '../features/auth/routes/set-password-loader';
import { SetPasswordPage } from '../features/auth/routes/set-password-page';
import { SignInPage } from '../features/auth/routes/sign-in-page';
import { pinSwitchLoader } from '../features/pin/routes/pin-switch-loader';
import { PinSwitchPage } from '../features/pin/routes/pin-switch-page';
import { runViewRoutes } from '../features/run-view/run-view-routes';
import { settingsQueryOptions } from '../features/settings/api/get-settings';
import { requireSession } from './guards';
import { AppShell } from './layout/app-shell';
import { PublicLayout } from './layout/public-layout';
import { makeGuard, page } from './route-page';

const DESK_ROUTE_ID = 'desk';
/** Paths served by the run view's own routes (run-view-routes.tsx), never by the desk. */
const TABLET_PATH = /^\/run(\/|$)/;

/**
 * The routes every first load needs: sign-in and PIN pages, the tablet run view, and the desk
 * shell. The desk's own pages come in by `deskRouterOptions` on the first navigation to them.
 */
export function createRoutes(queryClient: QueryClient): RouteObject[] {
  return [
    page({
      id: 'root',
      HydrateFallback: () => <LoadingState />,
      children: [
        page({
          Component: PublicLayout,
          children: [
            page({ path: 'sign-in', Component: SignInPage }),
            page({ path: 'pin', loader: pinSwitchLoader(queryClient), Component: PinSwitchPage }),
            page({ path: 'forgot-password', Component: ForgotPasswordPage }),
            page({ path: 'set-password/:token', loader: setPasswordLoader(queryClient), Component: SetPasswordPage }),
          ],
        }),
        // The tablet run view has its own full-screen layout; its loader checks the session itself.
        ...runViewRoutes(queryClient, makeGuard(queryClient)).map(page),
        page({
          id: DESK_ROUTE_ID,
          Component: AppShell,
          loader: async ({ request }) => {
            await requireSession(queryClient, request);
            // The header's lab name is a courtesy; it must not hold up or break the page.
            void queryClient.prefetchQuery(settingsQueryOptions());
            return null;
          },
        }),
      ],
    }),
  ];
}

/**
 * Adds the desk pages under the shell the first time a path needs them (React Router's lazy
 * route discovery), once per router: the run view's first load on a slow tablet stays small.
 */
export function deskRouterOptions(queryClient: QueryClient): Pick<DOMRouterOpts, 'patchRoutesOnNavigation'> {
  let added: Promise<void> | null = null;
  return {
    async patchRoutesOnNavigation({ path, patch }) {
      // React Router also asks on paths it matched by a parameter (/run/12), in case a more
      // specific route exists: the run view's routes are all known, so the tablet skips the desk.
      if (TABLET_PATH.test(path)) return;
      added ??= import('./desk-routes').then(({ deskRoutes }) => patch(DESK_ROUTE_ID, deskRoutes(queryClient)));
      await added;
    },
  };
}
