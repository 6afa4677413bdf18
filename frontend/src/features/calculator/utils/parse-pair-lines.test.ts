import { describe, expect, it } from 'vitest';

import { parsePairLines } from './parse-pair-lines';

const NAMES = ['minute', '°C'] as const;

describe('parsePairLines', () => {
  it.each([
    ['commas', '0, 25\n10, 120', [[0, 25], [10, 120]]],
    ['tabs from a spreadsheet', '0\t25\n10\t120', [[0, 25], [10, 120]]],
    ['semicolons and blank lines', '\n0;25\n\n10 ; 120\n', [[0, 25], [10, 120]]],
    ['negative and decimal values', '0, -5.5\n1.5, 20', [[0, -5.5], [1.5, 20]]],
  ])('when the pairs are separated by %s, then each line becomes one pair', (_case, raw, expected) => {
    expect(parsePairLines(raw, NAMES)).toEqual({ kind: 'ok', value: expected });
  });

  it('when nothing but blank lines is pasted, then there is nothing yet', () => {
    expect(parsePairLines('\n\n', NAMES)).toEqual({ kind: 'empty' });
  });

  it('when a line has one number, then it says which line and what it needs', () => {
    expect(parsePairLines('0, 25\n10', NAMES)).toEqual({ kind: 'invalid', message: 'Line 2 needs two numbers, minute then °C; it has “10”.' });
  });

  it('when a header line is pasted, then it is rejected naming the word', () => {
    expect(parsePairLines('minute, temp\n0, 25', NAMES)).toEqual({ kind: 'invalid', message: 'Line 1: “minute” is not a number. Use a point for decimals.' });
  });
});
