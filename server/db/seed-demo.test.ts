import { statSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { buildTestApp, countRows, type TestApp } from '../test-support/test-app';
import { isPostgres } from './connection';
import { DEMO_PEOPLE, SeedRefusedError, seedDemoLab } from './seed-demo';

let t: TestApp;
afterEach(async () => {
  await t.close();
});

describe('demo lab seed', () => {
  it('creates one user per demo role and refuses a database that already has users', async () => {
    t = await buildTestApp();
    const emails = (await t.db('users').orderBy('id')).map((u: { email: string }) => u.email);
    expect(emails).toEqual(DEMO_PEOPLE.map((p) => `${p.local}@wellmere-water.example`));
    await expect(
      seedDemoLab(t.db, { password: 'another-password', now: new Date(), certificateDir: '/nonexistent' }),
    ).rejects.toBeInstanceOf(SeedRefusedError);
    expect(await countRows(t.db('users'))).toBe(DEMO_PEOPLE.length);
  });

  it('fills the demo library: two balances, class A and B flasks, glass and piston pipettes, two materials with certificates', async () => {
    t = await buildTestApp();
    const kinds = Object.fromEntries(
      (
        (await t.db('equipment_items').select('kind').count({ n: '*' }).groupBy('kind')) as {
          kind: string;
          n: number | string;
        }[]
      ).map((r) => [r.kind, Number(r.n)]),
    );
    expect(kinds).toEqual({
      balance: 2,
      flask: 11,
      'glass-pipette': 6,
      'piston-pipette': 3,
      'solid-material': 1,
      'solution-material': 1,
    });
    const certificates = await t.db('certificates').select('stored_name', 'size_bytes');
    expect(certificates).toHaveLength(3);
    for (const c of certificates)
      expect(statSync(join(t.file, '..', 'certificates', c.stored_name)).size).toBe(c.size_bytes);
    const lead = await t
      .db('equipment_revisions as r')
      .join('equipment_items as i', 'i.id', 'r.item_id')
      .where('i.code', 'RM-PBN-01')
      .first();
    expect(JSON.parse(lead.data_json).hazardNotes).toMatch(/toxic/);
  });

  it('runs every migration down and up again', async () => {
    t = await buildTestApp({ seed: false });
    const { migrationSource } = await import('./migration-source');
    await t.db.migrate.rollback({ migrationSource }, true);
    expect(await t.db.schema.hasTable('users')).toBe(false);
    // Nothing of the guards is left behind: SQLite's triggers, or PostgreSQL's trigger functions.
    const leftovers = isPostgres(t.db)
      ? t
          .db('pg_proc as p')
          .join('pg_namespace as n', 'n.oid', 'p.pronamespace')
          .whereRaw('n.nspname = current_schema()')
      : t.db('sqlite_master').where({ type: 'trigger' });
    expect(await countRows(leftovers)).toBe(0);
    await t.db.migrate.latest({ migrationSource });
    expect(await t.db.schema.hasTable('audit_events')).toBe(true);
  });
});
