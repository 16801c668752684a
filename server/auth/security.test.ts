import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { createApp } from '../app';
import { openDatabase } from '../db/connection';
import type { Mailer } from '../mail/mailer';
import { agentFor, buildTestApp, demo, DEMO_PASSWORD, testClock, type TestApp } from '../test-support/test-app';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

describe('web security', () => {
  it('locks sign-in after 10 attempts in 15 minutes with a message that does not reveal whether the account exists', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    for (let i = 0; i < 10; i += 1) await client.post('/api/auth/login', { email: demo('qa'), password: 'wrong-password' }).expect(401);
    const locked = await client.post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(429);
    expect(locked.body.error.message).toMatch(/Too many sign-in attempts/);
    for (let i = 0; i < 10; i += 1) await client.post('/api/auth/login', { email: 'nobody@wellmere-water.example', password: 'wrong-password' }).expect(401);
    const unknown = await client.post('/api/auth/login', { email: 'nobody@wellmere-water.example', password: 'x' }).expect(429);
    expect(unknown.body).toEqual(locked.body);
  });

  it('limits password-reset requests the same way', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    for (let i = 0; i < 5; i += 1) await client.post('/api/auth/password-reset', { email: demo('analyst') }).expect(202);
    const res = await client.post('/api/auth/password-reset', { email: demo('analyst') }).expect(429);
    expect(res.body.error.code).toBe('rate_limited');
  });

  it('sends a strict Content-Security-Policy and no X-Powered-By', async () => {
    t = await buildTestApp();
    const res = await request(t.app).get('/api/health').expect(200);
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(csp).not.toMatch(/unsafe-eval|unsafe-inline/);
    expect(res.headers['x-powered-by']).toBeUndefined();
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });

  it('marks the session cookie Secure behind a TLS proxy in production', async () => {
    const db = await openDatabase(join(mkdtempSync(join(tmpdir(), 'dilutrace-proxy-')), 'db.sqlite'));
    const mailer: Mailer = { send: async () => undefined, close: () => undefined };
    const { app, close } = createApp({
      db,
      mailer,
      clock: testClock(),
      config: { sessionSecret: 'x'.repeat(40), publicUrl: 'https://lab.example', production: true, trustProxy: true, certificateDir: '/tmp', log: () => undefined },
    });
    const res = await request(app).get('/api/auth/csrf').set('X-Forwarded-Proto', 'https').expect(200);
    expect(res.headers['set-cookie']?.[0]).toMatch(/; Secure/);
    expect(res.headers['set-cookie']?.[0]).toMatch(/HttpOnly/);
    await close();
    await db.destroy();
  });
});
