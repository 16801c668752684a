import type { Knex } from 'knex';

/**
 * Counters of password checks and reset requests (server/auth/attempt-limits.ts), in the database so
 * every instance on one PostgreSQL shares them. The columns are the ones rate-limiter-flexible's
 * SQLite and PostgreSQL stores read and write, in their order (its PostgreSQL upsert inserts
 * positionally): the prefixed key, the points used, and when they expire (milliseconds since 1970).
 */
export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable('auth_attempts', (t) => {
    t.string('key', 255).primary();
    t.integer('points').notNullable().defaultTo(0);
    t.bigInteger('expire');
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable('auth_attempts');
}
