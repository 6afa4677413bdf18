import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import { auditLoader } from '../features/audit/routes/audit-loader';
import { AuditPage } from '../features/audit/routes/audit-page';
import { calculatorRoutes } from '../features/calculator/calculator-routes';
import { catalogueRoutes } from '../features/catalogue/catalogue-routes';
import { outgoingMailLoader } from '../features/dev-mail/routes/outgoing-mail-loader';
import { OutgoingMailPage } from '../features/dev-mail/routes/outgoing-mail-page';
import { peopleLoader } from '../features/people/routes/people-loader';
import { PeoplePage } from '../features/people/routes/people-page';
import { MyPinPage } from '../features/pin/routes/my-pin-page';
import { qualityRoutes } from '../features/quality/quality-routes';
import { recipesRoutes } from '../features/recipes/recipes-routes';
import { runsRoutes } from '../features/runs/runs-routes';
import { settingsLoader } from '../features/settings/routes/settings-loader';
import { SettingsPage } from '../features/settings/routes/settings-page';
import { HomeRoute } from './home-route';
import { NotFoundPage } from './not-found-page';
import { makeGuard, page } from './route-page';
import { ROUTE_ROLES } from './route-roles';

/**
 * The desk pages inside the app shell. They are added to the route tree on the first navigation
 * that needs them (routes.tsx), so a tablet opening the run view never downloads them.
 */
export function deskRoutes(queryClient: QueryClient): RouteObject[] {
  const guarded = makeGuard(queryClient);
  return [
    page({ index: true, Component: HomeRoute }),
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
  ];
}
