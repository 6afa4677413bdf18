import { describe, expect, it } from 'vitest';

import { AUDIT_CSV_HEADER, auditCsv, type AuditCsvRow } from './audit-csv';

// RFC 4180 quoting and CWE-1236 formula neutralising, as in the readings export (csvCell).
const row = (overrides: Partial<AuditCsvRow> = {}): AuditCsvRow => ({
  id: 7,
  at: new Date('2026-12-01T10:00:00.000Z'),
  actorName: 'Ines Quality',
  action: 'deviation.assigned',
  entityType: 'deviation',
  entityId: '3',
  reason: null,
  before: null,
  after: { state: 'in-review' },
  ...overrides,
});

describe('auditCsv', () => {
  it('when there are no events, then only the header line is written', () => {
    expect(auditCsv([])).toBe(`${AUDIT_CSV_HEADER.join(',')}\r\n`);
  });

  it('when an event has a JSON after, then it is quoted with inner quotes doubled', () => {
    expect(auditCsv([row()]).split('\r\n')[1]).toBe('7,2026-12-01T10:00:00.000Z,Ines Quality,deviation.assigned,deviation,3,,,"{""state"":""in-review""}"');
  });

  it.each([
    { field: 'reason', change: { reason: '=HYPERLINK("http://x")' }, cell: '"\'=HYPERLINK(""http://x"")"' },
    { field: 'actor', change: { actorName: '@SUM(A1)' }, cell: "'@SUM(A1)" },
    { field: 'reason', change: { reason: '+1+1' }, cell: "'+1+1" },
    { field: 'reason', change: { reason: 'line one\nline two' }, cell: '"line one\nline two"' },
  ])('when the $field starts a formula or breaks a line, then it is written as $cell', ({ change, cell }) => {
    expect(auditCsv([row(change)])).toContain(`,${cell}`);
  });

  it('when there is no actor (the system), then the actor cell is empty and every line ends in CRLF', () => {
    const text = auditCsv([row({ actorName: null }), row({ id: 8 })]);
    expect(text.split('\r\n')).toHaveLength(4);
    expect(text.split('\r\n')[1]).toContain('2026-12-01T10:00:00.000Z,,deviation.assigned');
  });
});
