import type { Knex } from 'knex';
import { dropRefusals, refuse } from './support/refusal-triggers';

/** The tolerance library: items, their immutable revisions, certificates, and each lab's policy. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('equipment_items', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').notNullable().references('labs.id');
    t.string('kind', 30).notNullable();
    t.string('code', 40).notNullable();
    t.string('status', 10).notNullable().defaultTo('active');
    t.integer('current_revision_id').nullable();
    t.string('created_at', 30).notNullable();
    t.integer('created_by').notNullable().references('users.id');
    t.string('retired_at', 30).nullable();
    t.integer('retired_by').nullable().references('users.id');
    t.text('retired_reason').nullable();
    t.unique(['lab_id', 'code']);
    t.index(['lab_id', 'kind']);
  });

  await knex.schema.createTable('equipment_revisions', (t) => {
    t.increments('id').primary();
    t.integer('item_id').notNullable().references('equipment_items.id');
    t.integer('number').notNullable();
    t.text('data_json').notNullable();
    t.text('reason').notNullable();
    t.string('created_at', 30).notNullable();
    t.integer('created_by').notNullable().references('users.id');
    t.unique(['item_id', 'number']);
  });
  // A revision is what a budget points at: it never changes and is never removed.
  await refuse(
    knex,
    'equipment_revisions_no_update',
    'UPDATE',
    'equipment_revisions',
    'equipment revisions are immutable',
  );
  await refuse(
    knex,
    'equipment_revisions_no_delete',
    'DELETE',
    'equipment_revisions',
    'equipment revisions are immutable',
  );
  await refuse(
    knex,
    'equipment_revisions_no_truncate',
    'TRUNCATE',
    'equipment_revisions',
    'equipment revisions are immutable',
  );

  await knex.schema.createTable('certificates', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').notNullable().references('labs.id');
    t.integer('item_id').notNullable().references('equipment_items.id');
    t.integer('revision_id').notNullable().references('equipment_revisions.id');
    t.string('original_name', 255).notNullable();
    t.string('stored_name', 80).notNullable().unique();
    t.string('media_type', 60).notNullable();
    t.integer('size_bytes').notNullable();
    t.string('sha256', 64).notNullable();
    t.integer('uploaded_by').notNullable().references('users.id');
    t.string('uploaded_at', 30).notNullable();
    t.index(['item_id']);
  });

  await knex.schema.createTable('lab_policies', (t) => {
    t.integer('lab_id').primary().references('labs.id');
    t.text('policy_json').notNullable();
    t.string('updated_at', 30).notNullable();
    t.integer('updated_by').nullable().references('users.id');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('lab_policies');
  await knex.schema.dropTableIfExists('certificates');
  await knex.schema.dropTableIfExists('equipment_revisions');
  await knex.schema.dropTableIfExists('equipment_items');
  await dropRefusals(knex, [
    'equipment_revisions_no_update',
    'equipment_revisions_no_delete',
    'equipment_revisions_no_truncate',
  ]);
}
