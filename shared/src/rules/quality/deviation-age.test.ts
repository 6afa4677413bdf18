import { describe, expect, it } from 'vitest';

import { ageBucket, ageDays } from './deviation-age';

describe('ageDays and ageBucket', () => {
  it.each([
    { created: '2026-12-01T12:00:00Z', now: '2026-12-01T12:00:00Z', days: 0, bucket: 'underDay' },
    { created: '2026-12-01T12:00:00Z', now: '2026-12-02T11:59:00Z', days: 1439 / 1440, bucket: 'underDay' },
    { created: '2026-12-01T12:00:00Z', now: '2026-12-03T00:00:00Z', days: 1.5, bucket: 'underWeek' },
    { created: '2026-12-01T00:00:00Z', now: '2026-12-08T00:00:00Z', days: 7, bucket: 'older' },
    { created: '2026-12-02T00:00:00Z', now: '2026-12-01T00:00:00Z', days: 0, bucket: 'underDay' },
  ])('when raised at $created and it is $now, then it is $days days old ($bucket)', ({ created, now, days, bucket }) => {
    const age = ageDays(new Date(created), new Date(now));
    expect(age).toBeCloseTo(days, 10);
    expect(ageBucket(age)).toBe(bucket);
  });
});
