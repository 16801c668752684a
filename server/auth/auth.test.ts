import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
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

describe('health and error shape', () => {
  it('answers health without a session', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body.status).toBe('ok');
  });

  it('answers an unknown API route with the JSON error shape, not HTML', async () => {
    const res = await request(t.app).get('/api/no-such-thing').expect(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error.code).toBe('not_found');
  });

  it('refuses malformed JSON with a readable message and no stack', async () => {
    const client = await agentFor(t.app);
    const res = await client.agent
      .post('/api/auth/login')
      .set('x-csrf-token', client.token)
      .set('content-type', 'application/json')
      .send('{"email": ')
      .expect(400);
    expect(res.body.error.code).toBe('malformed_json');
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });
});

describe('sign-in', () => {
  it('signs in with the demo password and reports labs and roles', async () => {
    const client = await signIn(t.app, demo('qa'));
    const me = (await client.get('/api/auth/me').expect(200)).body;
    expect(me.user.email).toBe('qa@wellmere-water.example');
    expect(me.labs).toEqual([{ id: expect.any(Number), name: 'Wellmere Regional Water Laboratory', roles: ['qa'] }]);
    expect(me.activeLabId).toBe(me.labs[0].id);
  });

  it('gives the same answer for a wrong password and an unknown e-mail, and audits both', async () => {
    const client = await agentFor(t.app);
    const wrong = await client.post('/api/auth/login', { email: demo('qa'), password: 'not-the-password' }).expect(401);
    const unknown = await client
      .post('/api/auth/login', { email: 'nobody@wellmere-water.example', password: 'not-the-password' })
      .expect(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    const failures = await t.db('audit_events').where({ action: 'auth.sign_in_failed' });
    expect(failures).toHaveLength(2);
  });

  it('names the field when the e-mail is not an address', async () => {
    const client = await agentFor(t.app);
    const res = await client.post('/api/auth/login', { email: 'qa', password: 'x' }).expect(400);
    expect(res.body.error.details[0].path).toBe('email');
  });

  it('refuses a state-changing request without the CSRF token', async () => {
    const res = await request(t.app)
      .post('/api/auth/login')
      .send({ email: demo('qa'), password: DEMO_PASSWORD })
      .expect(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('issues a new session id at sign-in (no session fixation)', async () => {
    // Signed-out visitors have no session; the session a browser already holds is the one to replace.
    const client = await signIn(t.app, demo('auditor'));
    const before = (await t.db('sessions').select('sid')).map((r: { sid: string }) => r.sid);
    expect(before).toHaveLength(1);
    const res = await client.post('/api/auth/login', { email: demo('analyst'), password: DEMO_PASSWORD }).expect(200);
    const after = (await t.db('sessions').select('sid')).map((r: { sid: string }) => r.sid);
    expect(after).not.toContain(before[0]);
    expect(res.headers['set-cookie']?.[0]).toMatch(/HttpOnly/);
    expect(res.headers['set-cookie']?.[0]).toMatch(/SameSite=Lax/);
  });

  it('keeps the session across a restart of the app on the same database file', async () => {
    const client = await signIn(t.app, demo('auditor'));
    const restarted = await t.restart();
    t = restarted;
    const cookieHeader = (
      await client.agent.jar.getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false })
    )
      .map((c) => `${c.name}=${c.value}`)
      .join('; ');
    expect(cookieHeader).toMatch(/^dilutrace\.sid=/);
    const res = await request(t.app).get('/api/auth/me').set('cookie', cookieHeader).expect(200);
    expect(res.body.user.email).toBe(demo('auditor'));
  });

  it('signs out and forgets the session', async () => {
    const client = await signIn(t.app, demo('analyst'));
    await client.post('/api/auth/logout').expect(204);
    await client.get('/api/auth/me').expect(401);
  });
});

describe('password reset by e-mail link', () => {
  it('sends a link through the captured mail, sets the new password once, and ends old sessions', async () => {
    const old = await signIn(t.app, demo('analyst2'));
    const client = await agentFor(t.app);
    const res = await client.post('/api/auth/password-reset', { email: demo('analyst2') }).expect(202);
    const unknown = await client.post('/api/auth/password-reset', { email: 'stranger@example.org' }).expect(202);
    expect(unknown.body).toEqual(res.body);

    const token = await tokenFromOutbox(t.db, demo('analyst2'), '/reset-password/');
    await client.post(`/api/auth/password-reset/${token}`, { password: 'short' }).expect(400);
    await client.post(`/api/auth/password-reset/${token}`, { password: 'a-brand-new-password' }).expect(204);
    await client.post(`/api/auth/password-reset/${token}`, { password: 'another-new-password' }).expect(400);

    await old.get('/api/auth/me').expect(401);
    await signIn(t.app, demo('analyst2'), 'a-brand-new-password');
    const again = await agentFor(t.app);
    await again.post('/api/auth/login', { email: demo('analyst2'), password: DEMO_PASSWORD }).expect(401);
  });

  it('refuses a reset link after one hour', async () => {
    const client = await agentFor(t.app);
    await client.post('/api/auth/password-reset', { email: demo('qa') }).expect(202);
    const token = await tokenFromOutbox(t.db, demo('qa'), '/reset-password/');
    t.clock.advance(61 * 60 * 1000);
    const res = await client
      .post(`/api/auth/password-reset/${token}`, { password: 'a-brand-new-password' })
      .expect(400);
    expect(res.body.error.message).toMatch(/expired/);
  });
});
