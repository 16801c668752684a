import { z } from 'zod';

export const auditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actor: z.string().nullable(),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string().nullable(),
  summary: z.string(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

const day = z.iso.date({ message: 'Give the date as YYYY-MM-DD.' });

/** Filters of the audit trail; `from` and `to` are whole days, both included. */
export const auditQuerySchema = z
  .object({
    actor: z.string().trim().max(200).optional(),
    action: z.string().trim().max(60).optional(),
    entityType: z.string().trim().max(60).optional(),
    entityId: z.string().trim().max(60).optional(),
    from: day.optional(),
    to: day.optional(),
    limit: z.coerce.number().int().min(1).max(500).default(100),
    offset: z.coerce.number().int().min(0).default(0),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, {
    message: 'The start date is after the end date.',
    path: ['from'],
  });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

export const auditPageSchema = z.object({ events: z.array(auditEventSchema), total: z.number().int() });
export type AuditPage = z.infer<typeof auditPageSchema>;
