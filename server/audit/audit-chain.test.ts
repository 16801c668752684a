import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import knex, { type Knex } from 'knex';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { migrationSource } from '../db/migration-source';
import { approvedLeadStandard } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, dropTrigger, signIn, type TestApp } from '../test-support/test-app';
import { auditEventHash, GENESIS_HASH } from './audit-chain';
import { auditRepository } from './audit-repository';
import { verifyRecords } from './verify-records';

const root = join(import.meta.dirname, '..', '..');
/** `npm run verify` against a SQLite file: its exit code and everything it printed. */
function runVerify(file: string): { code: number; output: string } {
  try {
    const out = execFileSync(process.execPath, ['--import', 'tsx', join(root, 'server', 'cli', 'verify.ts')], {
      env: { ...process.env, DILUTRACE_DB: file },
      encoding: 'utf8',
      cwd: root,
      stdio: 'pipe',
    });
    return { code: 0, output: out };
  } catch (error) {
    const e = error as { status: number; stdout: string; stderr: string };
    return { code: e.status, output: `${e.stdout}${e.stderr}` };
  }
}

let t: TestApp;
let labId: number;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
});
afterEach(async () => {
  await t.close();
});

/** Some real activity: a preparation computed, submitted and approved. */
async function approveOne() {
  const analyst = await signIn(t.app, demo('analyst'));
  const qa = await signIn(t.app, demo('qa'));
  const id = await approvedLeadStandard(analyst, qa, labId, DEMO_PASSWORD);
  return t.db('preparation_versions').where({ preparation_id: id, number: 1 }).first();
}

const events = (): Promise<{ id: number; previous_hash: string; event_hash: string; summary: string }[]> =>
  t.db('audit_events').orderBy('id');

describe('the audit trail is a hash chain', () => {
  it('links every event to the one before it, from the chain start', async () => {
    await approveOne();
    const trail = await events();
    expect(trail.length).toBeGreaterThan(3);
    expect(trail[0].previous_hash).toBe(GENESIS_HASH);
    for (let i = 1; i < trail.length; i++) expect(trail[i].previous_hash).toBe(trail[i - 1].event_hash);
    expect(new Set(trail.map((e) => e.event_hash)).size).toBe(trail.length);
    expect((await verifyRecords(t.db)).breaks).toEqual([]);
  });

  it('does not fork under concurrent writers', async () => {
    const audit = auditRepository(t.db, () => new Date());
    await Promise.all(
      Array.from({ length: 25 }, (_, i) =>
        audit.record({
          labId,
          actorUserId: null,
          action: 'test.concurrent',
          entityType: 'lab',
          entityId: labId,
          summary: `writer ${i}`,
        }),
      ),
    );
    const trail = await events();
    expect(trail.length).toBeGreaterThanOrEqual(26);
    expect(new Set(trail.map((e) => e.previous_hash)).size).toBe(trail.length);
    expect((await verifyRecords(t.db)).breaks).toEqual([]);
  });

  it('refuses an event written without its chain hash', async () => {
    await expect(
      t.db('audit_events').insert({
        lab_id: labId,
        action: 'x',
        entity_type: 'lab',
        summary: 'unchained',
        created_at: new Date().toISOString(),
      }),
    ).rejects.toThrow(/chain hash/);
  });

  it('names the altered event, the removed one and the altered approved snapshot', async () => {
    const version = await approveOne();
    const trail = await events();
    await dropTrigger(t.db, 'audit_events_no_update', 'audit_events');
    await dropTrigger(t.db, 'audit_events_no_delete', 'audit_events');
    await dropTrigger(t.db, 'preparation_versions_approved_no_update', 'preparation_versions');
    await t.db('audit_events').where({ id: trail[1].id }).update({ summary: 'Nothing happened here' });
    await t.db('audit_events').where({ id: trail[3].id }).delete();
    await t
      .db('preparation_versions')
      .where({ id: version.id })
      .update({ snapshot_json: version.snapshot_json.replace('"seed":', '"seed": ') });
    const { breaks } = await verifyRecords(t.db);
    expect(breaks).toEqual([
      { table: 'audit_events', id: trail[1].id, problem: expect.stringMatching(/^event_hash differs .*altered/) },
      {
        table: 'audit_events',
        id: trail[4].id,
        problem: expect.stringMatching(
          new RegExp(`previous_hash does not match the hash of event ${trail[2].id} .*removed`),
        ),
      },
      { table: 'preparation_versions', id: version.id, problem: expect.stringMatching(/snapshot_json does not hash/) },
      { table: 'preparation_versions', id: version.id, problem: expect.stringMatching(/signed at approval differs/) },
      { table: 'preparation_versions', id: version.id, problem: expect.stringMatching(/do not hash to record_sha256/) },
      {
        table: 'preparation_versions',
        id: version.id,
        problem: expect.stringMatching(/record hash signed at approval differs/),
      },
    ]);
  });
});

// The CLI opens the SQLite file named by DILUTRACE_DB; on PostgreSQL the same checks run above.
describe.runIf(!process.env.DATABASE_URL)('npm run verify', () => {
  it('says intact and exits 0, then names the broken row and exits non-zero', async () => {
    await approveOne();
    const ok = runVerify(t.file);
    expect(ok.code, ok.output).toBe(0);
    expect(ok.output).toMatch(/^Intact: \d+ audit events .* all 1 approved versions/m);
    const [first] = await events();
    await dropTrigger(t.db, 'audit_events_no_update', 'audit_events');
    await t.db('audit_events').where({ id: first.id }).update({ summary: 'Forged' });
    const bad = runVerify(t.file);
    expect(bad.code).toBe(1);
    expect(bad.output).toContain(`BROKEN audit_events id ${first.id}: event_hash differs`);
  });

  it('chains the events that existed before the migration', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-chain-')), 'old.sqlite');
    const before: Knex.MigrationSource<string> = {
      ...migrationSource,
      getMigrations: async () => (await migrationSource.getMigrations([])).filter((name) => name < '20261203030000'),
    };
    const db = knex({ client: 'better-sqlite3', connection: { filename: file }, useNullAsDefault: true });
    try {
      await db.migrate.latest({ migrationSource: before });
      const [lab] = await db('labs')
        .insert({ name: 'Old Lab', slug: 'old', created_at: '2026-01-01T00:00:00.000Z' })
        .returning('id');
      for (const summary of ['first', 'second', 'third'])
        await db('audit_events').insert({
          lab_id: lab.id,
          action: 'old.event',
          entity_type: 'lab',
          summary,
          created_at: '2026-01-01T00:00:00.000Z',
        });
      await db.migrate.latest({ migrationSource });
      const trail: { previous_hash: string; event_hash: string; summary: string }[] =
        await db('audit_events').orderBy('id');
      expect(trail.map((e) => e.summary)).toEqual(['first', 'second', 'third']);
      expect(trail[0].previous_hash).toBe(GENESIS_HASH);
      expect(trail[2].event_hash).toBe(
        auditEventHash((await db('audit_events').orderBy('id'))[2], trail[1].event_hash),
      );
      await expect(db('audit_events').update({ summary: 'x' })).rejects.toThrow(/append-only/);
      expect((await verifyRecords(db)).breaks).toEqual([]);
    } finally {
      await db.destroy();
    }
  });
});
