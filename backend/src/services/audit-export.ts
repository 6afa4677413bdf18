import { auditCsv, AUDIT_EXPORT_MAX_ROWS, type AuditExportQuery } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { AuditEventModel } from '../models/audit-event.model';
import { UserModel } from '../models/user.model';
import { parseJson } from './audit.service';
import { auditFilter } from './audit-filters';
import { labToday } from './lab-calendar';
import { getLabSettings } from './settings.service';

/**
 * GET /api/audit-events/export.csv: the events under the same filters as the list, newest first,
 * at most AUDIT_EXPORT_MAX_ROWS of them, as CSV safe to open in a spreadsheet (shared auditCsv).
 */
export async function exportAuditEvents(ctx: AppContext, query: AuditExportQuery): Promise<{ filename: string; csv: string }> {
  const { timeZone } = await getLabSettings();
  const rows = await AuditEventModel.findAll({
    where: auditFilter(query, timeZone),
    order: [['id', 'DESC']],
    limit: AUDIT_EXPORT_MAX_ROWS,
    include: [{ model: UserModel, as: 'actor', attributes: ['name'] }],
  });
  const csv = auditCsv(
    rows.map((row) => ({
      id: Number(row.id),
      at: row.at,
      actorName: (row as unknown as { actor?: UserModel | null }).actor?.name ?? null,
      action: row.action,
      entityType: row.entityType,
      entityId: row.entityId,
      reason: row.reason,
      before: parseJson(row.beforeJson),
      after: parseJson(row.afterJson),
    })),
  );
  return { filename: `audit-events-${await labToday(ctx)}.csv`, csv };
}
