// Stored values read back as entered (up to six significant figures), without thousands
// separators, which a lab notebook does not use and which look like decimal commas to many.
const STORED = new Intl.NumberFormat('en', { maximumSignificantDigits: 6, useGrouping: false });

export function formatValue(value: number | null | undefined): string {
  return value === null || value === undefined ? '—' : STORED.format(value);
}
