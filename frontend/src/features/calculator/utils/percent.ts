/**
 * The UI speaks percent; the library takes strain as a fraction (0.3 = 30 %).
 * @example percentToFraction(30) // → 0.3
 */
export function percentToFraction(percent: number): number {
  return percent / 100;
}
