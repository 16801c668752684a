import type { Knex } from 'knex';
import { auditEventHash, GENESIS_HASH, type ChainedEvent } from '../server/audit/audit-chain';
import { dropRefusals, refuse } from './support/refusal-triggers';

/**
 * Tamper evidence for records:
 * - an approved version stores the title, analyte, preparation name and lab name it was signed
 *   under, and the SHA-256 that covers them (null on versions approved before: they verify as before);
 * - every audit event stores the hash of the one before it; the existing trail is chained here,
 *   and an event without its hash is refused;
 * - a certificate carries a flag when the PDF holds JavaScript.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('preparation_versions', (t) => {
    t.string('approved_title', 200).nullable();
    t.string('approved_analyte', 40).nullable();
    t.string('approved_preparation_name', 200).nullable();
    t.string('approved_lab_name', 200).nullable();
    t.string('record_sha256', 64).nullable();
  });
  await knex.schema.alterTable('version_reviews', (t) => {
    t.string('record_sha256', 64).nullable();
  });
  await knex.schema.alterTable('certificates', (t) => {
    t.boolean('contains_script').notNullable().defaultTo(false);
  });

  await knex.schema.alterTable('audit_events', (t) => {
    t.string('previous_hash', 64).nullable();
    t.string('event_hash', 64).nullable();
  });
  // Chain the existing trail: lift the update guard for this one pass, then put it back as it was.
  if (knex.client.config.client === 'pg') {
    await knex.raw('drop trigger audit_events_no_update on audit_events');
    await knex.raw('drop function audit_events_no_update()');
  } else {
    await knex.raw('drop trigger audit_events_no_update');
  }
  let previous = GENESIS_HASH;
  const events: (ChainedEvent & { id: number })[] = await knex('audit_events').orderBy('id');
  for (const event of events) {
    const hash = auditEventHash(event, previous);
    await knex('audit_events').where({ id: event.id }).update({ previous_hash: previous, event_hash: hash });
    previous = hash;
  }
  await refuse(knex, 'audit_events_no_update', 'UPDATE', 'audit_events', 'audit events are append-only');
  await refuse(
    knex,
    'audit_events_chained',
    'INSERT',
    'audit_events',
    'an audit event must carry its chain hash',
    'NEW.event_hash IS NULL OR NEW.previous_hash IS NULL',
  );
  await knex.schema.alterTable('audit_events', (t) => {
    t.index(['event_hash']);
  });
}

export async function down(knex: Knex): Promise<void> {
  if (knex.client.config.client === 'pg') await knex.raw('drop trigger audit_events_chained on audit_events');
  else await knex.raw('drop trigger audit_events_chained');
  await dropRefusals(knex, ['audit_events_chained']);
  await knex.schema.alterTable('audit_events', (t) => {
    t.dropIndex(['event_hash']);
    t.dropColumn('event_hash');
    t.dropColumn('previous_hash');
  });
  await knex.schema.alterTable('certificates', (t) => t.dropColumn('contains_script'));
  await knex.schema.alterTable('version_reviews', (t) => t.dropColumn('record_sha256'));
  await knex.schema.alterTable('preparation_versions', (t) => {
    for (const column of [
      'approved_title',
      'approved_analyte',
      'approved_preparation_name',
      'approved_lab_name',
      'record_sha256',
    ])
      t.dropColumn(column);
  });
}
