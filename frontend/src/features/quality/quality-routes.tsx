import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';
import { deviationLoader } from './routes/deviation-loader';
import { DeviationPage } from './routes/deviation-page';
import { deviationsLoader } from './routes/deviations-loader';
import { DeviationsPage } from './routes/deviations-page';
import { qualityDashboardLoader } from './routes/quality-dashboard-loader';
import { QualityDashboardPage } from './routes/quality-dashboard-page';
import { trendsLoader } from './routes/trends-loader';
import { QUALITY_READERS } from './utils/quality-roles';

/**
 * Quality pages: the deviation queue and a deviation's record, the overview, and trends. Admins,
 * engineers and quality read them; only quality writes. Trends load lazily, so the chart
 * library comes with that page only.
 */
export function qualityRoutes(queryClient: QueryClient, guarded: Guard): RouteObject[] {
  return [
    { path: 'deviations', loader: guarded(QUALITY_READERS, deviationsLoader(queryClient)), Component: DeviationsPage },
    { path: 'deviations/:deviationId', loader: guarded(QUALITY_READERS, deviationLoader(queryClient)), Component: DeviationPage },
    { path: 'quality', loader: guarded(QUALITY_READERS, qualityDashboardLoader(queryClient)), Component: QualityDashboardPage },
    {
      path: 'trends',
      loader: guarded(QUALITY_READERS, trendsLoader(queryClient)),
      lazy: async () => ({ Component: (await import('./routes/trends-page')).TrendsPage }),
    },
  ];
}
