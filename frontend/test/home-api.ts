import { http, HttpResponse } from 'msw';

import type { QualityWaiting, RunState, RunSummary } from '@tracewright/shared';

// Invented figures for tests only; never used as check values.
export const quietWaiting = (overrides: Partial<QualityWaiting> = {}): QualityWaiting => ({
  deviationsNotClosed: 0,
  runsAwaitingSignOff: 0,
  versionsAwaitingReview: 0,
  ...overrides,
});

/**
 * The reads of the home page: runs by state (the first few and a total) and the quality counts.
 * Any test that lands on "/" needs them.
 * States left out answer an empty list; `seen` collects each read as `state:pageSize`.
 */
export function homeApis(runs: Partial<Record<RunState, { runs: RunSummary[]; total: number }>> = {}, waiting: QualityWaiting = quietWaiting(), seen: string[] = []) {
  return [
    http.get('/api/runs', ({ request }) => {
      const query = new URL(request.url).searchParams;
      const state = query.get('state') as RunState;
      seen.push(`${state}:${query.get('pageSize')}`);
      return HttpResponse.json(runs[state] ?? { runs: [], total: 0 });
    }),
    http.get('/api/quality/waiting', () => HttpResponse.json(waiting)),
  ];
}
