// Form fields hold text; the shared schemas want numbers, nulls and arrays. These convert on the
// way in, and leave judging the value to the schema (so its messages, with units, reach the person).

/** Empty → null (the schema says whether that is allowed); a decimal comma is read as a point. */
export function numberOrNull(value: unknown): number | null {
  if (typeof value === 'number') return value;
  const text = String(value ?? '').trim();
  if (text === '') return null;
  return Number(text.replace(',', '.'));
}

/** Empty → null, else the trimmed text. */
export function textOrNull(value: unknown): string | null {
  const text = String(value ?? '').trim();
  return text === '' ? null : text;
}

/** "H225, h319  EUH066" → ["H225", "H319", "EUH066"]; commas or spaces separate codes. */
export function splitCodes(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((code) => code.trim().toUpperCase())
    .filter(Boolean);
}

/** Shows a stored number in a field as typed, and nothing for null. */
export const asFieldText = (value: number | null | undefined): string => (value === null || value === undefined ? '' : String(value));
