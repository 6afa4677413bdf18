import { ZERO_CELSIUS_IN_KELVIN } from './constants';

/**
 * Degrees to radians; trigonometry in the wetting and bead formulas needs radians.
 * @example degreesToRadians(180) // → 3.14159…
 */
export function degreesToRadians(degrees: number): number {
  return (degrees * Math.PI) / 180;
}

/**
 * Radians to degrees.
 * @example radiansToDegrees(Math.PI / 2) // → 90
 */
export function radiansToDegrees(radians: number): number {
  return (radians * 180) / Math.PI;
}

/**
 * Celsius to kelvin; Arrhenius needs absolute temperature.
 * @example celsiusToKelvin(150) // → 423.15
 */
export function celsiusToKelvin(celsius: number): number {
  return celsius + ZERO_CELSIUS_IN_KELVIN;
}

/**
 * Rounds to three significant figures for the plain-words reasons (no exponent notation).
 * @example formatNumber(6.7823) // → '6.78'; formatNumber(1234.6) // → '1235'
 */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (Math.abs(value) >= 1000) return String(Math.round(value));
  return String(Number(value.toPrecision(3)));
}
