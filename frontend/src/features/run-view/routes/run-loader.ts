import type { QueryClient } from '@tanstack/react-query';
import { data, type LoaderFunctionArgs } from 'react-router';

import { runSnapshotQueryOptions } from '../api/get-run-detail';
import type { OutboxItem } from '../outbox/outbox-types';
import { benchStore } from '../storage/bench-store-instance';

export interface RunLoaderData {
  /** The writes kept on this tablet, read beside the run; null when the store could not be read (the outbox reads again). */
  writes: OutboxItem[] | null;
}

/**
 * The run before the page draws (from the server, or the tablet's saved copy when offline), and
 * the writes kept on the tablet, read meanwhile: the page never shows the run without them, and
 * reading them only once it had drawn cost a slow tablet a second full draw (bench: paint).
 */
export const runLoader =
  (queryClient: QueryClient) =>
  async ({ params }: LoaderFunctionArgs): Promise<RunLoaderData> => {
    const runId = Number(params.runId);
    if (!Number.isInteger(runId) || runId <= 0) throw data(null, { status: 404 });
    const [, writes] = await Promise.all([
      queryClient.ensureQueryData(runSnapshotQueryOptions(runId)),
      benchStore()
        .listWrites()
        .catch(() => null),
    ]);
    return { writes };
  };
