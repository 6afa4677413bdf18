import type { Transaction } from 'sequelize';

import type { AuditEvent, AuditSearchQuery } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { connectionOf, insertRow, sequelizeOf, withConnection } from '../db/direct-rows';
import { AuditEventModel } from '../models/audit-event.model';
import { UserModel } from '../models/user.model';
import { auditFilter } from './audit-filters';
import { getLabSettings } from './settings.service';

export interface AuditEntry {
  actorId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  before?: unknown;
  after?: unknown;
  reason?: string | null;
  ip?: string | null;
}

/** Writes one audit row; pass the transaction of the change so both land or neither does. */
export async function recordAudit(ctx: Pick<AppContext, 'clock'>, entry: AuditEntry, transaction?: Transaction) {
  const row = {
    at: ctx.clock.now(),
    actorId: entry.actorId,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId === undefined || entry.entityId === null ? null : String(entry.entityId),
    beforeJson: entry.before ?? null,
    afterJson: entry.after ?? null,
    reason: entry.reason ?? null,
    ip: entry.ip ?? null,
  };
  // Every write is audited, so this is on every write's path: a direct INSERT (db/direct-rows).
  await (transaction ? insertRow(AuditEventModel, connectionOf(transaction), row) : withConnection(sequelizeOf(AuditEventModel), (c) => insertRow(AuditEventModel, c, row)));
}

/** An audit row as the API shows it, the actor's name resolved. */
export function toAuditEvent(row: AuditEventModel): AuditEvent {
  const actor = (row as unknown as { actor?: UserModel | null }).actor;
  return {
    id: Number(row.id),
    at: row.at.toISOString(),
    actorId: row.actorId,
    actorName: actor?.name ?? null,
    action: row.action,
    entityType: row.entityType,
    entityId: row.entityId,
    before: parseJson(row.beforeJson),
    after: parseJson(row.afterJson),
    reason: row.reason,
  };
}

/** GET /api/audit-events: newest first under the filters (entity, actor, action prefix, lab days, text), a page at a time. */
export async function listAuditEvents(query: AuditSearchQuery): Promise<{ events: AuditEvent[]; total: number }> {
  const { timeZone } = await getLabSettings();
  const { rows, count } = await AuditEventModel.findAndCountAll({
    where: auditFilter(query, timeZone),
    order: [['id', 'DESC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    include: [{ model: UserModel, as: 'actor', attributes: ['name'] }],
  });
  return { total: count, events: rows.map(toAuditEvent) };
}

/** MariaDB stores JSON as LONGTEXT, so the connector may hand back a string. */
export function parseJson(value: unknown): unknown {
  if (typeof value !== 'string') return value ?? null;
  try {
    return JSON.parse(value);
  } catch {
    return value;
  }
}
