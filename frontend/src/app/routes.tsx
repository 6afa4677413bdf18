import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Role } from '@tracewright/shared';

import { RouteErrorBoundary } from '../components/errors/route-error-boundary';
import { LoadingState } from '../components/ui/loading-state';
import { auditLoader } from '../features/audit/routes/audit-loader';
import { AuditPage } from '../features/audit/routes/audit-page';
import { ForgotPasswordPage } from '../features/auth/routes/forgot-password-page';
import { setPasswordLoader } from '../features/auth/routes/set-password-loader';
import { SetPasswordPage } from '../features/auth/routes/set-password-page';
import { SignInPage } from '../features/auth/routes/sign-in-page';
import { calculatorRoutes } from '../features/calculator/calculator-routes';
import { catalogueRoutes } from '../features/catalogue/catalogue-routes';
import { outgoingMailLoader } from '../features/dev-mail/routes/outgoing-mail-loader';
import { OutgoingMailPage } from '../features/dev-mail/routes/outgoing-mail-page';
import { HomePage } from '../features/home/routes/home-page';
import { peopleLoader } from '../features/people/routes/people-loader';
import { PeoplePage } from '../features/people/routes/people-page';
import { MyPinPage } from '../features/pin/routes/my-pin-page';
import { pinSwitchLoader } from '../features/pin/routes/pin-switch-loader';
import { PinSwitchPage } from '../features/pin/routes/pin-switch-page';
import { qualityRoutes } from '../features/quality/quality-routes';
import { recipesRoutes } from '../features/recipes/recipes-routes';
import { runViewRoutes } from '../features/run-view/run-view-routes';
import { runsRoutes } from '../features/runs/runs-routes';
import { settingsQueryOptions } from '../features/settings/api/get-settings';
import { settingsLoader } from '../features/settings/routes/settings-loader';
import { SettingsPage } from '../features/settings/routes/settings-page';
import type { Guard } from '../lib/route-guard';
import { requireRole, requireSession } from './guards';
import { AppShell } from './layout/app-shell';
import { PublicLayout } from './layout/public-layout';
import { NotFoundPage } from './not-found-page';
import { ROUTE_ROLES } from './route-roles';

// Every route gets its own error element, so a failing page keeps the shell and navigation.
const page = (route: RouteObject): RouteObject => ({ ErrorBoundary: RouteErrorBoundary, ...route });

export function createRoutes(queryClient: QueryClient): RouteObject[] {
  // The role check runs before the page's own loader, so a refused person never fetches its data.
  const guarded: Guard =
    (roles: readonly Role[], loader) =>
    async (args) => {
      await requireRole(queryClient, args.request, roles);
      return loader(args);
    };

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
        ...runViewRoutes(queryClient, guarded).map(page),
        page({
          Component: AppShell,
          loader: async ({ request }) => {
            await requireSession(queryClient, request);
            // The header's lab name is a courtesy; it must not hold up or break the page.
            void queryClient.prefetchQuery(settingsQueryOptions());
            return null;
          },
          children: [
            page({ index: true, Component: HomePage }),
            page({ path: 'my-pin', Component: MyPinPage }),
            page({ path: 'people', loader: guarded(ROUTE_ROLES.people, peopleLoader(queryClient)), Component: PeoplePage }),
            page({ path: 'settings', loader: guarded(ROUTE_ROLES.settings, settingsLoader(queryClient)), Component: SettingsPage }),
            page({ path: 'dev/mail', loader: guarded(ROUTE_ROLES.devMail, outgoingMailLoader(queryClient)), Component: OutgoingMailPage }),
            page({ path: 'audit', loader: guarded(ROUTE_ROLES.audit, auditLoader(queryClient)), Component: AuditPage }),
            ...recipesRoutes(queryClient, guarded).map(page),
            ...runsRoutes(queryClient, guarded).map(page),
            ...qualityRoutes(queryClient, guarded).map(page),
            ...catalogueRoutes(queryClient, guarded).map(page),
            ...calculatorRoutes(queryClient, guarded).map(page),
            page({ path: '*', Component: NotFoundPage }),
          ],
        }),
      ],
    }),
  ];
}
