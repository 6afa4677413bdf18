import type { Trend } from '@tracewright/shared';

/**
 * A value for reading, with its unit: up to 4 significant figures, no trailing zeros.
 * @example valueText(12.3456, 'Ω') // → '12.35 Ω'
 */
export function valueText(value: number, unit: string): string {
  return `${figureText(value)} ${unit}`.trim();
}

/** Four significant figures: values corrected to 20 °C carry more digits than any meter reads. */
export const figureText = (value: number): string => String(Number(value.toPrecision(4)));

/** The individuals chart in words: how many points, the centre and limits, what stands out. */
export function individualsDescription(trend: Trend): string {
  const { chart, points, spec } = trend;
  const excluded = points.filter((p) => p.excluded).length;
  const parts = [`${points.length} readings in time order${excluded ? `, ${excluded} excluded from the limits` : ''}.`];
  if (chart) {
    parts.push(`Mean ${valueText(chart.mean, spec.unit)}, control limits ${valueText(chart.lcl, spec.unit)} to ${valueText(chart.ucl, spec.unit)}.`);
    parts.push(chart.signals.length ? `${chart.signals.length} rule break(s), listed under the charts.` : 'No rule breaks.');
  }
  return parts.join(' ');
}

export function movingRangeDescription(trend: Trend): string {
  const { chart, spec } = trend;
  if (!chart) return 'Not enough included points for moving ranges.';
  return `Differences between consecutive included readings. Mean moving range ${valueText(chart.movingRangeMean, spec.unit)}, upper limit ${valueText(chart.movingRangeUcl, spec.unit)}.`;
}

/** The spread in words: how many included readings, from where to where, and the limits. */
export function histogramDescription(trend: Trend): string {
  const { spec } = trend;
  const values = trend.points.filter((p) => !p.excluded).map((p) => p.value);
  if (values.length === 0) return 'No included readings yet.';
  const limits = [
    spec.lowerLimit === null ? null : `lower limit ${valueText(spec.lowerLimit, spec.unit)}`,
    spec.upperLimit === null ? null : `upper limit ${valueText(spec.upperLimit, spec.unit)}`,
  ].filter(Boolean);
  const range = `${values.length} included readings from ${valueText(Math.min(...values), spec.unit)} to ${valueText(Math.max(...values), spec.unit)}`;
  return limits.length ? `${range}; the ${limits.join(' and ')} are drawn across.` : `${range}; the spec has no limits.`;
}
