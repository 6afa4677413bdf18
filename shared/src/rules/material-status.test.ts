import { describe, expect, it } from 'vitest';

import { calibrationStatus, isoDateInZone, lotStatus } from './material-status';

const now = new Date('2026-12-02T10:00:00Z');

describe('lotStatus', () => {
  it.each([
    ['when the expiry is yesterday, then it is expired', { expiresOn: '2026-12-01', openedOn: null }, null, ['expired']],
    ['when the expiry is today, then it is still usable', { expiresOn: '2026-12-02', openedOn: null }, null, []],
    ['when opened 2 days ago with a 24 h pot life, then it is past pot life', { expiresOn: null, openedOn: '2026-11-30' }, 24, ['past-pot-life']],
    ['when opened today with a 24 h pot life, then it is usable', { expiresOn: null, openedOn: '2026-12-02' }, 24, []],
    ['when no pot life is known, then opening does not flag it', { expiresOn: null, openedOn: '2020-01-01' }, null, []],
    ['when both apply, then both flags show', { expiresOn: '2026-01-01', openedOn: '2025-12-01' }, 48, ['expired', 'past-pot-life']],
  ])('%s', (_name, lot, potLifeHours, flags) => {
    const status = lotStatus(lot, { today: '2026-12-02', now, potLifeHours });
    expect(status.flags).toEqual(flags);
    expect(status.usable).toBe(flags.length === 0);
    expect(status.messages).toHaveLength(flags.length);
  });
});

describe('calibrationStatus', () => {
  it.each([
    [null, 'not-tracked'],
    ['2026-12-01', 'overdue'],
    ['2026-12-02', 'due-soon'],
    ['2026-12-16', 'due-soon'],
    ['2026-12-17', 'ok'],
  ] as const)('when due on %s (today 2026-12-02), then %s', (due, state) => {
    expect(calibrationStatus(due, '2026-12-02').state).toBe(state);
  });
});

describe('isoDateInZone', () => {
  it('when it is already tomorrow in Tokyo, then the lab date there is tomorrow', () => {
    const late = new Date('2026-12-02T20:00:00Z');
    expect(isoDateInZone(late, 'Asia/Tokyo')).toBe('2026-12-03');
    expect(isoDateInZone(late, 'America/Chicago')).toBe('2026-12-02');
  });
});
