import { isDecimalToken, LIST_SEPARATORS, pastedLines } from './decimal-token';
import type { Parsed } from './parsed';

/**
 * Reads pasted readings: one per line, or separated by commas, semicolons, tabs or spaces (a
 * spreadsheet column or row both work). Blank lines are skipped. Anything that is not a number is
 * rejected with its line, so a pasted header or a unit is found at once.
 */
export function parseValueList(raw: string): Parsed<number[]> {
  const values: number[] = [];
  for (const [i, line] of pastedLines(raw).entries()) {
    for (const token of line.split(LIST_SEPARATORS).filter(Boolean)) {
      if (!isDecimalToken(token)) {
        return {
          kind: 'invalid',
          message: `Line ${i + 1}: “${token}” is not a number. Paste numbers only, one per line or separated by commas, with a point for decimals.`,
        };
      }
      values.push(Number(token));
    }
  }
  return values.length === 0 ? { kind: 'empty' } : { kind: 'ok', value: values };
}
