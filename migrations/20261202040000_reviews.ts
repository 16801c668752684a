import type { Knex } from 'knex';
import { dropRefusals, refuse } from './support/refusal-triggers';

/**
 * The review trail of each version: submitted, returned (with comments), approved (with the
 * approver's statement and the SHA-256 of the snapshot they signed). Rows are append-only.
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('version_reviews', (t) => {
    t.increments('id').primary();
    t.integer('version_id').notNullable().references('preparation_versions.id');
    t.string('action', 12).notNullable();
    t.integer('actor_user_id').notNullable().references('users.id');
    t.string('at', 30).notNullable();
    t.text('comment').notNullable().defaultTo('');
    t.string('snapshot_sha256', 64).nullable();
    t.index(['version_id']);
  });
  await refuse(knex, 'version_reviews_no_update', 'UPDATE', 'version_reviews', 'review records are append-only');
  await refuse(knex, 'version_reviews_no_delete', 'DELETE', 'version_reviews', 'review records are append-only');
  await refuse(knex, 'version_reviews_no_truncate', 'TRUNCATE', 'version_reviews', 'review records are append-only');
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTableIfExists('version_reviews');
  await dropRefusals(knex, ['version_reviews_no_update', 'version_reviews_no_delete', 'version_reviews_no_truncate']);
}
