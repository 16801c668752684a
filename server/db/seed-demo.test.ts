import { afterEach, describe, expect, it } from 'vitest';
import { buildTestApp, type TestApp } from '../test-support/test-app';
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
    await expect(seedDemoLab(t.db, { password: 'another-password', now: new Date() })).rejects.toBeInstanceOf(SeedRefusedError);
    expect(await t.db('users').count({ n: '*' }).first()).toEqual({ n: DEMO_PEOPLE.length });
  });

  it('runs every migration down and up again', async () => {
    t = await buildTestApp({ seed: false });
    const { migrationSource } = await import('./migration-source');
    await t.db.migrate.rollback({ migrationSource }, true);
    expect(await t.db.schema.hasTable('users')).toBe(false);
    await t.db.migrate.latest({ migrationSource });
    expect(await t.db.schema.hasTable('audit_events')).toBe(true);
  });
});
