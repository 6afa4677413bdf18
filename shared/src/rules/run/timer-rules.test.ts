import { describe, expect, it } from 'vitest';

import { timerElapsedSeconds, timerOutcome, timerRemainingSeconds } from './timer-rules';

const startedAt = new Date('2026-12-02T10:00:00Z');
const after = (ms: number) => new Date(startedAt.getTime() + ms);

describe('timerElapsedSeconds', () => {
  it.each([
    { name: 'running 90.9 s', stoppedAt: null, nowMs: 90_900, expected: 90 },
    { name: 'stopped at 60 s, read later', stoppedAt: after(60_000), nowMs: 600_000, expected: 60 },
    { name: 'just started', stoppedAt: null, nowMs: 0, expected: 0 },
    { name: 'a device clock behind the start', stoppedAt: null, nowMs: -5_000, expected: 0 },
  ])('when the timer is $name, then $expected s have elapsed', ({ stoppedAt, nowMs, expected }) => {
    expect(timerElapsedSeconds({ startedAt, stoppedAt }, after(nowMs))).toBe(expected);
  });
});

describe('timerRemainingSeconds', () => {
  it.each([
    { name: 'halfway through a 10-min timer', nowMs: 300_000, expected: 300 },
    { name: 'exactly at its end', nowMs: 600_000, expected: 0 },
    { name: 'a minute past its end', nowMs: 660_000, expected: -60 },
    { name: 'half a second in', nowMs: 500, expected: 600 },
  ])('when $name, then $expected s remain (negative is over)', ({ nowMs, expected }) => {
    expect(timerRemainingSeconds({ startedAt, stoppedAt: null, plannedSeconds: 600 }, after(nowMs))).toBe(expected);
  });
});

describe('timerOutcome', () => {
  // prettier-ignore
  it.each([
    { name: 'one second before the minimum', min: 10, max: 15, ms: 599_000, early: true, over: false },
    { name: 'exactly at the minimum', min: 10, max: 15, ms: 600_000, early: false, over: false },
    { name: 'inside the window', min: 10, max: 15, ms: 720_000, early: false, over: false },
    { name: 'exactly at the maximum', min: 10, max: 15, ms: 900_000, early: false, over: false },
    { name: 'one second past the maximum', min: 10, max: 15, ms: 901_000, early: false, over: true },
    { name: 'a fractional minimum met exactly (0.1 min = 6 s)', min: 0.1, max: null, ms: 6_000, early: false, over: false },
    { name: 'no minimum, stopped at once', min: null, max: 15, ms: 0, early: false, over: false },
    { name: 'no maximum, stopped after a day', min: 10, max: null, ms: 86_400_000, early: false, over: false },
  ])('when stopped $name, then early is $early and over is $over', ({ min, max, ms, early, over }) => {
    const outcome = timerOutcome({ minMinutes: min, maxMinutes: max }, { startedAt }, after(ms));
    expect(outcome).toEqual({ elapsedMinutes: ms / 60_000, endedEarly: early, overMaximum: over });
  });
});
