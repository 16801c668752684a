import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import knex, { type Knex } from 'knex';
import { migrationSource } from './migration-source';

export type Db = Knex;

export interface OpenOptions {
  /** PostgreSQL only: the schema to work in, created if missing (the tests give each app its own). */
  schema?: string;
}

/** True for a `postgres://` or `postgresql://` connection URL. */
export const isPostgresUrl = (target: string) => /^postgres(ql)?:\/\//i.test(target);

/** True when the database is PostgreSQL (otherwise it is the SQLite file). */
export const isPostgres = (db: Db) => db.client.config.client === 'pg';

/**
 * Opens the database and applies pending migrations. A `postgres://` URL opens PostgreSQL through a
 * pool of connections, so several app instances can share it (one migrates at a time). Anything
 * else is a SQLite file (created if missing), opened with WAL journaling, foreign keys on and
 * synchronous=FULL, so an acknowledged commit survives a power cut, and recursive triggers on (so
 * REPLACE fires the delete guards), on a single connection.
 */
export async function openDatabase(target: string, options: OpenOptions = {}): Promise<Db> {
  const db = isPostgresUrl(target) ? openPostgres(target, options) : openSqlite(target);
  await migrate(db, options.schema);
  return db;
}

/**
 * Applies pending migrations (creating the schema first, if one is named). On PostgreSQL, instances
 * starting together take turns under an advisory lock: Knex makes its own lock table on the first
 * run, and two runs making it at once leave two lock rows, after which Knex never migrates again.
 */
async function migrate(db: Db, schema: string | undefined): Promise<void> {
  if (!isPostgres(db)) {
    await db.migrate.latest({ migrationSource });
    return;
  }
  await db.transaction(async (trx) => {
    // Waiting for another instance's migrations is not a lock to give up on.
    await trx.raw('set local lock_timeout = 0');
    await trx.raw('select pg_advisory_xact_lock(hashtext(?))', [`dilutrace migrations ${schema ?? ''}`]);
    if (schema) await db.raw('create schema if not exists ??', [schema]);
    await db.migrate.latest({ migrationSource });
  });
}

/** How long a PostgreSQL statement waits for a row or table lock before it fails (answered 503), ms. */
export const POSTGRES_LOCK_TIMEOUT_MS = 5000;

function openPostgres(url: string, options: OpenOptions): Db {
  return knex({
    client: 'pg',
    connection: url,
    searchPath: options.schema ? [options.schema] : undefined,
    pool: {
      min: 0,
      max: 10,
      afterCreate: (
        conn: { query: (sql: string, done: (error: Error | null) => void) => void },
        done: (error: Error | null, conn: unknown) => void,
      ) => {
        conn.query(`set lock_timeout = ${POSTGRES_LOCK_TIMEOUT_MS}`, (error) => done(error, conn));
      },
    },
  });
}

function openSqlite(filename: string): Db {
  if (filename !== ':memory:') mkdirSync(dirname(filename), { recursive: true });
  return knex({
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
          // REPLACE deletes the conflicting row; only with recursive triggers does that delete fire the
          // record tables' delete guards (otherwise INSERT OR REPLACE silently rewrites a record).
          conn.pragma('recursive_triggers = ON');
          done(null, conn);
        } catch (error) {
          done(error as Error, conn);
        }
      },
    },
  });
}
