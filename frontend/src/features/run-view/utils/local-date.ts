const pad = (n: number) => String(n).padStart(2, '0');

/** Today on the tablet's calendar (YYYY-MM-DD): the bench is in the lab's time zone. */
export function localIsoDate(nowMs: number): string {
  const d = new Date(nowMs);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}
