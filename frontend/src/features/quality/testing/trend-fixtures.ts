import type { Trend } from '@tracewright/shared';

const VALUES = [10.2, 10.6, 9.9, 10.4, 10.1, 10.8, 10.3, 9.7, 10.5, 10.0, 11.9, 10.2];

/** Twelve trace-resistance readings over three runs; point 11 breaks the 3σ rule. */
export function aTrend(overrides: Partial<Trend> = {}): Trend {
  return {
    recipe: { id: 12, code: 'LENS-HEAT-2', name: 'Lens-wrap heater' },
    spec: { id: 'trace-r-01', name: 'Trace resistance', unit: 'Ω', target: 10, lowerLimit: 8, upperLimit: 12 },
    points: VALUES.map((value, i) => ({
      readingId: 700 + i,
      runId: 41 + Math.floor(i / 4),
      runCode: `R-2026-00${41 + Math.floor(i / 4)}`,
      pieceCode: `P-${String((i % 4) + 1).padStart(2, '0')}`,
      value,
      recordedAt: `2026-11-${String(10 + i).padStart(2, '0')}T10:00:00Z`,
      excluded: false,
      annotation: null,
    })),
    chart: { mean: 10.38, movingRangeMean: 0.62, ucl: 12.03, lcl: 8.73, movingRangeUcl: 2.03, signals: [{ index: 10, rule: 'two-of-three-beyond-2-sigma' }] },
    capability: { n: 12, mean: 10.38, sigmaWithin: 0.55, sigmaOverall: 0.57, cp: 1.21, cpk: 0.98, pp: 1.17, ppk: 0.95 },
    frozen: null,
    isProvisional: true,
    note: null,
    ...overrides,
  };
}

export const TREND_SPECS = {
  specs: [
    { recipeId: 12, recipeCode: 'LENS-HEAT-2', specId: 'trace-r-01', name: 'Trace resistance', unit: 'Ω', points: 12 },
    { recipeId: 14, recipeCode: 'TOUCH-4K', specId: 'angle-w-01', name: 'Water contact angle', unit: '°', points: 30 },
  ],
};
