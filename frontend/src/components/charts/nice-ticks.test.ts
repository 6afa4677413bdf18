import { describe, expect, it } from 'vitest';

import { niceTicks } from './nice-ticks';

describe('niceTicks', () => {
  it.each([
    { low: 7.8, high: 12.2, count: 6, ticks: [8, 9, 10, 11, 12] },
    { low: 7.8, high: 12.2, count: 5, ticks: [8, 10, 12] },
    { low: 9.7, high: 11.9, count: 6, ticks: [10, 10.5, 11, 11.5] },
    { low: 0, high: 1, count: 5, ticks: [0, 0.25, 0.5, 0.75, 1] },
    { low: 5, high: 5, count: 5, ticks: [5] },
  ])('when the axis runs from $low to $high, then ticks are $ticks', ({ low, high, count, ticks }) => {
    expect(niceTicks(low, high, count)).toEqual(ticks);
  });
});
