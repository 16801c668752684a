import type { Knex } from 'knex';

/*
 * Shared by the migrations that guard record tables; it is part of them, so it is never edited
 * once they have landed (a changed guard is a new migration with its own helper).
 */

/**
 * A BEFORE trigger that refuses the change with `message`: SQLite's RAISE(ABORT), or on PostgreSQL a
 * plpgsql function (named after the trigger) that raises the same message. `when` is a condition
 * on NEW/OLD in the syntax both share. TRUNCATE exists only on PostgreSQL (a statement trigger there).
 */
export async function refuse(
  knex: Knex,
  trigger: string,
  event: 'INSERT' | 'UPDATE' | 'DELETE' | 'TRUNCATE',
  table: string,
  message: string,
  when?: string,
): Promise<void> {
  if (knex.client.config.client === 'pg') {
    await knex.raw(
      `CREATE FUNCTION ${trigger}() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION '${message}'; END $$`,
    );
    const level = event === 'TRUNCATE' ? 'FOR EACH STATEMENT' : 'FOR EACH ROW';
    await knex.raw(
      `CREATE TRIGGER ${trigger} BEFORE ${event} ON ${table} ${level} ${when ? `WHEN (${when}) ` : ''}EXECUTE FUNCTION ${trigger}()`,
    );
  } else if (event !== 'TRUNCATE') {
    await knex.raw(
      `CREATE TRIGGER ${trigger} BEFORE ${event} ON ${table}${when ? ` WHEN ${when}` : ''} BEGIN SELECT RAISE(ABORT, '${message}'); END`,
    );
  }
}

/** Drops the functions refuse() made on PostgreSQL; call it after dropping the tables (which take their triggers). */
export async function dropRefusals(knex: Knex, triggers: string[]): Promise<void> {
  if (knex.client.config.client !== 'pg') return;
  for (const trigger of triggers) await knex.raw(`DROP FUNCTION IF EXISTS ${trigger}()`);
}
