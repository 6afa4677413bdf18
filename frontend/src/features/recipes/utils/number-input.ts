/**
 * What a number field holds: empty is null (the schema says whether that is allowed), a decimal
 * comma is read as a point, and anything else that is not a number stays NaN for the schema to refuse.
 *
 * @example toNumberOrNull('') // → null; toNumberOrNull('1,5') // → 1.5; toNumberOrNull('abc') // → NaN
 */
export function toNumberOrNull(value: unknown): number | null {
  if (value === null || value === undefined) return null;
  if (typeof value === 'number') return value;
  const text = String(value).trim().replace(',', '.');
  return text === '' ? null : Number(text);
}

/** Ids from a select: the empty option is null. */
export function toIdOrNull(value: unknown): number | null {
  if (value === null || value === undefined || value === '') return null;
  return typeof value === 'number' ? value : Number(value);
}
