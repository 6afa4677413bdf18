import { describe, expect, it } from 'vitest';

import { fieldText, formatResult } from './format-result';

describe('formatResult', () => {
  it.each([
    [6.78234, '6.782'],
    [50.3591, '50.36'],
    [0.147468, '0.1475'],
    [125.52, '125.5'],
    [25400, '25400'],
    [1234.56, '1235'],
    [-0.45579, '-0.4558'],
    [0, '0'],
    [0.0000159, '1.590 × 10⁻⁵'],
    [null, '—'],
    [undefined, '—'],
    [Number.NaN, '—'],
  ])('when the value is %s, then it reads %j', (value, expected) => {
    expect(formatResult(value)).toBe(expected);
  });
});

describe('fieldText', () => {
  it.each([
    [0.0232799, '0.02328'],
    [0.00001234567, '0.00001235'],
    [1.234567e-8, '1.235e-8'],
  ])('when the value is %s, then a number field can read %j back', (value, expected) => {
    expect(fieldText(value)).toBe(expected);
  });
});
