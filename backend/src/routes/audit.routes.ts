import { AuditExportQuerySchema, AuditSearchQuerySchema, PERMISSIONS } from '@tracewright/shared';

import type { AppContext } from '../app-context';
import { exportAuditEvents } from '../services/audit-export';
import { listAuditEvents } from '../services/audit.service';
import { route, type RouteSpec } from './route-table';

export function auditRoutes(ctx: AppContext): RouteSpec[] {
  return [
    route('get', '/api/audit-events', PERMISSIONS.readAudit, async (req, res) => {
      res.json(await listAuditEvents(AuditSearchQuerySchema.parse(req.query)));
    }),
    route('get', '/api/audit-events/export.csv', PERMISSIONS.readAudit, async (req, res) => {
      const { filename, csv } = await exportAuditEvents(ctx, AuditExportQuerySchema.parse(req.query));
      // The name is audit-events-YYYY-MM-DD.csv, so the quoted name needs no escaping.
      res.set('Content-Disposition', `attachment; filename="${filename}"`).type('text/csv; charset=utf-8').send(csv);
    }),
  ];
}
