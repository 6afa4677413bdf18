import { describe, expect, it } from 'vitest';

import { ProcessInputError } from '@tracewright/shared';

import { computeOutcome } from './compute-outcome';
import { NOT_A_NUMBER_MESSAGE } from './parse-number-input';
import { parseValueList } from './parse-value-list';

const add = (values: { a: string; b: string }) => computeOutcome(values, (read) => read.number('a') + read.number('b'));

describe('computeOutcome', () => {
  it('when every field holds a number, then the result comes back with no problems', () => {
    expect(add({ a: '1', b: '2,5' })).toEqual({ result: 3.5, isIncomplete: false, fieldErrors: {}, formError: null });
  });

  it('when a required field is empty, then it is incomplete rather than wrong', () => {
    expect(add({ a: '1', b: '' })).toEqual({ result: null, isIncomplete: true, fieldErrors: {}, formError: null });
  });

  it('when two fields are mistyped and one is empty, then both typos are reported at once', () => {
    const outcome = computeOutcome({ a: 'x', b: '', c: 'y' }, (read) => read.number('a') + read.number('b') + read.number('c'));

    expect(outcome.fieldErrors).toEqual({ a: NOT_A_NUMBER_MESSAGE, c: NOT_A_NUMBER_MESSAGE });
    expect(outcome.isIncomplete).toBe(false);
  });

  it('when an optional field is empty, then it reads as undefined and the result stands', () => {
    expect(computeOutcome({ a: '' }, (read) => read.optionalNumber('a') ?? 'none').result).toBe('none');
  });

  it('when the library rejects a field the card shows, then the message lands under that field', () => {
    const outcome = computeOutcome({ speed: '-1' }, (read) => {
      throw new ProcessInputError('speed', `speed must be above 0; got ${read.number('speed')}.`);
    });

    expect(outcome.fieldErrors).toEqual({ speed: 'speed must be above 0; got -1.' });
  });

  it.each([
    ['an indexed entry of a pasted list', 'values[3]', { values: 'the message' }, null],
    ['an alias', 'strain', { strainPercent: 'the message' }, null],
    ['an input the card does not show', 'limits', {}, 'the message'],
  ])('when the library names %s, then the message goes to the right place', (_case, field, fieldErrors, formError) => {
    const outcome = computeOutcome(
      { values: '1', strainPercent: '1' },
      () => {
        throw new ProcessInputError(field, 'the message');
      },
      { strain: 'strainPercent' },
    );

    expect(outcome).toEqual({ result: null, isIncomplete: false, fieldErrors, formError });
  });

  it('when a pasted field cannot be read, then its parser’s message is kept', () => {
    const outcome = computeOutcome({ values: '1\nabc' }, (read) => read.parsed('values', parseValueList, []));

    expect(outcome.fieldErrors.values).toMatch(/^Line 2: “abc” is not a number/);
  });

  it('when the calculation fails for another reason, then the error is not swallowed', () => {
    expect(() =>
      computeOutcome({ a: '1' }, () => {
        throw new TypeError('bug');
      }),
    ).toThrow('bug');
  });
});
