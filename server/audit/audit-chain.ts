import { canonicalJson, sha256Hex } from '../lib/canonical-json';

/** The `previous_hash` of the first event in the trail. */
export const GENESIS_HASH = '0'.repeat(64);

/** The stored columns of an audit event that its hash covers (the id is the chain position, not hashed). */
export interface ChainedEvent {
  lab_id: number | string | null;
  actor_user_id: number | string | null;
  action: string;
  entity_type: string;
  entity_id: string | null;
  summary: string;
  before_json: string | null;
  after_json: string | null;
  created_at: string;
}

/**
 * SHA-256 of one audit event, chained to the one before it. The hashed document is canonical JSON
 * (keys sorted, no spaces) of the event's columns exactly as stored, ids as numbers, plus
 * `previousHash` and a format tag. This format is fixed: the migration that chained the existing
 * events and `npm run verify` both depend on it; a change needs a new format tag.
 */
export function auditEventHash(event: ChainedEvent, previousHash: string): string {
  return sha256Hex(
    canonicalJson({
      format: 'dilutrace-audit-event/1',
      previousHash,
      labId: event.lab_id == null ? null : Number(event.lab_id),
      actorUserId: event.actor_user_id == null ? null : Number(event.actor_user_id),
      action: event.action,
      entityType: event.entity_type,
      entityId: event.entity_id,
      summary: event.summary,
      before: event.before_json,
      after: event.after_json,
      createdAt: event.created_at,
    }),
  );
}
