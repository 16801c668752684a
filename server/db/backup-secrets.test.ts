import { execFileSync } from 'node:child_process';
import { createHmac } from 'node:crypto';
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterEach, describe, expect, it } from 'vitest';
import { httpClient, startServer, type RunningServer } from '../../tests/system/server-process';
import { demo } from '../test-support/test-app';

const root = join(import.meta.dirname, '..', '..');
const DEMO_PASSWORD = 'backup-test-demo-password';

/** Runs one of the backup CLIs; its exit code and everything it printed. */
function run(script: 'backup.ts' | 'restore.ts', args: string[], file: string): { code: number; output: string } {
  try {
    const out = execFileSync(process.execPath, ['--import', 'tsx', join(root, 'server', 'cli', script), ...args], {
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

const servers: RunningServer[] = [];
async function start(file: string): Promise<RunningServer> {
  const server = await startServer({ DILUTRACE_DB: file, DILUTRACE_DEMO_PASSWORD: DEMO_PASSWORD });
  servers.push(server);
  return server;
}
async function stop(server: RunningServer): Promise<void> {
  if (server.process.exitCode !== null || server.process.signalCode !== null) return;
  const exited = new Promise((resolve) => server.process.once('exit', resolve));
  server.process.kill('SIGTERM');
  await exited;
}
afterEach(async () => {
  for (const server of servers.splice(0)) await stop(server);
});

/** An express-session cookie value for `sid`, signed the way express-session signs it (HMAC-SHA256, base64 without padding). */
const signSid = (sid: string, secret: string) =>
  `s:${sid}.${createHmac('sha256', secret).update(sid).digest('base64').replace(/=+$/, '')}`;

/** Reads a SQLite file directly, as anyone holding a copy of it could. */
function readKeys(file: string): { secret: string | undefined; sids: string[] } {
  const db = new Database(file, { readonly: true, fileMustExist: true });
  try {
    const secret = (
      db.prepare("select value from app_settings where key = 'session_secret'").get() as { value: string } | undefined
    )?.value;
    const sids = (db.prepare('select sid from sessions').all() as { sid: string }[]).map((r) => r.sid);
    return { secret, sids };
  } finally {
    db.close();
  }
}

const me = (server: RunningServer, cookie: string) =>
  fetch(`${server.url}/api/auth/me`, { headers: { cookie } }).then((r) => r.status);

// The SQLite file's own backup and restore; PostgreSQL uses pg_dump and pg_restore.
describe.runIf(!process.env.DATABASE_URL)('backups and the keys to sessions', () => {
  it('leaves sessions and the session secret out of a backup', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-keys-')), 'live.sqlite');
    const server = await start(file);
    await (await httpClient(server.url)).signIn(demo('qa'), DEMO_PASSWORD);
    expect(readKeys(file).sids.length).toBeGreaterThan(0);
    const backup = join(file, '..', 'backup.sqlite');
    expect(run('backup.ts', [backup], file).code).toBe(0);
    expect(readKeys(backup)).toEqual({ secret: undefined, sids: [] });
    expect(readKeys(file).secret).toMatch(/.{32,}/);
  }, 60_000);

  it('refuses a cookie forged from an older backup once that backup is restored', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-keys-')), 'live.sqlite');
    const first = await start(file);
    const qa = await httpClient(first.url);
    await qa.signIn(demo('qa'), DEMO_PASSWORD);
    // A raw copy holding the secret and live sessions (what a backup held before they were left out).
    const stolen = join(file, '..', 'stolen.sqlite');
    const live = new Database(file, { fileMustExist: true });
    await live.backup(stolen);
    live.close();
    const { secret, sids } = readKeys(stolen);
    expect(secret?.length).toBeGreaterThanOrEqual(32); // the stolen copy holds the session secret
    const forged = `dilutrace.sid=${encodeURIComponent(signSid(sids[0], secret as string))}`;
    expect(await me(first, forged)).toBe(200); // the forgery works against the database it came from

    await stop(first);
    const restored = run('restore.ts', [stolen], file);
    expect(restored.code, restored.output).toBe(0);
    const second = await start(file);
    expect(await me(second, forged)).toBe(401);
    expect(await me(second, qa.cookie())).toBe(401);
    expect(readKeys(file).secret).not.toBe(secret);
  }, 90_000);

  it('refuses to restore while a server has the database open, says how to stop it, and changes nothing', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-keys-')), 'live.sqlite');
    const server = await start(file);
    const backup = join(file, '..', 'backup.sqlite');
    expect(run('backup.ts', [backup], file).code).toBe(0);
    const qa = await httpClient(server.url);
    const { activeLabId } = await qa.signIn(demo('qa'), DEMO_PASSWORD);
    const policy = await qa.request('GET', `/api/labs/${activeLabId}/policy`);
    expect(policy.status).toBe(200);

    const refused = run('restore.ts', [backup], file);
    expect(refused.code).toBe(3);
    expect(refused.output).toMatch(/is open in a running Dilutrace \(process \d+\)/);
    expect(refused.output).toContain(`kill -TERM ${server.process.pid}`);
    expect(refused.output).toMatch(/Nothing was changed/);
    // The running server never noticed: its sessions and its data are as they were.
    expect((await qa.request('GET', `/api/labs/${activeLabId}/policy`)).status).toBe(200);

    await stop(server);
    const done = run('restore.ts', [backup], file);
    expect(done.code, done.output).toBe(0);
    expect(done.output).toMatch(/Restored/);
  }, 90_000);

  it('restores after a server was killed outright: a crash leaves no stale lock behind', async () => {
    const file = join(mkdtempSync(join(tmpdir(), 'dilutrace-keys-')), 'live.sqlite');
    const server = await start(file);
    const backup = join(file, '..', 'backup.sqlite');
    expect(run('backup.ts', [backup], file).code).toBe(0);
    const killed = new Promise((resolve) => server.process.once('exit', resolve));
    server.process.kill('SIGKILL');
    await killed;
    const done = run('restore.ts', [backup], file);
    expect(done.code, done.output).toBe(0);
  }, 60_000);
});
