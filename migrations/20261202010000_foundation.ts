import type { Knex } from 'knex';
import { dropRefusals, refuse } from './support/refusal-triggers';

/** Labs, people, their roles, sessions, invitations, password resets, captured mail and the audit trail. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('labs', (t) => {
    t.increments('id').primary();
    t.string('name', 200).notNullable();
    t.string('slug', 80).notNullable().unique();
    t.string('created_at', 30).notNullable();
  });

  await knex.schema.createTable('users', (t) => {
    t.increments('id').primary();
    t.string('email', 254).notNullable().unique();
    t.string('name', 200).notNullable();
    t.string('password_hash', 200).notNullable();
    t.boolean('active').notNullable().defaultTo(true);
    t.string('created_at', 30).notNullable();
  });

  await knex.schema.createTable('memberships', (t) => {
    t.increments('id').primary();
    t.integer('user_id').notNullable().references('users.id').onDelete('RESTRICT');
    t.integer('lab_id').notNullable().references('labs.id').onDelete('RESTRICT');
    t.string('role', 20).notNullable();
    t.string('created_at', 30).notNullable();
    t.unique(['user_id', 'lab_id', 'role']);
    t.index(['lab_id']);
  });
  await refuse(
    knex,
    'memberships_role_check',
    'INSERT',
    'memberships',
    'unknown role',
    "NEW.role NOT IN ('admin','qa','analyst','auditor')",
  );

  await knex.schema.createTable('sessions', (t) => {
    t.string('sid', 128).primary();
    t.text('sess').notNullable();
    t.bigInteger('expires_at').notNullable().index();
  });

  await knex.schema.createTable('invitations', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').notNullable().references('labs.id');
    t.string('email', 254).notNullable();
    t.string('name', 200).notNullable();
    t.string('role', 20).notNullable();
    t.string('token_hash', 64).notNullable().unique();
    t.integer('invited_by').notNullable().references('users.id');
    t.string('created_at', 30).notNullable();
    t.string('expires_at', 30).notNullable();
    t.string('accepted_at', 30).nullable();
    t.integer('accepted_user_id').nullable().references('users.id');
    t.index(['lab_id']);
  });

  await knex.schema.createTable('password_resets', (t) => {
    t.increments('id').primary();
    t.integer('user_id').notNullable().references('users.id');
    t.string('token_hash', 64).notNullable().unique();
    t.string('created_at', 30).notNullable();
    t.string('expires_at', 30).notNullable();
    t.string('used_at', 30).nullable();
  });

  await knex.schema.createTable('outbox', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').nullable().references('labs.id');
    t.string('message_id', 300).nullable();
    t.string('from_address', 300).notNullable();
    t.text('to_address').notNullable();
    t.string('subject', 500).notNullable();
    t.text('text_body').notNullable();
    t.text('html_body').nullable();
    t.string('created_at', 30).notNullable();
    t.index(['lab_id']);
  });

  await knex.schema.createTable('audit_events', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').nullable().references('labs.id');
    t.integer('actor_user_id').nullable().references('users.id');
    t.string('action', 60).notNullable();
    t.string('entity_type', 60).notNullable();
    t.string('entity_id', 60).nullable();
    t.text('summary').notNullable();
    t.text('before_json').nullable();
    t.text('after_json').nullable();
    t.string('created_at', 30).notNullable();
    t.index(['lab_id', 'created_at']);
  });
  // The audit trail is append-only.
  await refuse(knex, 'audit_events_no_update', 'UPDATE', 'audit_events', 'audit events are append-only');
  await refuse(knex, 'audit_events_no_delete', 'DELETE', 'audit_events', 'audit events are append-only');
  await refuse(knex, 'audit_events_no_truncate', 'TRUNCATE', 'audit_events', 'audit events are append-only');

  await knex.schema.createTable('app_settings', (t) => {
    t.string('key', 100).primary();
    t.text('value').notNullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  for (const table of [
    'app_settings',
    'audit_events',
    'outbox',
    'password_resets',
    'invitations',
    'sessions',
    'memberships',
    'users',
    'labs',
  ]) {
    await knex.schema.dropTableIfExists(table);
  }
  await dropRefusals(knex, [
    'memberships_role_check',
    'audit_events_no_update',
    'audit_events_no_delete',
    'audit_events_no_truncate',
  ]);
}
