import type { Knex } from 'knex';

/** The masses actually weighed at the bench, and any deviation, recorded on a version once prepared. */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable('preparation_versions', (t) => {
    t.text('readings_json').nullable();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable('preparation_versions', (t) => {
    t.dropColumn('readings_json');
  });
}
