import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';

import { runSnapshotQueryOptions } from '../api/get-run-detail';

/** The run before the page draws: from the server, or the tablet's saved copy when offline. */
export const runLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs) => {
    const runId = Number(params.runId);
    if (!Number.isInteger(runId) || runId <= 0) throw data(null, { status: 404 });
    await queryClient.ensureQueryData(runSnapshotQueryOptions(runId));
    return null;
  };
