import { describe, expect, it } from 'vitest';

import { signalText } from './signal-text';

describe('signalText', () => {
  it.each([
    [{ index: 6, rule: 'two-of-three-beyond-2-sigma' } as const, 'point 7: 2 of 3 beyond 2σ'],
    [{ index: 0, rule: 'beyond-3-sigma' } as const, 'point 1: beyond 3σ'],
    [{ index: 4, rule: 'four-of-five-beyond-1-sigma' } as const, 'point 5: 4 of 5 beyond 1σ'],
    [{ index: 7, rule: 'eight-on-one-side' } as const, 'point 8: 8 in a row on one side of the mean'],
  ])('when the library signals %j, then it reads %j, counting points from 1', (signal, expected) => {
    expect(signalText(signal)).toBe(expected);
  });
});
