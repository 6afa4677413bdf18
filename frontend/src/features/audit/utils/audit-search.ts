import { AuditQuerySchema, type AuditQuery } from '@tracewright/shared';

export const PAGE_SIZES = [25, 50, 100, 200] as const;

/**
 * Reads the audit filters from the address bar. A hand-edited or stale value (page=abc) falls
 * back to that field's default instead of failing the page.
 */
export function parseAuditSearch(params: URLSearchParams): AuditQuery {
  const raw = Object.fromEntries([...params.entries()].filter(([, v]) => v.trim() !== ''));
  const parsed = AuditQuerySchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const bad = new Set(parsed.error.issues.map((issue) => String(issue.path[0])));
  return AuditQuerySchema.parse(Object.fromEntries(Object.entries(raw).filter(([key]) => !bad.has(key))));
}

/** The address for another page of the same filters. */
export function auditSearchFor(params: URLSearchParams, page: number): string {
  const next = new URLSearchParams(params);
  next.set('page', String(page));
  return `?${next.toString()}`;
}
