import { describe, expect, it } from 'vitest';

import { JETTING_WINDOWS, zWindowPosition, type JettingWindowId } from './jetting-windows';
import { ProcessInputError } from './process-input-error';

describe('zWindowPosition', () => {
  it.each<{ z: number; window: JettingWindowId; expected: string }>([
    // Reis & Derby 2000: printable for 1 < Z < 10 (both bounds exclusive)
    { z: 0.99, window: 'reis-derby', expected: 'below' },
    { z: 1, window: 'reis-derby', expected: 'below' },
    { z: 1.01, window: 'reis-derby', expected: 'inside' },
    { z: 9.99, window: 'reis-derby', expected: 'inside' },
    { z: 10, window: 'reis-derby', expected: 'above' },
    // Jang, Kim & Moon 2009: printable for 4 ≤ Z ≤ 14 (both bounds inclusive)
    { z: 3.99, window: 'jang-kim-moon', expected: 'below' },
    { z: 4, window: 'jang-kim-moon', expected: 'inside' },
    { z: 14, window: 'jang-kim-moon', expected: 'inside' },
    { z: 14.01, window: 'jang-kim-moon', expected: 'above' },
  ])('when Z = $z in the $window window, then it is $expected', ({ z, window, expected }) => {
    expect(zWindowPosition(z, window)).toBe(expected);
  });

  it('when no window is named, then the Reis & Derby window applies', () => {
    // Reis & Derby 2000: Z = 12 is outside 1 < Z < 10 but inside Jang, Kim & Moon 2009's 4 ≤ Z ≤ 14
    expect(zWindowPosition(12)).toBe('above');
  });

  it.each([
    { z: Number.NaN, window: 'reis-derby' },
    { z: 5, window: 'derby-2099' },
  ])('when Z = $z with window $window, then ProcessInputError is thrown', ({ z, window }) => {
    expect(() => zWindowPosition(z, window as JettingWindowId)).toThrow(ProcessInputError);
  });
});

describe('JETTING_WINDOWS', () => {
  it.each([
    // Reis & Derby 2000 / Derby 2010: 1 < Z < 10; Jang, Kim & Moon 2009: 4 ≤ Z ≤ 14
    { id: 'reis-derby', zMin: 1, zMax: 10, inclusive: false, source: 'Reis & Derby 2000' },
    { id: 'jang-kim-moon', zMin: 4, zMax: 14, inclusive: true, source: 'Jang, Kim & Moon 2009' },
  ] as const)('when a chart reads $id, then it gets bounds $zMin–$zMax', (row) => {
    const w = JETTING_WINDOWS[row.id];
    expect([w.zMin, w.zMax, w.isMinInclusive, w.isMaxInclusive, w.source]).toEqual([
      row.zMin,
      row.zMax,
      row.inclusive,
      row.inclusive,
      row.source,
    ]);
  });

  it('when reading the Jang, Kim & Moon window, then its length convention is flagged unconfirmed', () => {
    expect(JETTING_WINDOWS['jang-kim-moon'].lengthConvention).toMatch(/unconfirmed/i);
  });
});
