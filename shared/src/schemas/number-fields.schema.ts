import { z } from 'zod';

/**
 * A finite number within physical bounds, with the unit in the message so a person knows what to
 * type. JSON cannot carry NaN or Infinity, but forms can produce them: both are refused.
 */
export const quantity = (label: string, unit: string, min: number, max: number, options: { exclusiveMin?: boolean } = {}) =>
  z
    .number({ error: `${label} must be a number in ${unit}.` })
    .refine(Number.isFinite, `${label} must be a finite number.`)
    .refine((v) => (options.exclusiveMin ? v > min : v >= min), {
      message: options.exclusiveMin ? `${label} must be above ${min} ${unit}.` : `${label} must be at least ${min} ${unit}.`,
    })
    .refine((v) => v <= max, `${label} must be at most ${max} ${unit}.`);

export const optionalQuantity = (label: string, unit: string, min: number, max: number, options: { exclusiveMin?: boolean } = {}) =>
  quantity(label, unit, min, max, options).nullable().default(null);

/** Calendar day as YYYY-MM-DD (lab dates: received, opened, expiry, calibration due). */
export const IsoDateSchema = z.iso.date({ error: 'Use a date like 2026-12-31.' });
export const optionalIsoDate = IsoDateSchema.nullable().default(null);

/** Optimistic concurrency: an update names the version it was based on. */
export const VersionSchema = z.number({ error: 'version is required to save changes.' }).int().min(1);
