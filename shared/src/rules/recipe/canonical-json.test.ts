import fc from 'fast-check';
import { describe, expect, it } from 'vitest';

import { canonicalJson } from './canonical-json';

describe('canonicalJson', () => {
  // prettier-ignore
  it.each([
    { name: 'nested keys out of order', value: { b: 1, a: { d: 2, c: 3 } }, expected: '{"a":{"c":3,"d":2},"b":1}' },
    { name: 'undefined in an object and in an array', value: { a: undefined, b: [1, undefined] }, expected: '{"b":[1,null]}' },
    { name: 'non-finite numbers', value: [Number.NaN, Number.POSITIVE_INFINITY, -0], expected: '[null,null,0]' },
    { name: 'a value with toJSON', value: { when: { toJSON: () => '2026-01-01' } }, expected: '{"when":"2026-01-01"}' },
    { name: 'array order', value: [3, 1, 2], expected: '[3,1,2]' },
    { name: 'a bare string', value: 'plasma', expected: '"plasma"' },
    { name: 'undefined alone', value: undefined, expected: 'null' },
  ])('when it encodes $name, then it gives $expected', ({ value, expected }) => {
    expect(canonicalJson(value)).toBe(expected);
  });

  it('when keys are shuffled, then the text is the same and parses back to an equal value', () => {
    fc.assert(
      fc.property(fc.dictionary(fc.string(), fc.jsonValue()), (record) => {
        const reversed = Object.fromEntries(Object.entries(record).reverse());
        expect(canonicalJson(reversed)).toBe(canonicalJson(record));
        expect(JSON.parse(canonicalJson(record))).toEqual(JSON.parse(JSON.stringify(record)));
      }),
    );
  });
});
