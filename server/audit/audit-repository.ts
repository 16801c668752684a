import type { Db } from '../db/connection';

export interface AuditEventInput {
  labId: number | null;
  actorUserId: number | null;
  action: string;
  entityType: string;
  entityId?: string | number | null;
  summary: string;
  before?: unknown;
  after?: unknown;
}

/** The append-only audit trail (the table refuses UPDATE and DELETE). */
export function auditRepository(db: Db, now: () => Date) {
  return {
    async record(event: AuditEventInput, trx: Db = db): Promise<void> {
      await trx('audit_events').insert({
        lab_id: event.labId,
        actor_user_id: event.actorUserId,
        action: event.action,
        entity_type: event.entityType,
        entity_id: event.entityId == null ? null : String(event.entityId),
        summary: event.summary,
        before_json: event.before === undefined ? null : JSON.stringify(event.before),
        after_json: event.after === undefined ? null : JSON.stringify(event.after),
        created_at: now().toISOString(),
      });
    },
    listForLab: (labId: number, limit = 200) => db('audit_events').where({ lab_id: labId }).orderBy('id', 'desc').limit(limit),
  };
}
export type AuditRepository = ReturnType<typeof auditRepository>;
