import { describe, expect, it } from 'vitest';

import { NOT_A_NUMBER_MESSAGE, parseNumberInput } from './parse-number-input';

describe('parseNumberInput', () => {
  it.each([
    ['6', 6],
    [' 6.00 ', 6],
    ['6,5', 6.5],
    ['.5', 0.5],
    ['-1', -1],
    ['\u22124.5', -4.5],
    ['1e-3', 0.001],
    ['6.', 6],
  ])('when the text is %j, then it reads as %d', (raw, expected) => {
    expect(parseNumberInput(raw)).toEqual({ kind: 'ok', value: expected });
  });

  it.each(['', '   '])('when the text is %j, then the field is empty, not wrong', (raw) => {
    expect(parseNumberInput(raw)).toEqual({ kind: 'empty' });
  });

  it.each(['abc', '6 mPa·s', '1.2.3', '1,2,3', '-', '.', '1e'])('when the text is %j, then it asks for a number', (raw) => {
    expect(parseNumberInput(raw)).toEqual({ kind: 'invalid', message: NOT_A_NUMBER_MESSAGE });
  });
});
