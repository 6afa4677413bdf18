import { ZERO_CELSIUS_IN_KELVIN } from './constants';
import { fieldLabel } from './field-labels';
import { ProcessInputError } from './process-input-error';

// Shared checks so every function rejects non-physical input with the same wording.

/**
 * Returns the value when it is a finite number; otherwise throws ProcessInputError.
 * @example requireFinite('strain', 0.3) // → 0.3; requireFinite('strain', NaN) throws
 */
export function requireFinite(field: string, value: number): number {
  // typeof guards callers outside TypeScript (JSON bodies, spreadsheets).
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new ProcessInputError(field, `${fieldLabel(field)} must be a finite number; got ${String(value)}.`);
  }
  return value;
}

/**
 * Returns the value when it is finite and above 0.
 * @example requirePositive('densityKgPerM3', 998.2) // → 998.2; -1 throws
 */
export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) {
    throw new ProcessInputError(field, `${fieldLabel(field)} must be above 0; got ${value}.`);
  }
  return value;
}

/**
 * Returns the value when it is finite and 0 or more.
 * @example requireNonNegative('minutes', 0) // → 0; -5 throws
 */
export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) {
    throw new ProcessInputError(field, `${fieldLabel(field)} must be 0 or more; got ${value}.`);
  }
  return value;
}

/**
 * Returns the value when it lies in [min, max].
 * @example requireInRange('solidsWtPercent', 20, 0, 100) // → 20; 120 throws
 */
export function requireInRange(field: string, value: number, min: number, max: number): number {
  requireFinite(field, value);
  if (value < min || value > max) {
    throw new ProcessInputError(field, `${fieldLabel(field)} must be between ${min} and ${max}; got ${value}.`);
  }
  return value;
}

/**
 * Contact angle in degrees. Closed range 0–180° by default; geometry that divides by sin θ or
 * tan(θ/2) asks for the open range (0, 180).
 * @example requireContactAngleDeg('waterAngleDeg', 72.5) // → 72.5; 181 throws
 */
export function requireContactAngleDeg(field: string, value: number, open = false): number {
  requireFinite(field, value);
  const isOutside = open ? value <= 0 || value >= 180 : value < 0 || value > 180;
  if (isOutside) {
    const range = open ? 'strictly between 0° and 180°' : 'between 0° and 180°';
    throw new ProcessInputError(field, `${fieldLabel(field)} must be ${range}; got ${value}°.`);
  }
  return value;
}

/**
 * Celsius temperature above absolute zero.
 * @example requireCelsius('atTempC', 120) // → 120; -300 throws
 */
export function requireCelsius(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= -ZERO_CELSIUS_IN_KELVIN) {
    throw new ProcessInputError(
      field,
      `${fieldLabel(field)} must be above absolute zero (-273.15 °C); got ${value}.`,
    );
  }
  return value;
}

/**
 * Array with at least `min` entries.
 * @example requireMinLength('values', [1, 2], 2) // → [1, 2]; [] throws
 */
export function requireMinLength<T>(field: string, items: readonly T[], min: number): readonly T[] {
  if (!Array.isArray(items) || items.length < min) {
    const count = Array.isArray(items) ? items.length : 0;
    throw new ProcessInputError(field, `${fieldLabel(field)} needs at least ${min} entries; got ${count}.`);
  }
  return items;
}

/**
 * Optional threshold in °C; −∞ when none is given, so every temperature counts.
 * @example optionalCelsiusThreshold('minEffectiveTempC', undefined) // → -Infinity; with 80 → 80
 */
export function optionalCelsiusThreshold(field: string, value: number | undefined): number {
  return value === undefined ? Number.NEGATIVE_INFINITY : requireCelsius(field, value);
}
