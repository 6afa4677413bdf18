import { describe, expect, it } from 'vitest';

import { RUN_RULE_IDS, westernElectricSignals } from './run-rules';

// Western Electric rules 1956 as stated in Montgomery & Runger (REFERENCES §6.2).
describe('westernElectricSignals', () => {
  it('when listing the rules, then the four Western Electric rules are named in order', () => {
    expect(RUN_RULE_IDS).toEqual([
      'beyond-3-sigma',
      'two-of-three-beyond-2-sigma',
      'four-of-five-beyond-1-sigma',
      'eight-on-one-side',
    ]);
  });

  it.each([
    // Centre 10, σ 2: 3σ limits at 4 and 16
    { name: 'a point above 16', values: [10, 16.1], mean: 10, sigma: 2, count: 1 },
    { name: 'a point on the centre line', values: [10], mean: 10, sigma: 2, count: 0 },
    // σ = 0 (every baseline reading equal): any different point is beyond every limit, none divides by zero
    { name: 'σ = 0 and an equal point', values: [5], mean: 5, sigma: 0, count: 0 },
    { name: 'σ = 0 and a different point', values: [5.1], mean: 5, sigma: 0, count: 1 },
  ])('when checking $name, then $count point(s) break rule 1', ({ values, mean, sigma, count }) => {
    const hits = westernElectricSignals(values, mean, sigma).filter(
      (s) => s.rule === 'beyond-3-sigma',
    );
    expect(hits).toHaveLength(count);
  });

  it('when the series is empty, then there are no signals', () => {
    expect(westernElectricSignals([], 0, 1)).toEqual([]);
  });
});
