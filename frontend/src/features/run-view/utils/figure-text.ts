/**
 * A number as the engineer entered it, without float noise: up to 6 significant figures.
 * @example figureText(10.000000000000002) // → '10'; figureText(0.25) // → '0.25'
 */
export function figureText(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(6))) : String(value);
}
