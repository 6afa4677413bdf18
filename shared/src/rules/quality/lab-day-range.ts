const DAY_MS = 86_400_000;
const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Minutes the zone is ahead of UTC at this instant (e.g. 60 for Lisbon in summer). */
function zoneOffsetMinutes(at: Date, timeZone: string): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
  }).formatToParts(at);
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  const asUtc = Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second'));
  return Math.round((asUtc - Math.floor(at.getTime() / 1000) * 1000) / 60_000);
}

/**
 * The instant a calendar day starts in a time zone (the lab's days, not the server's). On a
 * day whose midnight falls in a clock change, the first instant that exists that day.
 * @example labDayStart('2026-07-01', 'Europe/Lisbon').toISOString() // → '2026-06-30T23:00:00.000Z'
 */
export function labDayStart(isoDate: string, timeZone: string): Date {
  const match = ISO_DATE.exec(isoDate);
  if (!match) throw new RangeError(`A day is written like 2026-12-31; got “${isoDate}”.`);
  const midnightUtc = Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3]));
  let start = midnightUtc - zoneOffsetMinutes(new Date(midnightUtc), timeZone) * 60_000;
  // The offset at the first guess may differ from the one at the answer across a clock change.
  start = midnightUtc - zoneOffsetMinutes(new Date(start), timeZone) * 60_000;
  return new Date(start);
}

/**
 * A from–to range of lab days as instants: from the start of `from` to the start of the day
 * after `to` (exclusive), so both days are whole. Either end may be left open.
 * @example labDayRange('2026-12-01', '2026-12-01', 'UTC') // → { start: 2026-12-01T00:00Z, end: 2026-12-02T00:00Z }
 */
export function labDayRange(from: string | null | undefined, to: string | null | undefined, timeZone: string): { start: Date | null; end: Date | null } {
  const start = from ? labDayStart(from, timeZone) : null;
  let end: Date | null = null;
  if (to) {
    const next = new Date(labDayStart(to, 'UTC').getTime() + DAY_MS).toISOString().slice(0, 10);
    end = labDayStart(next, timeZone);
  }
  return { start, end };
}
