import type { QueryClient } from '@tanstack/react-query';
import type { RouteObject } from 'react-router';

import type { Guard } from '../../lib/route-guard';
import { planRunLoader } from './routes/plan-run-loader';
import { PlanRunPage } from './routes/plan-run-page';
import { runRecordLoader, travellerLoader } from './routes/run-loaders';
import { RunRecordPage } from './routes/run-record-page';
import { runsLoader } from './routes/runs-loader';
import { RunsPage } from './routes/runs-page';
import { RUN_PLANNERS } from './utils/run-actions';

/**
 * Desk pages for runs: the list, planning (engineers, quality, admins), the run record, and the
 * two printouts. Everyone signed in reads runs; the printouts load lazily, so the QR code
 * library comes only with them.
 */
export function runsRoutes(queryClient: QueryClient, guarded: Guard): RouteObject[] {
  return [
    { path: 'runs', loader: runsLoader(queryClient), Component: RunsPage },
    { path: 'runs/new', loader: guarded(RUN_PLANNERS, planRunLoader(queryClient)), Component: PlanRunPage },
    { path: 'runs/:runId', loader: runRecordLoader(queryClient), Component: RunRecordPage },
    {
      path: 'runs/:runId/traveller',
      loader: travellerLoader(queryClient),
      lazy: async () => ({ Component: (await import('./routes/traveller-page')).TravellerPage }),
    },
    {
      path: 'runs/:runId/labels',
      loader: runRecordLoader(queryClient),
      lazy: async () => ({ Component: (await import('./routes/piece-labels-page')).PieceLabelsPage }),
    },
  ];
}
