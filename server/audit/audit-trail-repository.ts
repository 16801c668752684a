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

export type AuditFilters = Omit<AuditQuery, 'limit' | 'offset'>;

const toEvent = (row: Row): AuditEvent => ({
  id: Number(row.id),
  at: row.created_at,
  actor: row.actor_name,
  action: row.action,
  entityType: row.entity_type,
  entityId: row.entity_id,
  summary: row.summary,
  before: row.before_json ? JSON.parse(row.before_json) : null,
  after: row.after_json ? JSON.parse(row.after_json) : null,
});

/** Rows read per query by `events`: small enough to keep memory flat, large enough to be quick. */
const EXPORT_PAGE = 2000;

/** Reads one lab's audit trail, newest first, with the filters of the audit page. */
export function auditTrailRepository(db: Db) {
  function filtered(labId: number, query: AuditFilters) {
    const q = db('audit_events as e').leftJoin('users as u', 'u.id', 'e.actor_user_id').where('e.lab_id', labId);
    // whereILike: `like` on SQLite (case-blind for ASCII), `ilike` on PostgreSQL, so searches match alike.
    if (query.actor)
      q.andWhere((w) => w.whereILike('u.name', `%${query.actor}%`).orWhereILike('u.email', `%${query.actor}%`));
    if (query.action) q.andWhereILike('e.action', `${query.action}%`);
    if (query.entityType) q.andWhere('e.entity_type', query.entityType);
    if (query.entityId) q.andWhere('e.entity_id', query.entityId);
    if (query.from) q.andWhere('e.created_at', '>=', `${query.from}T00:00:00.000Z`);
    if (query.to) q.andWhere('e.created_at', '<=', `${query.to}T23:59:59.999Z`);
    return q;
  }
  const columns = [
    'e.id',
    'e.created_at',
    'u.name as actor_name',
    'e.action',
    'e.entity_type',
    'e.entity_id',
    'e.summary',
    'e.before_json',
    'e.after_json',
  ];

  return {
    async page(labId: number, query: AuditQuery): Promise<AuditPage> {
      const total = Number((await filtered(labId, query).count({ n: '*' }).first())?.n ?? 0);
      const rows: Row[] = await filtered(labId, query)
        .select(columns)
        .orderBy('e.id', 'desc')
        .limit(query.limit)
        .offset(query.offset);
      return { events: rows.map(toEvent), total };
    },

    /**
     * Every matching event, newest first, read page by page (keyset on the id, so no page is
     * skipped or repeated, on SQLite and PostgreSQL alike). Events are never changed, and one
     * appended meanwhile has a higher id than the first page, so the export is the trail as it
     * stood when it started. No cap: the caller streams what it gets.
     */
    async *events(labId: number, query: AuditFilters): AsyncGenerator<AuditEvent> {
      let before = Number.POSITIVE_INFINITY;
      for (;;) {
        const q = filtered(labId, query).select(columns).orderBy('e.id', 'desc').limit(EXPORT_PAGE);
        if (Number.isFinite(before)) q.andWhere('e.id', '<', before);
        const rows: Row[] = await q;
        for (const row of rows) yield toEvent(row);
        if (rows.length < EXPORT_PAGE) return;
        before = Number(rows[rows.length - 1].id);
      }
    },
  };
}
export type AuditTrailRepository = ReturnType<typeof auditTrailRepository>;
