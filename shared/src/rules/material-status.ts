/**
 * Flags for lots and equipment that everyone sees wherever the record appears. Dates are
 * calendar days (YYYY-MM-DD) compared in the lab's own calendar: pass `today` in that form.
 */

export type LotFlag = 'expired' | 'past-pot-life';

export interface LotStatus {
  flags: LotFlag[];
  usable: boolean;
  /** Plain words for the flags, e.g. "Expired on 2026-11-30". */
  messages: string[];
}

const MS_PER_HOUR = 3_600_000;

/**
 * @example
 * lotStatus({ expiresOn: '2026-11-30', openedOn: null }, { today: '2026-12-02', now: new Date('2026-12-02T10:00:00Z') })
 * // → { flags: ['expired'], usable: false, messages: ['Expired on 2026-11-30.'] }
 */
export function lotStatus(
  lot: { expiresOn: string | null; openedOn: string | null },
  context: { today: string; now: Date; potLifeHours?: number | null },
): LotStatus {
  const flags: LotFlag[] = [];
  const messages: string[] = [];
  if (lot.expiresOn !== null && lot.expiresOn < context.today) {
    flags.push('expired');
    messages.push(`Expired on ${lot.expiresOn}.`);
  }
  if (lot.openedOn !== null && context.potLifeHours != null) {
    // Opened dates are days, so pot life counts from the start of that day (UTC): the cautious reading.
    const openedAt = Date.parse(`${lot.openedOn}T00:00:00Z`);
    const endsAt = openedAt + context.potLifeHours * MS_PER_HOUR;
    if (context.now.getTime() > endsAt) {
      flags.push('past-pot-life');
      messages.push(`Past its pot life: opened ${lot.openedOn}, usable for ${context.potLifeHours} h after opening.`);
    }
  }
  return { flags, usable: flags.length === 0, messages };
}

export interface CalibrationStatus {
  state: 'ok' | 'due-soon' | 'overdue' | 'not-tracked';
  message: string;
}

/**
 * Calibration is overdue the day after its due date; "due soon" within `soonDays` (14 by
 * default — common practice, no source).
 * @example
 * calibrationStatus('2026-12-01', '2026-12-02') // → { state: 'overdue', message: 'Calibration was due on 2026-12-01.' }
 */
export function calibrationStatus(dueOn: string | null, today: string, soonDays = 14): CalibrationStatus {
  if (dueOn === null) return { state: 'not-tracked', message: 'No calibration date recorded.' };
  if (dueOn < today) return { state: 'overdue', message: `Calibration was due on ${dueOn}.` };
  const days = Math.round((Date.parse(`${dueOn}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / 86_400_000);
  if (days <= soonDays) return { state: 'due-soon', message: `Calibration is due on ${dueOn} (in ${days} days).` };
  return { state: 'ok', message: `Calibrated; next due ${dueOn}.` };
}

const dayFormats = new Map<string, Intl.DateTimeFormat>();
/** One formatter per zone: building an Intl.DateTimeFormat costs far more than using one. */
function dayFormat(timeZone: string): Intl.DateTimeFormat {
  let format = dayFormats.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat('en-CA', { timeZone, year: 'numeric', month: '2-digit', day: '2-digit' });
    dayFormats.set(timeZone, format);
  }
  return format;
}

/** Today's date in a time zone, as YYYY-MM-DD (the lab's calendar, not the server's). */
export function isoDateInZone(now: Date, timeZone: string): string {
  const parts = dayFormat(timeZone).formatToParts(now);
  const get = (type: string) => parts.find((p) => p.type === type)?.value ?? '';
  return `${get('year')}-${get('month')}-${get('day')}`;
}
