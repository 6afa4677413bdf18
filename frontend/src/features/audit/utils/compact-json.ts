/** One-line JSON for a before/after cell; `null` (nothing there, e.g. before a creation) reads as a dash. */
export function compactJson(value: unknown): string {
  if (value === null || value === undefined) return '—';
  try {
    return JSON.stringify(value) ?? String(value);
  } catch {
    return String(value);
  }
}
