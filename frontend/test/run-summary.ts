import type { RunSummary } from '@tracewright/shared';

// Invented records for tests only; never used as check values.
export const ROBIN = { id: 1, name: 'Robin Vale' };

/** A run as the runs list shows it: a planned run of an invented silver trace label. */
export function aRunSummary(overrides: Partial<RunSummary> = {}): RunSummary {
  return {
    id: 42,
    code: 'R-2026-0042',
    state: 'planned',
    recipeId: 3,
    recipeCode: 'TRACE-1',
    recipeName: 'Silver trace label',
    versionId: 11,
    versionNumber: 2,
    quantity: 2,
    dueOn: '2026-12-10',
    doneSteps: 0,
    totalSteps: 3,
    openDeviations: 0,
    createdAt: '2026-12-02T09:10:00Z',
    createdBy: ROBIN,
    ...overrides,
  };
}
