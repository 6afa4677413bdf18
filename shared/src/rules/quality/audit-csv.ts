import { csvCell } from '../run/readings-csv';

/** One audit event as exported, the actor's name resolved. */
export interface AuditCsvRow {
  id: number;
  at: Date;
  actorName: string | null;
  action: string;
  entityType: string;
  entityId: string | null;
  reason: string | null;
  before: unknown;
  after: unknown;
}

export const AUDIT_CSV_HEADER = ['id', 'at (UTC ISO)', 'actor', 'action', 'entity type', 'entity id', 'reason', 'before (JSON)', 'after (JSON)'] as const;

const json = (value: unknown) => (value === null || value === undefined ? '' : JSON.stringify(value));

/**
 * Audit events as RFC 4180 CSV (CRLF line ends), each cell neutralised against formula
 * injection the same way as the readings export (csvCell). Before and after are compact JSON,
 * so nothing recorded is lost; times are UTC ISO 8601.
 *
 * @example
 * auditCsv([{ id: 7, at: new Date('2026-12-01T10:00:00Z'), actorName: 'Ines', action: 'deviation.assigned', entityType: 'deviation', entityId: '3', reason: null, before: null, after: { state: 'in-review' } }])
 * // → 'id,at (UTC ISO),actor,…\r\n7,2026-12-01T10:00:00.000Z,Ines,deviation.assigned,deviation,3,,,"{""state"":""in-review""}"\r\n'
 */
export function auditCsv(rows: readonly AuditCsvRow[]): string {
  const lines = rows.map((r) => [String(r.id), r.at.toISOString(), r.actorName ?? '', r.action, r.entityType, r.entityId ?? '', r.reason ?? '', json(r.before), json(r.after)]);
  return [AUDIT_CSV_HEADER, ...lines].map((cells) => cells.map(csvCell).join(',') + '\r\n').join('');
}
