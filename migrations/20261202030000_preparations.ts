import type { Knex } from 'knex';
import { dropRefusals, refuse } from './support/refusal-triggers';

/** Preparations and their versions; an approved version can never change or be removed. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('preparations', (t) => {
    t.increments('id').primary();
    t.integer('lab_id').notNullable().references('labs.id');
    t.string('title', 200).notNullable();
    t.string('analyte', 40).notNullable().defaultTo('');
    t.string('material_code', 40).nullable();
    t.integer('created_by').notNullable().references('users.id');
    t.string('created_at', 30).notNullable();
    t.string('updated_at', 30).notNullable();
    t.index(['lab_id', 'updated_at']);
  });

  await knex.schema.createTable('preparation_versions', (t) => {
    t.increments('id').primary();
    t.integer('preparation_id').notNullable().references('preparations.id');
    t.integer('number').notNullable();
    t.string('status', 12).notNullable().defaultTo('draft');
    t.text('plan_json').notNullable();
    t.text('overrides_json').notNullable().defaultTo('[]');
    t.bigInteger('seed').notNullable();
    t.text('problem_json').nullable();
    t.text('snapshot_json').nullable();
    t.string('snapshot_sha256', 64).nullable();
    t.text('result_statement').nullable();
    t.double('value').nullable();
    t.string('unit', 20).nullable();
    t.double('relative_expanded_uncertainty').nullable();
    t.integer('created_by').notNullable().references('users.id');
    t.string('created_at', 30).notNullable();
    t.string('updated_at', 30).notNullable();
    t.unique(['preparation_id', 'number']);
  });
  await refuse(
    knex,
    'preparation_versions_approved_no_update',
    'UPDATE',
    'preparation_versions',
    'an approved version is immutable',
    "OLD.status = 'approved'",
  );
  await refuse(
    knex,
    'preparation_versions_approved_no_delete',
    'DELETE',
    'preparation_versions',
    'an approved version is immutable',
    "OLD.status = 'approved'",
  );
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('preparation_versions');
  await knex.schema.dropTableIfExists('preparations');
  await dropRefusals(knex, ['preparation_versions_approved_no_update', 'preparation_versions_approved_no_delete']);
}
