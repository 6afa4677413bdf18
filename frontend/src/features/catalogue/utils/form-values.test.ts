import { describe, expect, it } from 'vitest';

import { numberOrNull, splitCodes, textOrNull } from './form-values';

describe('form value conversion', () => {
  it.each<[unknown, number | null]>([
    ['', null],
    ['  ', null],
    [undefined, null],
    ['12.5', 12.5],
    ['12,5', 12.5],
    [' 7 ', 7],
    [3, 3],
  ])('when a number field holds %j, then the schema gets %j', (value, expected) => {
    expect(numberOrNull(value)).toBe(expected);
  });

  it('when a number field holds words, then the schema gets NaN and refuses it with its own message', () => {
    expect(numberOrNull('about ten')).toBeNaN();
  });

  it.each<[string, string[]]>([
    ['', []],
    ['H225, h319', ['H225', 'H319']],
    ['H225 H336;EUH066 ,', ['H225', 'H336', 'EUH066']],
  ])('when hazard codes are typed as %j, then they become %j', (text, expected) => {
    expect(splitCodes(text)).toEqual(expected);
  });

  it.each<[string, string | null]>([
    ['', null],
    [' 64-17-5 ', '64-17-5'],
  ])('when an optional text holds %j, then the schema gets %j', (text, expected) => {
    expect(textOrNull(text)).toBe(expected);
  });
});
