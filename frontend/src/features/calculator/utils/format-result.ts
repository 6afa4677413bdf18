export const NO_VALUE = '—';

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹',
};

/**
 * A result as the bench reads it: four significant figures, whole numbers from 1000 up, and
 * "× 10⁻⁵" for the very small (never "1e-5"). Nothing to show reads as a dash.
 *
 * @example formatResult(6.78234) // → '6.782'; formatResult(25400) // → '25400'; formatResult(null) // → '—'
 */
export function formatResult(value: number | null | undefined, significantFigures = 4): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return NO_VALUE;
  if (value === 0) return '0';
  const size = Math.abs(value);
  if (size >= 1000) return String(Math.round(value));
  if (size < 1e-3) {
    const [mantissa, exponent] = value.toExponential(significantFigures - 1).split('e');
    const power = String(Number(exponent)).replace(/./g, (c) => SUPERSCRIPT[c] ?? c);
    return `${mantissa} × 10${power}`;
  }
  return String(Number(value.toPrecision(significantFigures)));
}

/**
 * A value rounded the same way but written so a number field reads it back (exponent as "e").
 * @example fieldText(0.0232799) // → '0.02328'
 */
export function fieldText(value: number, significantFigures = 4): string {
  return String(Number(value.toPrecision(significantFigures)));
}
