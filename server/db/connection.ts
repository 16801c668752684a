import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import knex, { type Knex } from 'knex';
import { migrationSource } from './migration-source';

export type Db = Knex;

/**
 * Opens the SQLite file (created if missing) with WAL journaling, foreign keys on and
 * synchronous=FULL, so an acknowledged commit survives a power cut, then applies pending migrations.
 */
export async function openDatabase(filename: string): Promise<Db> {
  if (filename !== ':memory:') mkdirSync(dirname(filename), { recursive: true });
  const db = knex({
    client: 'better-sqlite3',
    connection: { filename },
    useNullAsDefault: true,
    pool: {
      min: 1,
      max: 1,
      afterCreate: (conn: { pragma: (sql: string) => unknown }, done: (error: Error | null, conn: unknown) => void) => {
        try {
          conn.pragma('journal_mode = WAL');
          conn.pragma('synchronous = FULL');
          conn.pragma('foreign_keys = ON');
          conn.pragma('busy_timeout = 5000');
          done(null, conn);
        } catch (error) {
          done(error as Error, conn);
        }
      },
    },
  });
  await db.migrate.latest({ migrationSource });
  return db;
}
