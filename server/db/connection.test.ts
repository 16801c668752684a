import { randomBytes } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { postgresUrl } from '../test-support/test-app';
import { openDatabase } from './connection';
import { migrationSource } from './migration-source';

// Several instances sharing one PostgreSQL is a PostgreSQL set-up; SQLite has one server on its file.
describe.runIf(postgresUrl)('several instances starting at once on one empty PostgreSQL', () => {
  it('all start, and the migrations ran once under one lock row', async () => {
    const schema = `test_${randomBytes(8).toString('hex')}`;
    const opened = await Promise.allSettled([1, 2, 3].map(() => openDatabase(postgresUrl as string, { schema })));
    const dbs = opened.flatMap((result) => (result.status === 'fulfilled' ? [result.value] : []));
    try {
      expect(opened.map((result) => (result.status === 'rejected' ? String(result.reason) : 'opened'))).toEqual([
        'opened',
        'opened',
        'opened',
      ]);
      const [db] = dbs;
      expect(await db('knex_migrations_lock').select('is_locked')).toEqual([{ is_locked: 0 }]);
      const applied = (await db('knex_migrations').select('name')).map((row: { name: string }) => row.name);
      expect(applied.sort()).toEqual(await migrationSource.getMigrations([]));
    } finally {
      if (dbs[0]) await dbs[0].raw('drop schema if exists ?? cascade', [schema]);
      for (const db of dbs) await db.destroy();
    }
  });
});
