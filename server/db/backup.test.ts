import { execFileSync } from 'node:child_process';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import knex from 'knex';
import { buildTestApp, demo, signIn } from '../test-support/test-app';

const root = join(import.meta.dirname, '..', '..');
const run = (script: string, args: string[], env: Record<string, string>) =>
  execFileSync(process.execPath, ['--import', 'tsx', join(root, 'server', 'cli', script), ...args], {
    env: { ...process.env, ...env },
    encoding: 'utf8',
    cwd: root,
  });

async function dump(file: string): Promise<Record<string, unknown[]>> {
  const db = knex({ client: 'better-sqlite3', connection: { filename: file }, useNullAsDefault: true });
  try {
    const tables = (await db.raw(
      "select name from sqlite_master where type = 'table' and name not like 'sqlite_%' order by name",
    )) as { name: string }[];
    const out: Record<string, unknown[]> = {};
    for (const { name } of tables) out[name] = await db(name).select('*').orderByRaw('rowid');
    return out;
  } finally {
    await db.destroy();
  }
}

// SQLite's online backup API and integrity_check; PostgreSQL is backed up with its own tools (pg_dump).
describe.runIf(!process.env.DATABASE_URL)('backup and restore of the SQLite file', () => {
  it('copies the live database online, and restoring brings back exactly that state without its sessions', async () => {
    const t = await buildTestApp();
    const labId = (await t.db('labs').first()).id;
    const qa = await signIn(t.app, demo('qa'));
    const flask = (await qa.get(`/api/labs/${labId}/equipment?kind=flask`).expect(200)).body[0];
    await qa.agent
      .put(`/api/labs/${labId}/equipment/${flask.id}`)
      .set('x-csrf-token', qa.token)
      .send({ data: { ...flask.current.data, fillRepeatabilityMl: 0.011 }, reason: 'Before the backup' })
      .expect(200);

    const backup = join(mkdtempSync(join(tmpdir(), 'dilutrace-backup-')), 'copy.sqlite');
    // Online: the app still has the database open while the backup runs.
    const output = run('backup.ts', [backup], { DILUTRACE_DB: t.file });
    expect(output).toMatch(/integrity ok/);
    const atBackup = await dump(t.file);

    await qa.agent
      .put(`/api/labs/${labId}/equipment/${flask.id}`)
      .set('x-csrf-token', qa.token)
      .send({ data: { ...flask.current.data, fillRepeatabilityMl: 0.013 }, reason: 'After the backup' })
      .expect(200);
    expect((await dump(t.file)).equipment_revisions.length).toBe(atBackup.equipment_revisions.length + 1);
    await t.close();

    expect(run('restore.ts', [backup], { DILUTRACE_DB: t.file })).toMatch(/Restored/);
    // Everything but the sessions, which a backup leaves out (everyone signs in again).
    expect(atBackup.sessions.length).toBeGreaterThan(0);
    expect(await dump(t.file)).toEqual({ ...atBackup, sessions: [] });
  });

  it('refuses to overwrite an existing backup file', async () => {
    const t = await buildTestApp();
    expect(() => run('backup.ts', [t.file], { DILUTRACE_DB: t.file })).toThrow(/already exists; choose another name/);
    await t.close();
  });
});
