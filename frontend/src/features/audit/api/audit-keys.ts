import type { AuditQuery } from '@tracewright/shared';

export const auditKeys = {
  all: ['audit-events'] as const,
  list: (query: AuditQuery) => [...auditKeys.all, 'list', query] as const,
};
