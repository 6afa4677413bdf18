import { z } from 'zod';

import { AuditQuerySchema } from './audit.schema';
import { IsoDateSchema } from './number-fields.schema';

const searchFilters = {
  /** Lab days (the lab's time zone), both whole: from the start of `from` to the end of `to`. */
  from: IsoDateSchema.optional(),
  to: IsoDateSchema.optional(),
  /** Words looked for in the reason and the before/after record (every word must appear). */
  q: z.string({ error: 'Search must be text.' }).trim().max(100, 'Search can be at most 100 characters.').optional(),
};

/**
 * GET /api/audit-events: the filters of AuditQuerySchema (entity type and id, actor, action
 * prefix such as `deviation.`) plus a day range and text. Newest first, a page at a time.
 */
export const AuditSearchQuerySchema = AuditQuerySchema.extend(searchFilters);
export type AuditSearchQuery = z.infer<typeof AuditSearchQuerySchema>;

/** At most this many rows per export; narrow the filters for more (a spreadsheet copes with this). */
export const AUDIT_EXPORT_MAX_ROWS = 50_000;

/** GET /api/audit-events/export.csv: the same filters, no paging. */
export const AuditExportQuerySchema = AuditQuerySchema.omit({ page: true, pageSize: true }).extend(searchFilters);
export type AuditExportQuery = z.infer<typeof AuditExportQuerySchema>;
