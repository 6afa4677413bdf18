import { describe, expect, it } from 'vitest';

import { histogramBins } from './histogram-bins';

describe('histogramBins', () => {
  it.each([
    { values: [1, 2, 2, 3], counts: [1, 0, 2, 0, 1], from: 1, to: 3 },
    { values: Array.from({ length: 100 }, (_, i) => i), counts: Array(10).fill(10), from: 0, to: 99 },
  ])('when $values.length values are binned, then every value lands in one bin and the bins span the values', ({ values, counts, from, to }) => {
    const bins = histogramBins(values);
    expect(bins.map((b) => b.count)).toEqual(counts);
    expect(bins[0]?.from).toBe(from);
    expect(bins.at(-1)?.to).toBeCloseTo(to);
  });

  it('when all values are equal, then they share one bin that has a width', () => {
    const bins = histogramBins([5, 5, 5]);
    expect(bins.reduce((sum, b) => sum + b.count, 0)).toBe(3);
    expect(bins.every((b) => b.to > b.from)).toBe(true);
  });

  it('when there are no values, then there are no bins', () => {
    expect(histogramBins([])).toEqual([]);
  });
});
