import { describe, expect, it } from 'vitest';

import { formatDateTime } from './format-date';

describe('formatDateTime', () => {
  it('when given a timestamp, then it reads as ISO date and 24 h time in the local zone', () => {
    // Built from local parts so the test holds in every zone the suite runs in.
    const local = new Date(2026, 11, 1, 14, 5, 9);

    expect(formatDateTime(local.toISOString())).toBe('2026-12-01 14:05');
    expect(formatDateTime(local.toISOString(), true)).toBe('2026-12-01 14:05:09');
  });

  it('when given text that is not a date, then it returns an empty string', () => {
    expect(formatDateTime('not a date')).toBe('');
  });
});
