import { queryOptions } from '@tanstack/react-query';

import { RunDetailSchema } from '@tracewright/shared';

import { isApiError } from '../../../lib/api-error';
import { benchStore } from '../storage/bench-store-instance';
import type { RunSnapshot } from '../storage/run-snapshot';
import { clockOffsetMs } from '../utils/clock-offset';
import { benchFetch, SW_CACHE_HEADER } from './bench-fetch';
import { runViewKeys } from './run-view-keys';

const isUnreachable = (error: unknown) => isApiError(error) && (error.status === 0 || error.status >= 500);

async function fromCache(runId: number, cached: RunSnapshot['run'] | null): Promise<RunSnapshot | null> {
  const saved = await benchStore().getRunSnapshot(runId);
  // The cached answer carries an old serverTime: measuring the clock from it would be wrong.
  if (saved && (!cached || saved.run.serverTime >= cached.serverTime)) return { ...saved, isFresh: false };
  if (!cached) return null;
  return { runId, run: cached, clockOffsetMs: saved?.clockOffsetMs ?? 0, requestedAt: new Date().toISOString(), isFresh: false };
}

/**
 * The whole run in one answer, kept on the tablet after every fetch. Offline, the last copy is
 * used (from the service worker's cache or the tablet's store), with the clock offset measured
 * when it was fresh.
 */
export async function getRunSnapshot(runId: number, signal?: AbortSignal): Promise<RunSnapshot> {
  const requestedAtMs = Date.now();
  try {
    const { body, headers } = await benchFetch({ method: 'GET', path: `/api/runs/${runId}`, signal });
    const run = RunDetailSchema.parse(body);
    if (headers.get(SW_CACHE_HEADER) === 'hit') return (await fromCache(runId, run)) as RunSnapshot;
    const snapshot: RunSnapshot = {
      runId,
      run,
      clockOffsetMs: clockOffsetMs(run.serverTime, requestedAtMs, Date.now()),
      requestedAt: new Date(requestedAtMs).toISOString(),
      isFresh: true,
    };
    // Kept for offline use without holding up the page: opening the tablet's store and writing
    // cost a slow tablet a quarter of a second before the run could show (bench: paint).
    void benchStore()
      .putRunSnapshot(snapshot)
      .catch(() => undefined);
    return snapshot;
  } catch (error) {
    if (!isUnreachable(error)) throw error;
    const saved = await fromCache(runId, null);
    if (saved) return saved;
    throw error;
  }
}

export const runSnapshotQueryOptions = (runId: number) =>
  queryOptions({
    queryKey: runViewKeys.detail(runId),
    queryFn: ({ signal }) => getRunSnapshot(runId, signal),
    // Offline the query must still run: it answers from the tablet's copy.
    networkMode: 'always',
    staleTime: 10_000,
    // Another tablet may move the run on; look again every half minute.
    refetchInterval: 30_000,
  });
