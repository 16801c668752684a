import type { Knex } from 'knex';
import { isPostgres, type Db } from '../db/connection';
import { auditEventHash, GENESIS_HASH, type ChainedEvent } from './audit-chain';

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

/**
 * Appends one event to the hash chain. Appends are serialised so the chain never forks: on
 * PostgreSQL a transaction-scoped advisory lock (held until the caller's transaction commits),
 * on SQLite the transaction itself (one connection, one writer).
 */
export async function appendAuditEvent(trx: Knex.Transaction, row: ChainedEvent): Promise<void> {
  if (isPostgres(trx)) await trx.raw('select pg_advisory_xact_lock(hashtext(?))', ['dilutrace audit chain']);
  const last: { event_hash: string } | undefined = await trx('audit_events')
    .select('event_hash')
    .orderBy('id', 'desc')
    .first();
  const previousHash = last?.event_hash ?? GENESIS_HASH;
  await trx('audit_events').insert({
    ...row,
    previous_hash: previousHash,
    event_hash: auditEventHash(row, previousHash),
  });
}

/** The append-only, hash-chained audit trail (the table refuses UPDATE, DELETE and unchained rows). */
export function auditRepository(db: Db, now: () => Date) {
  return {
    async record(event: AuditEventInput, trx: Db = db): Promise<void> {
      const row: ChainedEvent = {
        lab_id: event.labId,
        actor_user_id: event.actorUserId,
        action: event.action,
        entity_type: event.entityType,
        entity_id: event.entityId == null ? null : String(event.entityId),
        summary: event.summary,
        before_json: event.before === undefined ? null : JSON.stringify(event.before),
        after_json: event.after === undefined ? null : JSON.stringify(event.after),
        created_at: now().toISOString(),
      };
      if (trx.isTransaction) await appendAuditEvent(trx as Knex.Transaction, row);
      else await trx.transaction((inner) => appendAuditEvent(inner, row));
    },
  };
}
export type AuditRepository = ReturnType<typeof auditRepository>;
