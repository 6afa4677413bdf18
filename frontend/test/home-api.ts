import { http, HttpResponse } from 'msw';

import type { QualityDashboard, RunState, RunSummary } from '@tracewright/shared';

// Invented records for the home page's tests only; never used as check values.
export function aRunSummary(overrides: Partial<RunSummary> = {}): RunSummary {
  return {
    id: 7,
    code: 'R-2026-0007',
    state: 'in-progress',
    recipeId: 3,
    recipeCode: 'GRID-9',
    recipeName: 'Heater grid on TPU',
    versionId: 30,
    versionNumber: 2,
    quantity: 4,
    dueOn: null,
    doneSteps: 3,
    totalSteps: 8,
    openDeviations: 0,
    createdAt: '2026-12-01T08:00:00Z',
    createdBy: { id: 1, name: 'Robin Vale' },
    ...overrides,
  };
}

export const quietDashboard = (overrides: Partial<QualityDashboard> = {}): QualityDashboard => ({
  openBySeverity: {},
  openByAge: { underDay: 0, underWeek: 0, older: 0 },
  runsAwaitingSignOff: [],
  versionsAwaitingReview: [],
  lowCapability: [],
  ...overrides,
});

/**
 * The reads of the home page: runs by state (the first few and a total) and the quality overview.
 * Any test that lands on "/" needs them.
 * States left out answer an empty list; `seen` collects the states asked for.
 */
export function homeApis(runs: Partial<Record<RunState, { runs: RunSummary[]; total: number }>> = {}, dashboard: QualityDashboard = quietDashboard(), seen: string[] = []) {
  return [
    http.get('/api/runs', ({ request }) => {
      const state = new URL(request.url).searchParams.get('state') as RunState;
      seen.push(state);
      return HttpResponse.json(runs[state] ?? { runs: [], total: 0 });
    }),
    http.get('/api/quality/dashboard', () => HttpResponse.json(dashboard)),
  ];
}
