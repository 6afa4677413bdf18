// In pasted lists commas separate values, so decimals must use a point there: "5,2" is two values.
export const LIST_SEPARATORS = /[\s,;]+/;

const DECIMAL_PATTERN = /^[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i;

/** True for one pasted number with a decimal point: "52", "-0.5", "1e-3". */
export function isDecimalToken(token: string): boolean {
  return DECIMAL_PATTERN.test(token);
}

/** Pasted text split into lines, with a typographic minus (U+2212) read as a minus. */
export function pastedLines(raw: string): string[] {
  return raw.replace(/\u2212/g, '-').split(/\r?\n/);
}
