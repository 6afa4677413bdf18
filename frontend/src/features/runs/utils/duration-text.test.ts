import { describe, expect, it } from 'vitest';

import { durationText } from './duration-text';

describe('durationText', () => {
  it.each([
    [0, '0 s'],
    [45.4, '45 s'],
    [900, '15 min'],
    [905, '15 min 05 s'],
    [3930, '1 h 05 min'],
    [-20, '0 s'],
  ])('when %d seconds pass, then it reads "%s"', (seconds, expected) => {
    expect(durationText(seconds)).toBe(expected);
  });
});
