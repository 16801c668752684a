import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { createApp, type AppConfig } from '../app';
import type { Computer } from '../compute/compute-pool';
import { isPostgres, openDatabase, type Db } from '../db/connection';
import { demoEmail, seedDemoLab } from '../db/seed-demo';
import type { Clock } from '../lib/clock';
import { startCaptureServer, type CaptureServer } from '../mail/capture-server';
import { createSmtpMailer, type Mailer } from '../mail/mailer';

export const DEMO_PASSWORD = 'test-demo-password-1';
export const SESSION_SECRET = 'test-session-secret-that-is-long-enough-0123456789';

/** A settable clock for tests. */
export function testClock(start = new Date('2026-12-02T09:00:00Z')): Clock & { advance(ms: number): void } {
  let t = start.getTime();
  return { now: () => new Date(t), advance: (ms) => void (t += ms) };
}

export interface TestApp {
  app: ReturnType<typeof createApp>['app'];
  db: Db;
  /** The SQLite file (on PostgreSQL, a path in the test's folder that only places the certificates). */
  file: string;
  clock: ReturnType<typeof testClock>;
  close(): Promise<void>;
  /** Builds a second app on the same database, as after a server restart. */
  restart(): Promise<TestApp>;
}

/** Set when the API tests run on PostgreSQL (`npm run test:postgres`); SQLite otherwise. */
export const postgresUrl = process.env.DATABASE_URL;

/**
 * A fresh database with the demo lab seeded, the local SMTP capture, and the app: a new SQLite
 * file, or with DATABASE_URL set a new schema of its own on that PostgreSQL (dropped on close).
 */
export async function buildTestApp(
  options: {
    file?: string;
    schema?: string;
    seed?: boolean;
    clock?: ReturnType<typeof testClock>;
    config?: Partial<AppConfig>;
    wrapMailer?: (mailer: Mailer) => Mailer;
    computer?: Computer;
  } = {},
): Promise<TestApp> {
  const dir = options.file ? null : mkdtempSync(join(tmpdir(), 'dilutrace-test-'));
  const file = options.file ?? join(dir as string, 'test.sqlite');
  const schema = postgresUrl ? (options.schema ?? `test_${randomBytes(8).toString('hex')}`) : undefined;
  const clock = options.clock ?? testClock();
  const db = postgresUrl ? await openDatabase(postgresUrl, { schema }) : await openDatabase(file);
  if (options.seed !== false)
    await seedDemoLab(db, {
      password: DEMO_PASSWORD,
      now: clock.now(),
      certificateDir: join(file, '..', 'certificates'),
    });
  const capture: CaptureServer = await startCaptureServer(db, () => clock.now());
  const mailer: Mailer = createSmtpMailer(`smtp://127.0.0.1:${capture.port}`, 'Dilutrace <no-reply@dilutrace.test>');
  const { app, close: closeApp } = createApp({
    db,
    mailer: options.wrapMailer ? options.wrapMailer(mailer) : mailer,
    clock,
    computer: options.computer,
    config: {
      certificateDir: join(file, '..', 'certificates'),
      sessionSecret: SESSION_SECRET,
      publicUrl: 'http://dilutrace.test',
      production: false,
      trustProxy: false,
      log: () => undefined,
      ...options.config,
    },
  });
  const stop = async () => {
    await closeApp();
    mailer.close();
    await capture.close();
  };
  const dropDatabase = async () => {
    if (schema) await db.raw('drop schema if exists ?? cascade', [schema]);
    await db.destroy();
    if (dir) rmSync(dir, { recursive: true, force: true });
  };
  return {
    app,
    db,
    file,
    clock,
    close: async () => {
      await stop();
      await dropDatabase();
    },
    restart: async () => {
      await stop();
      await db.destroy();
      const next = await buildTestApp({ file, schema, seed: false, clock, config: options.config });
      return {
        ...next,
        close: async () => {
          await next.close();
          if (dir) rmSync(dir, { recursive: true, force: true });
        },
      };
    },
  };
}

/** A cookie-keeping client with the session's CSRF token attached to every state-changing call. */
export async function agentFor(app: TestApp['app']) {
  const agent = request.agent(app);
  let token = (await agent.get('/api/auth/csrf').expect(200)).body.csrfToken as string;
  const send = <T extends 'post' | 'patch' | 'put' | 'delete'>(method: T, url: string, body?: object) =>
    agent[method](url).set('x-csrf-token', token).send(body);
  return {
    agent,
    get: (url: string) => agent.get(url),
    post: (url: string, body?: object) => send('post', url, body),
    patch: (url: string, body?: object) => send('patch', url, body),
    delete: (url: string) => send('delete', url),
    setToken: (next: string) => void (token = next),
    get token() {
      return token;
    },
  };
}
export type Client = Awaited<ReturnType<typeof agentFor>>;

/** Signs in and keeps the new session's CSRF token. */
export async function signIn(app: TestApp['app'], email: string, password = DEMO_PASSWORD): Promise<Client> {
  const client = await agentFor(app);
  const res = await client.post('/api/auth/login', { email, password });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  client.setToken(res.body.csrfToken);
  return client;
}

export const demo = (local: 'admin' | 'qa' | 'analyst' | 'analyst2' | 'auditor') => demoEmail(local);

/**
 * The token in the newest captured mail to `to` whose link path starts with `prefix`. Waits up to
 * two seconds for it: a reset link is mailed after the request has been answered.
 */
export async function tokenFromOutbox(
  db: Db,
  to: string,
  prefix: '/invitation/' | '/reset-password/',
): Promise<string> {
  for (let waited = 0; ; waited += 20) {
    const rows: { to_address: string; text_body: string }[] = await db('outbox').orderBy('id', 'desc');
    const mail = rows.find((row) => row.to_address.includes(to) && row.text_body.includes(prefix));
    const match = mail?.text_body.match(new RegExp(`${prefix}([A-Za-z0-9_-]+)`));
    if (match) return match[1];
    if (waited >= 2000) throw new Error(`no ${prefix} mail to ${to}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

/** Drops a trigger the way someone with direct database access could (PostgreSQL names its table too). */
export async function dropTrigger(db: Db, trigger: string, table: string): Promise<void> {
  if (isPostgres(db)) await db.raw('drop trigger ?? on ??', [trigger, table]);
  else await db.raw('drop trigger ??', [trigger]);
}

/** A table's row count as a number (PostgreSQL's count(*) is a bigint, which pg returns as a string). */
export async function countRows(query: ReturnType<Db>): Promise<number> {
  return Number((await query.count({ n: '*' }).first())?.n ?? 0);
}
