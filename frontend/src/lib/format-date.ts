const pad = (n: number) => String(n).padStart(2, '0');

/**
 * ISO-style date and 24 h time in the reader's zone, e.g. `2026-12-01 14:05`, because a bench
 * log reads the same in every locale. Returns an empty string for text that is not a date.
 */
export function formatDateTime(iso: string, withSeconds = false): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  const day = `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}`;
  const time = `${pad(date.getHours())}:${pad(date.getMinutes())}`;
  return withSeconds ? `${day} ${time}:${pad(date.getSeconds())}` : `${day} ${time}`;
}
