import type { AuditEvent, AuditPage, AuditQuery } from '../../shared/contracts/audit';
import type { Db } from '../db/connection';

interface Row {
  id: number;
  created_at: string;
  actor_name: string | null;
  action: string;
  entity_type: string;
  entity_id: string | null;
  summary: string;
  before_json: string | null;
  after_json: string | null;
}

const toEvent = (row: Row): AuditEvent => ({
  id: row.id,
  at: row.created_at,
  actor: row.actor_name,
  action: row.action,
  entityType: row.entity_type,
  entityId: row.entity_id,
  summary: row.summary,
  before: row.before_json ? JSON.parse(row.before_json) : null,
  after: row.after_json ? JSON.parse(row.after_json) : null,
});

/** Reads one lab's audit trail, newest first, with the filters of the audit page. */
export function auditQuery(db: Db) {
  function filtered(labId: number, query: Omit<AuditQuery, 'limit' | 'offset'>) {
    const q = db('audit_events as e').leftJoin('users as u', 'u.id', 'e.actor_user_id').where('e.lab_id', labId);
    // whereILike: `like` on SQLite (case-blind for ASCII), `ilike` on PostgreSQL, so searches match alike.
    if (query.actor) q.andWhere((w) => w.whereILike('u.name', `%${query.actor}%`).orWhereILike('u.email', `%${query.actor}%`));
    if (query.action) q.andWhereILike('e.action', `${query.action}%`);
    if (query.entityType) q.andWhere('e.entity_type', query.entityType);
    if (query.entityId) q.andWhere('e.entity_id', query.entityId);
    if (query.from) q.andWhere('e.created_at', '>=', `${query.from}T00:00:00.000Z`);
    if (query.to) q.andWhere('e.created_at', '<=', `${query.to}T23:59:59.999Z`);
    return q;
  }
  const columns = ['e.id', 'e.created_at', 'u.name as actor_name', 'e.action', 'e.entity_type', 'e.entity_id', 'e.summary', 'e.before_json', 'e.after_json'];

  return {
    async page(labId: number, query: AuditQuery): Promise<AuditPage> {
      const total = Number((await filtered(labId, query).count({ n: '*' }).first())?.n ?? 0);
      const rows: Row[] = await filtered(labId, query).select(columns).orderBy('e.id', 'desc').limit(query.limit).offset(query.offset);
      return { events: rows.map(toEvent), total };
    },
    async all(labId: number, query: Omit<AuditQuery, 'limit' | 'offset'>): Promise<AuditEvent[]> {
      const rows: Row[] = await filtered(labId, query).select(columns).orderBy('e.id', 'desc').limit(100_000);
      return rows.map(toEvent);
    },
  };
}
