import { queryOptions } from '@tanstack/react-query';
import type { z } from 'zod';

import { AuditPageSchema, type AuditQuery } from '@tracewright/shared';

import { apiClient } from '../../../lib/api-client';
import { auditKeys } from './audit-keys';

export type AuditPage = z.infer<typeof AuditPageSchema>;

export async function getAuditEvents(query: AuditQuery, signal?: AbortSignal): Promise<AuditPage> {
  const { page, pageSize, entityType, entityId, actorId, action } = query;
  const body = await apiClient.get('/api/audit-events', { signal, query: { page, pageSize, entityType, entityId, actorId, action } });
  return AuditPageSchema.parse(body);
}

export const auditEventsQueryOptions = (query: AuditQuery) =>
  queryOptions({ queryKey: auditKeys.list(query), queryFn: ({ signal }) => getAuditEvents(query, signal) });
