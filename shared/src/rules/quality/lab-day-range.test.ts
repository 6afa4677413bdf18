import { describe, expect, it } from 'vitest';

import { labDayRange, labDayStart } from './lab-day-range';

// Offsets from the IANA time zone database as Node's ICU carries it (Lisbon: UTC+0 in winter,
// +1 in summer; New York: −5 / −4; Kolkata +5:30 all year).
describe('labDayStart', () => {
  it.each([
    { day: '2026-12-01', zone: 'UTC', start: '2026-12-01T00:00:00.000Z' },
    { day: '2026-12-01', zone: 'Europe/Lisbon', start: '2026-12-01T00:00:00.000Z' },
    { day: '2026-07-01', zone: 'Europe/Lisbon', start: '2026-06-30T23:00:00.000Z' },
    { day: '2026-07-01', zone: 'America/New_York', start: '2026-07-01T04:00:00.000Z' },
    { day: '2026-01-15', zone: 'America/New_York', start: '2026-01-15T05:00:00.000Z' },
    { day: '2026-03-08', zone: 'America/New_York', start: '2026-03-08T05:00:00.000Z' },
    { day: '2026-03-09', zone: 'America/New_York', start: '2026-03-09T04:00:00.000Z' },
    { day: '2026-06-01', zone: 'Asia/Kolkata', start: '2026-05-31T18:30:00.000Z' },
  ])('when the day is $day in $zone, then it starts at $start', ({ day, zone, start }) => {
    expect(labDayStart(day, zone).toISOString()).toBe(start);
  });

  it('when the day is not written as a date, then it is refused', () => {
    expect(() => labDayStart('01/12/2026', 'UTC')).toThrow(RangeError);
  });
});

describe('labDayRange', () => {
  it.each([
    { from: '2026-12-01', to: '2026-12-01', zone: 'UTC', start: '2026-12-01T00:00:00.000Z', end: '2026-12-02T00:00:00.000Z' },
    { from: '2026-07-01', to: '2026-07-31', zone: 'Europe/Lisbon', start: '2026-06-30T23:00:00.000Z', end: '2026-07-31T23:00:00.000Z' },
    { from: '2026-10-25', to: '2026-10-25', zone: 'Europe/Lisbon', start: '2026-10-24T23:00:00.000Z', end: '2026-10-26T00:00:00.000Z' },
    { from: null, to: '2026-12-31', zone: 'UTC', start: null, end: '2027-01-01T00:00:00.000Z' },
    { from: '2026-12-01', to: null, zone: 'UTC', start: '2026-12-01T00:00:00.000Z', end: null },
  ])('when the range is $from to $to in $zone, then it runs from $start to $end', ({ from, to, zone, start, end }) => {
    const range = labDayRange(from, to, zone);
    expect([range.start?.toISOString() ?? null, range.end?.toISOString() ?? null]).toEqual([start, end]);
  });
});
