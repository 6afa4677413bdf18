import { describe, expect, it } from 'vitest';

import { parseValueList } from './parse-value-list';

describe('parseValueList', () => {
  it.each([
    ['one per line', '52\n55\n51', [52, 55, 51]],
    ['comma-separated', '52, 55,51', [52, 55, 51]],
    ['blank lines and trailing spaces', '\n52\n\n  55  \n\n', [52, 55]],
    ['a spreadsheet row (tabs) and semicolons', '52\t55;51', [52, 55, 51]],
    ['Windows line ends, decimals and signs', '-0.5\r\n1.25\r\n+3', [-0.5, 1.25, 3]],
  ])('when the text has %s, then every number is read in order', (_case, raw, expected) => {
    expect(parseValueList(raw)).toEqual({ kind: 'ok', value: expected });
  });

  it('when the text is only blank lines and commas, then there is nothing yet', () => {
    expect(parseValueList('\n , \n')).toEqual({ kind: 'empty' });
  });

  it('when a pasted line holds text, then it is rejected naming the line and the word', () => {
    expect(parseValueList('52\n55\nwidth µm\n51')).toEqual({
      kind: 'invalid',
      message: 'Line 3: “width” is not a number. Paste numbers only, one per line or separated by commas, with a point for decimals.',
    });
  });

  it('when a value carries its unit, then it is rejected rather than guessed', () => {
    expect(parseValueList('52um')).toMatchObject({ kind: 'invalid', message: expect.stringContaining('“52um” is not a number') });
  });
});
