import { afterEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import type { Mailer } from '../mail/mailer';
import { plannedLeadStandard } from '../test-support/demo-plans';
import {
  agentFor,
  buildTestApp,
  countRows,
  demo,
  DEMO_PASSWORD,
  signIn,
  tokenFromOutbox,
  type TestApp,
} from '../test-support/test-app';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

const lockouts = (app: TestApp) => countRows(app.db('audit_events').where({ action: 'auth.locked_out' }));

describe('sign-in limits', () => {
  it('counts every spelling of one address on one counter (spaces, tabs, capitals)', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    const spellings = [
      ` ${demo('qa')}`,
      `\t${demo('qa')}`,
      demo('qa').toUpperCase(),
      `${demo('qa')} `,
      `\n Qa@wellmere-water.example`,
    ];
    for (let i = 0; i < 10; i += 1)
      await client
        .post('/api/auth/login', { email: spellings[i % spellings.length], password: 'wrong-password' })
        .expect(401);
    const res = await client.post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(429);
    expect(res.body.error.message).toMatch(/Too many sign-in attempts/);
    expect(await lockouts(t)).toBe(1);
  });

  it('lets no more guesses through than the limit when they arrive at once', async () => {
    t = await buildTestApp({ config: { signInLimit: 5 } });
    const clients = await Promise.all(Array.from({ length: 12 }, () => agentFor(t!.app)));
    const answers = await Promise.all(
      clients.map((client, i) => client.post('/api/auth/login', { email: demo('qa'), password: `guess-${i}` })),
    );
    const statuses = answers.map((res) => res.status).sort();
    expect(statuses.filter((s) => s === 401)).toHaveLength(5);
    expect(statuses.filter((s) => s === 429)).toHaveLength(7);
    expect(await lockouts(t)).toBe(1);
  });

  it('limits password spraying across many accounts from one client address, and audits the lock-out once', async () => {
    t = await buildTestApp({ config: { attemptLimits: { perClient: 5 } } });
    const client = await agentFor(t.app);
    for (let i = 0; i < 5; i += 1)
      await client
        .post('/api/auth/login', { email: `person${i}@wellmere-water.example`, password: 'Summer2026!' })
        .expect(401);
    const locked = await client
      .post('/api/auth/login', { email: demo('analyst'), password: DEMO_PASSWORD })
      .expect(429);
    expect(locked.body.error.code).toBe('rate_limited');
    expect(Number(locked.headers['retry-after'])).toBeGreaterThan(0);
    await client.post('/api/auth/login', { email: 'someone-else@wellmere-water.example', password: 'x' }).expect(429);
    expect(await lockouts(t)).toBe(1);
    const [event] = await t.db('audit_events').where({ action: 'auth.locked_out' });
    expect(event.summary).toMatch(/client address/);
  });

  it('does not count successful sign-ins, so a lab behind one address can sign in all morning', async () => {
    t = await buildTestApp({ config: { attemptLimits: { perClient: 3 } } });
    for (let i = 0; i < 6; i += 1) await signIn(t.app, demo(i % 2 ? 'qa' : 'analyst'));
    const client = await agentFor(t.app);
    await client.post('/api/auth/login', { email: demo('qa'), password: 'wrong-password' }).expect(401);
  });

  it('has an instance-wide ceiling that holds when every attempt comes from a new address', async () => {
    t = await buildTestApp({ config: { trustProxy: true, attemptLimits: { perInstance: 4 } } });
    const client = await agentFor(t.app);
    const from = (n: number, email: string, password: string) =>
      client.agent
        .post('/api/auth/login')
        .set('x-csrf-token', client.token)
        .set('x-forwarded-for', `198.51.100.${n}`)
        .send({ email, password });
    for (let n = 1; n <= 4; n += 1)
      expect((await from(n, `user${n}@wellmere-water.example`, 'Winter2026!')).status).toBe(401);
    expect((await from(99, demo('auditor'), DEMO_PASSWORD)).status).toBe(429);
    expect(await lockouts(t)).toBe(1);
  });

  it('keeps the counters in the database, so a restart (or another instance) does not reset them', async () => {
    t = await buildTestApp({ config: { signInLimit: 3 } });
    const first = await agentFor(t.app);
    for (let i = 0; i < 3; i += 1)
      await first.post('/api/auth/login', { email: demo('auditor'), password: 'wrong-password' }).expect(401);
    t = await t.restart();
    const second = await agentFor(t.app);
    await second.post('/api/auth/login', { email: demo('auditor'), password: DEMO_PASSWORD }).expect(429);
    expect(await countRows(t.db('auth_attempts'))).toBeGreaterThan(0);
  });
});

describe('the approval signature', () => {
  it('locks signing after too many wrong passwords, audits it in the lab, and the account counter is shared with sign-in', async () => {
    t = await buildTestApp({ config: { signInLimit: 3 } });
    const labId = (await t.db('labs').first()).id as number;
    const analyst = await signIn(t.app, demo('analyst'));
    const qa = await signIn(t.app, demo('qa'));
    const preparationId = await plannedLeadStandard(analyst, labId);
    const v1 = (action: string) => `/api/labs/${labId}/preparations/${preparationId}/versions/1/${action}`;
    await analyst.post(v1('submit'), {}).expect(200);
    for (let i = 0; i < 3; i += 1)
      await qa.post(v1('approve'), { password: `guess-${i}`, statement: 'Reviewed against SOP-CHEM-014.' }).expect(400);
    const locked = await qa
      .post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Reviewed against SOP-CHEM-014.' })
      .expect(429);
    expect(locked.body.error.message).toMatch(/15 minutes/);
    const [event] = await t.db('audit_events').where({ action: 'auth.locked_out' });
    expect(event.lab_id).toBe(labId);
    await (await agentFor(t.app)).post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(429);
    expect((await qa.get(`/api/labs/${labId}/preparations/${preparationId}`).expect(200)).body.current.status).toBe(
      'submitted',
    );
  });

  it('does not count a correct signature', async () => {
    t = await buildTestApp({ config: { signInLimit: 1 } });
    const labId = (await t.db('labs').first()).id as number;
    const analyst = await signIn(t.app, demo('analyst'));
    const qa = await signIn(t.app, demo('qa'));
    const preparationId = await plannedLeadStandard(analyst, labId);
    await analyst.post(`/api/labs/${labId}/preparations/${preparationId}/versions/1/submit`, {}).expect(200);
    await qa
      .post(`/api/labs/${labId}/preparations/${preparationId}/versions/1/approve`, {
        password: DEMO_PASSWORD,
        statement: 'Reviewed against SOP-CHEM-014.',
      })
      .expect(200);
    await signIn(t.app, demo('qa'));
  });
});

describe('links that carry a secret', () => {
  it('limits reset-link attempts from one client address', async () => {
    t = await buildTestApp({ config: { attemptLimits: { perClient: 3 } } });
    const client = await agentFor(t.app);
    for (let i = 0; i < 3; i += 1)
      await client
        .post(`/api/auth/password-reset/made-up-token-${'x'.repeat(20)}${i}`, { password: 'a-brand-new-password' })
        .expect(400);
    const res = await client
      .post(`/api/auth/password-reset/made-up-token-${'x'.repeat(20)}9`, { password: 'a-brand-new-password' })
      .expect(429);
    expect(res.body.error.code).toBe('rate_limited');
  });

  it('limits invitation accepts from one client address', async () => {
    t = await buildTestApp({ config: { attemptLimits: { perClient: 3 } } });
    const client = await agentFor(t.app);
    for (let i = 0; i < 3; i += 1) {
      const res = await client.post(`/api/invitations/made-up-invitation-${'y'.repeat(20)}${i}/accept`, {
        name: 'Someone',
        password: 'a-long-password-1',
      });
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(429);
    }
    await client
      .post(`/api/invitations/made-up-invitation-${'y'.repeat(20)}9/accept`, {
        name: 'Someone',
        password: 'a-long-password-1',
      })
      .expect(429);
  });
});

describe('reset requests', () => {
  it('counts every spelling of one address on one counter', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    const spellings = [
      ` ${demo('analyst')}`,
      `\t${demo('analyst')}`,
      demo('analyst').toUpperCase(),
      `${demo('analyst')}\n`,
      demo('analyst'),
    ];
    for (const email of spellings) await client.post('/api/auth/password-reset', { email }).expect(202);
    await client.post('/api/auth/password-reset', { email: demo('analyst') }).expect(429);
  });

  it('answers before the mail is sent, so a known address takes no longer than an unknown one', async () => {
    // A slow mail server: the known address must not wait for it.
    const slow = (mailer: Mailer): Mailer => ({
      ...mailer,
      send: async (message) => (await new Promise((resolve) => setTimeout(resolve, 600)), mailer.send(message)),
    });
    t = await buildTestApp({ wrapMailer: slow });
    const client = await agentFor(t.app);
    const started = performance.now();
    await client.post('/api/auth/password-reset', { email: demo('analyst') }).expect(202);
    const known = performance.now() - started;
    const again = performance.now();
    await client.post('/api/auth/password-reset', { email: 'stranger@wellmere-water.example' }).expect(202);
    const unknown = performance.now() - again;
    expect(known).toBeLessThan(300);
    expect(Math.abs(known - unknown)).toBeLessThan(150);
    // The mail still goes out, after the answer.
    expect(await tokenFromOutbox(t.db, demo('analyst'), '/reset-password/')).toMatch(/^[A-Za-z0-9_-]{20,}$/);
  });
});

describe('reset links under concurrency', () => {
  it('lets exactly one of four simultaneous uses of one link set the password', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    await client.post('/api/auth/password-reset', { email: demo('analyst2') }).expect(202);
    const token = await tokenFromOutbox(t.db, demo('analyst2'), '/reset-password/');
    const passwords = ['first-new-password', 'second-new-password', 'third-new-password', 'fourth-new-password'];
    const answers = await Promise.all(
      passwords.map((password) => client.post(`/api/auth/password-reset/${token}`, { password })),
    );
    const statuses = answers.map((res) => res.status);
    expect(statuses.filter((s) => s === 204)).toHaveLength(1);
    expect(statuses.filter((s) => s === 400)).toHaveLength(3);
    const winner = passwords[statuses.indexOf(204)];
    await signIn(t.app, demo('analyst2'), winner);
    expect(await countRows(t.db('audit_events').where({ action: 'auth.password_reset' }))).toBe(1);
  });
});

describe('CSRF for signed-out visitors', () => {
  it('hands out tokens without writing a session row, and sign-in still needs the token', async () => {
    t = await buildTestApp();
    const visitors = await Promise.all([agentFor(t.app), agentFor(t.app), agentFor(t.app)]);
    await visitors[0].get('/api/auth/csrf').expect(200);
    expect(await countRows(t.db('sessions'))).toBe(0);
    await request(t.app)
      .post('/api/auth/login')
      .send({ email: demo('qa'), password: DEMO_PASSWORD })
      .expect(403);
    // A token only works with the cookie it was made for.
    const foreign = await visitors[1].agent
      .post('/api/auth/login')
      .set('x-csrf-token', visitors[2].token)
      .send({ email: demo('qa'), password: DEMO_PASSWORD });
    expect(foreign.status).toBe(403);
    const res = await visitors[0].post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(200);
    expect(await countRows(t.db('sessions'))).toBe(1);
    // After sign-in the session's own token is the one that works.
    expect(res.body.csrfToken).not.toBe(visitors[0].token);
    await visitors[0].post('/api/auth/active-lab', { labId: res.body.activeLabId }).expect(403);
    visitors[0].setToken(res.body.csrfToken);
    await visitors[0].post('/api/auth/active-lab', { labId: res.body.activeLabId }).expect(200);
  });
});
