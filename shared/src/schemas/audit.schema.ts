import { z } from 'zod';

export const AuditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actorId: z.number().int().nullable(),
  actorName: z.string().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string().nullable(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
  reason: z.string().nullable(),
});
export type AuditEvent = z.infer<typeof AuditEventSchema>;

export const AuditQuerySchema = z.object({
  entityType: z.string().max(60).optional(),
  entityId: z.string().max(60).optional(),
  actorId: z.coerce.number().int().positive().optional(),
  action: z.string().max(60).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type AuditQuery = z.infer<typeof AuditQuerySchema>;

export const AuditPageSchema = z.object({ events: z.array(AuditEventSchema), total: z.number().int() });

export const CapturedMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
});
export type CapturedMail = z.infer<typeof CapturedMailSchema>;
export const CapturedMailListSchema = z.object({ mails: z.array(CapturedMailSchema) });
