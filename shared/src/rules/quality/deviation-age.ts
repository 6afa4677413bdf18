const DAY_MS = 86_400_000;

/**
 * How long a deviation has been waiting, in days (fractional), never negative.
 * @example ageDays(new Date('2026-12-01T12:00:00Z'), new Date('2026-12-03T00:00:00Z')) // → 1.5
 */
export function ageDays(createdAt: Date, now: Date): number {
  return Math.max(0, now.getTime() - createdAt.getTime()) / DAY_MS;
}

export type AgeBucket = 'underDay' | 'underWeek' | 'older';

/**
 * The dashboard's age band: under a day, under a week, or older.
 * @example ageBucket(0.5) // → 'underDay'
 * @example ageBucket(7) // → 'older'
 */
export function ageBucket(days: number): AgeBucket {
  if (days < 1) return 'underDay';
  return days < 7 ? 'underWeek' : 'older';
}
