import type { HistogramBin } from '../../../components/charts/histogram-chart';

/**
 * Equal-width bins over the values' own range: about √n bins, 5 to 20. The chart widens its axis
 * to the spec limits itself, so the bars stay fine-grained even when the limits are far away.
 * @example histogramBins([1, 2, 2, 3]) // → 5 bins of width 0.4 from 1 to 3: counts 1, 0, 2, 0, 1
 */
export function histogramBins(values: readonly number[]): HistogramBin[] {
  if (values.length === 0) return [];
  const low = Math.min(...values);
  const high = Math.max(...values);
  const count = Math.min(20, Math.max(5, Math.ceil(Math.sqrt(values.length))));
  // All values equal: one visible unit around them, so the bar has a width.
  const width = high > low ? (high - low) / count : Math.abs(low) * 0.02 || 1;
  const start = high > low ? low : low - (width * count) / 2;
  const bins = Array.from({ length: count }, (_, i) => ({ from: start + i * width, to: start + (i + 1) * width, count: 0 }));
  for (const value of values) {
    const bin = bins[Math.min(count - 1, Math.floor((value - start) / width))];
    if (bin) bin.count += 1;
  }
  return bins;
}
