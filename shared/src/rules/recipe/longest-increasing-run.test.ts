import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { longestIncreasingRun } from './longest-increasing-run';

describe('longestIncreasingRun', () => {
  // prettier-ignore
  it.each([
    { values: [], length: 0 },
    { values: [4], length: 1 },
    { values: [0, 1, 2, 3], length: 4 },
    { values: [3, 2, 1, 0], length: 1 },
    { values: [0, 2, 1, 3], length: 3 },
    { values: [1, 0, 2], length: 2 },
  ])('when the values are $values, then the longest run has $length', ({ values, length }) => {
    expect(longestIncreasingRun(values)).toHaveLength(length);
  });

  it('when any list is given, then the run is increasing in both position and value', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 50 }), { maxLength: 40 }), (values) => {
        const run = longestIncreasingRun(values);
        for (let i = 1; i < run.length; i += 1) {
          expect(run[i] as number).toBeGreaterThan(run[i - 1] as number);
          expect(values[run[i] as number] as number).toBeGreaterThan(values[run[i - 1] as number] as number);
        }
      }),
    );
  });
});
