import type { QualityDashboard } from '@tracewright/shared';

export function aDashboard(overrides: Partial<QualityDashboard> = {}): QualityDashboard {
  return {
    openBySeverity: { critical: 1, major: 3, minor: 5 },
    openByAge: { underDay: 2, underWeek: 4, older: 3 },
    runsAwaitingSignOff: [
      { id: 41, code: 'R-2026-0041', recipeCode: 'LENS-HEAT-2', completedAt: '2026-11-30T16:00:00Z', openDeviations: 1 },
      { id: 44, code: 'R-2026-0044', recipeCode: 'TOUCH-4K', completedAt: '2026-12-01T11:30:00Z', openDeviations: 0 },
    ],
    versionsAwaitingReview: [{ id: 61, recipeId: 14, recipeCode: 'TOUCH-4K', number: 5, submittedAt: '2026-12-01T08:00:00Z' }],
    lowCapability: [{ recipeId: 12, recipeCode: 'LENS-HEAT-2', specId: 'trace-r-01', specName: 'Trace resistance', cpk: 0.98, n: 24 }],
    ...overrides,
  };
}
