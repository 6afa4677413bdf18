import type { Trend } from '@tracewright/shared';

import type { ControlChartLine, ControlChartPoint } from '../../../components/charts/control-chart';

/**
 * The API's signals count only the included points (the ones the chart was computed over), in
 * the order given; this maps each to its place among all points, excluded ones too.
 */
export function signalPositions(trend: Trend): Map<number, string[]> {
  const includedAt = trend.points.flatMap((p, i) => (p.excluded ? [] : [i]));
  const byPosition = new Map<number, string[]>();
  for (const signal of trend.chart?.signals ?? []) {
    const position = includedAt[signal.index];
    if (position === undefined) continue;
    byPosition.set(position, [...(byPosition.get(position) ?? []), signal.rule]);
  }
  return byPosition;
}

/** Individuals: every point in time order, numbered from 1; excluded and rule-breaking ones marked. */
export function individualsPoints(trend: Trend): ControlChartPoint[] {
  const signals = signalPositions(trend);
  return trend.points.map((p, i) => ({ x: i + 1, y: p.value, isExcluded: p.excluded, isSignal: signals.has(i) }));
}

/**
 * Moving ranges for the picture: |xᵢ − xᵢ₋₁| between consecutive included points, placed at the
 * later point. Only the points are derived here; the centre line and limit come from the API.
 */
export function movingRangePoints(trend: Trend): ControlChartPoint[] {
  const included = trend.points.flatMap((p, i) => (p.excluded ? [] : [{ value: p.value, x: i + 1 }]));
  return included.slice(1).map((p, i) => ({ x: p.x, y: Math.abs(p.value - (included[i]?.value ?? p.value)), isExcluded: false, isSignal: false }));
}

/** The specification's lines, where the spec has them. */
export function specLines(spec: Trend['spec']): ControlChartLine[] {
  const lines: ControlChartLine[] = [];
  if (spec.lowerLimit !== null) lines.push({ y: spec.lowerLimit, label: 'LSL', kind: 'spec' });
  if (spec.upperLimit !== null) lines.push({ y: spec.upperLimit, label: 'USL', kind: 'spec' });
  return lines;
}

export function individualsLines(trend: Trend): ControlChartLine[] {
  const { chart } = trend;
  if (!chart) return specLines(trend.spec);
  return [
    { y: chart.mean, label: 'Mean', kind: 'centre' },
    { y: chart.ucl, label: 'UCL', kind: 'control' },
    { y: chart.lcl, label: 'LCL', kind: 'control' },
    ...specLines(trend.spec),
  ];
}
