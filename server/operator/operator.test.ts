import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import knex from 'knex';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { migrationSource } from '../db/migration-source';
import {
  agentFor,
  buildTestApp,
  demo,
  DEMO_PASSWORD,
  signIn,
  tokenFromOutbox,
  type TestApp,
} from '../test-support/test-app';

let t: TestApp;
beforeEach(async () => {
  t = await buildTestApp();
});
afterEach(async () => {
  await t.close();
});

const userId = async (email: string): Promise<number> => (await t.db('users').where({ email }).first()).id;

describe('the instance operator', () => {
  it('is the demo admin account, and only it, told by Me', async () => {
    expect((await (await signIn(t.app, demo('admin'))).get('/api/auth/me').expect(200)).body.operator).toBe(true);
    expect((await (await signIn(t.app, demo('qa'))).get('/api/auth/me').expect(200)).body.operator).toBe(false);
  });

  it('reads captured bodies, by recipient; lab roles alone give no access', async () => {
    await (await agentFor(t.app)).post('/api/auth/password-reset', { email: demo('qa') }).expect(202);
    const token = await tokenFromOutbox(t.db, demo('qa'), '/reset-password/');
    const operator = await signIn(t.app, demo('admin'));
    const mail = (await operator.get(`/api/operator/mail?to=${encodeURIComponent(demo('qa'))}`).expect(200)).body as {
      to: string;
      text: string;
    }[];
    expect(mail).toHaveLength(1);
    expect(mail[0].text).toContain(token);
    expect((await operator.get('/api/operator/mail?to=nobody%40wellmere-water.example').expect(200)).body).toEqual([]);

    for (const local of ['qa', 'analyst', 'auditor'] as const) {
      await (await signIn(t.app, demo(local))).get('/api/operator/mail').expect(403);
    }
    await (await agentFor(t.app)).get('/api/operator/mail').expect(401);
  });

  it('disables an account everywhere (sessions end, sign-in refused) and enables it again, each audited without a lab', async () => {
    const qaId = await userId(demo('qa'));
    const qa = await signIn(t.app, demo('qa'));
    const operator = await signIn(t.app, demo('admin'));

    const disabled = (await operator.post(`/api/operator/accounts/${qaId}/disable`).expect(200)).body;
    expect(disabled).toMatchObject({ email: demo('qa'), active: false, labs: ['Wellmere Regional Water Laboratory'] });
    await qa.get('/api/auth/me').expect(401);
    await (await agentFor(t.app)).post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(401);
    expect(await t.db('memberships').where({ user_id: qaId })).toHaveLength(1);

    await operator.post(`/api/operator/accounts/${qaId}/enable`).expect(200);
    await signIn(t.app, demo('qa'));
    const events = await t.db('audit_events').whereIn('action', ['account.disabled', 'account.enabled']).orderBy('id');
    expect(events.map((e: { action: string; lab_id: number | null }) => [e.action, e.lab_id])).toEqual([
      ['account.disabled', null],
      ['account.enabled', null],
    ]);

    const accounts = (await operator.get('/api/operator/accounts').expect(200)).body as {
      email: string;
      operator: boolean;
    }[];
    expect(accounts.find((a) => a.email === demo('admin'))?.operator).toBe(true);
    expect(accounts).toHaveLength(5);
  });

  it('refuses operator actions to a lab admin who is not the operator, and the operator disabling itself', async () => {
    const operator = await signIn(t.app, demo('admin'));
    expect(
      (await operator.post(`/api/operator/accounts/${await userId(demo('admin'))}/disable`).expect(409)).body.error
        .code,
    ).toBe('own_account');
    await t
      .db('users')
      .where({ email: demo('admin') })
      .update({ operator: false });
    await operator.post(`/api/operator/accounts/${await userId(demo('qa'))}/disable`).expect(403);
    await operator.get('/api/operator/accounts').expect(403);
    expect(
      Boolean(
        (
          await t
            .db('users')
            .where({ email: demo('qa') })
            .first()
        ).active,
      ),
    ).toBe(true);
  });
});

describe.runIf(!process.env.DATABASE_URL)('the operator command line', () => {
  const root = resolve(__dirname, '..', '..');
  const run = (...args: string[]) =>
    execFileSync(process.execPath, ['--import', 'tsx', join(root, 'server', 'cli', 'operator.ts'), ...args], {
      env: { ...process.env, DILUTRACE_DB: t.file },
      encoding: 'utf8',
      cwd: root,
    });

  it('disables, enables and grants by e-mail, each an audit event of the instance', async () => {
    expect(run('disable-account', demo('analyst'))).toMatch(/analyst@wellmere-water\.example: disabled/);
    await (
      await agentFor(t.app)
    )
      .post('/api/auth/login', { email: demo('analyst'), password: DEMO_PASSWORD })
      .expect(401);
    expect(run('enable-account', demo('analyst'))).toMatch(/: active/);
    expect(run('grant', demo('qa'))).toMatch(/instance operator/);
    expect((await (await signIn(t.app, demo('qa'))).get('/api/auth/me')).body.operator).toBe(true);
    const events = await t
      .db('audit_events')
      .whereIn('action', ['account.disabled', 'account.enabled', 'operator.granted'])
      .whereNull('lab_id');
    expect(events).toHaveLength(3);
    expect(() => run('disable-account', 'nobody@nowhere.example')).toThrow(/The account was not found/);
  }, 30_000);
});

describe.runIf(!process.env.DATABASE_URL)('the operator migration', () => {
  it('makes an existing demo admin account the operator', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'dilutrace-operator-'));
    const db = knex({
      client: 'better-sqlite3',
      connection: { filename: join(dir, 'old.sqlite') },
      useNullAsDefault: true,
    });
    try {
      for (;;) {
        const [, pending] = (await db.migrate.list({ migrationSource })) as [unknown[], { file?: string }[] | string[]];
        const next = pending[0];
        const name = typeof next === 'string' ? next : next?.file;
        if (!name || name.startsWith('20261203010000')) break;
        await db.migrate.up({ migrationSource });
      }
      const at = new Date().toISOString();
      await db('users').insert([
        { email: demo('admin'), name: 'Rowan Achterberg', password_hash: 'x', active: true, created_at: at },
        { email: demo('qa'), name: 'Imogen Tasker', password_hash: 'x', active: true, created_at: at },
      ]);
      await db.migrate.latest({ migrationSource });
      const rows = await db('users').orderBy('email').select('email', 'operator');
      expect(rows.map((r: { email: string; operator: number }) => [r.email, Boolean(r.operator)])).toEqual([
        [demo('admin'), true],
        [demo('qa'), false],
      ]);
    } finally {
      await db.destroy();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('an invitation mailed to a person reaches them through the operator', () => {
  it('files the invitation under its lab for the log, with the body only for the operator', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const labId = (await t.db('labs').first()).id;
    await admin
      .post(`/api/labs/${labId}/invitations`, { email: 'new@wellmere-water.example', name: 'New', role: 'analyst' })
      .expect(201);
    const token = await tokenFromOutbox(t.db, 'new@wellmere-water.example', '/invitation/');
    const mail = (await admin.get('/api/operator/mail').expect(200)).body as { text: string }[];
    expect(mail[0].text).toContain(token);
    const row = await t.db('outbox').orderBy('id', 'desc').first();
    expect(row.lab_id).toBe(labId);
  });
});
