import { AuditQuerySchema } from '@tracewright/shared';

import { listAuditEvents } from '../services/audit.service';
import { route, type RouteSpec } from './route-table';

export function auditRoutes(): RouteSpec[] {
  return [
    route('get', '/api/audit-events', ['admin', 'quality'], async (req, res) => {
      res.json(await listAuditEvents(AuditQuerySchema.parse(req.query)));
    }),
  ];
}
