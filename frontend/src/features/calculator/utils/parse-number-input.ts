import type { Parsed } from './parsed';

// Digits with one decimal mark (point or comma) and an optional exponent: "6", "6.5", "6,5", ".5", "1e-3".
const NUMBER_PATTERN = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)(e[+-]?\d+)?$/i;

export const NOT_A_NUMBER_MESSAGE = 'Enter a number, such as 6.5.';

/**
 * Reads one typed number. A decimal comma is accepted because many labs write it; a minus sign
 * pasted from a document (U+2212) counts as a minus. Whether the number is physical is the
 * process library's call, not ours.
 */
export function parseNumberInput(raw: string): Parsed<number> {
  const text = raw.trim().replace(/\u2212/g, '-');
  if (text === '') return { kind: 'empty' };
  if (!NUMBER_PATTERN.test(text)) return { kind: 'invalid', message: NOT_A_NUMBER_MESSAGE };
  return { kind: 'ok', value: Number(text.replace(',', '.')) };
}
