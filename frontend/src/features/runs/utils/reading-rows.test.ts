import { describe, expect, it } from 'vitest';

import { aReading } from '../testing/run-fixtures';
import { readingRows } from './reading-rows';

describe('readingRows', () => {
  it('when a reading was corrected twice, then one row stands with both old values, oldest first', () => {
    const first = aReading({ id: 1, value: 14.2, supersededById: 2, recordedAt: '2026-12-02T11:00:00Z' });
    const second = aReading({ id: 2, value: 13.1, supersededById: 3, recordedAt: '2026-12-02T11:04:00Z' });
    const third = aReading({ id: 3, value: 10.4, recordedAt: '2026-12-02T11:09:00Z' });

    const rows = readingRows([third, first, second]);

    expect(rows.map((r) => [r.current.id, r.replaced.map((o) => o.id)])).toEqual([[3, [1, 2]]]);
  });

  it('when readings were taken at different times, then rows follow the time each was first taken', () => {
    const lateFirstTake = aReading({ id: 5, recordedAt: '2026-12-02T11:30:00Z' });
    const correctedEarly = aReading({ id: 6, supersededById: 7, recordedAt: '2026-12-02T11:00:00Z' });
    const correction = aReading({ id: 7, recordedAt: '2026-12-02T11:45:00Z' });

    expect(readingRows([lateFirstTake, correctedEarly, correction]).map((r) => r.current.id)).toEqual([7, 5]);
  });

  it('when a reading points at a replacement that is not in the list, then it stands on its own', () => {
    expect(readingRows([aReading({ id: 1, supersededById: 99 })]).map((r) => [r.current.id, r.replaced.length])).toEqual([[1, 0]]);
  });
});
