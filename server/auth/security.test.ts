import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { AddressInfo } from 'node:net';
import { connect } from 'node:net';
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
    for (let i = 0; i < 10; i += 1)
      await client.post('/api/auth/login', { email: demo('qa'), password: 'wrong-password' }).expect(401);
    const locked = await client.post('/api/auth/login', { email: demo('qa'), password: DEMO_PASSWORD }).expect(429);
    expect(locked.body.error.message).toMatch(/Too many sign-in attempts/);
    for (let i = 0; i < 10; i += 1)
      await client
        .post('/api/auth/login', { email: 'nobody@wellmere-water.example', password: 'wrong-password' })
        .expect(401);
    const unknown = await client
      .post('/api/auth/login', { email: 'nobody@wellmere-water.example', password: 'x' })
      .expect(429);
    expect(unknown.body).toEqual(locked.body);
  });

  it('limits password-reset requests the same way', async () => {
    t = await buildTestApp();
    const client = await agentFor(t.app);
    for (let i = 0; i < 5; i += 1)
      await client.post('/api/auth/password-reset', { email: demo('analyst') }).expect(202);
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
      config: {
        sessionSecret: 'x'.repeat(40),
        publicUrl: 'https://lab.example',
        production: true,
        trustProxy: true,
        certificateDir: '/tmp',
        log: () => undefined,
      },
    });
    const res = await request(app).get('/api/auth/csrf').set('X-Forwarded-Proto', 'https').expect(200);
    expect(res.headers['set-cookie']?.[0]).toMatch(/; Secure/);
    expect(res.headers['set-cookie']?.[0]).toMatch(/HttpOnly/);
    await close();
    await db.destroy();
  });
});

describe('CSRF token comparison', () => {
  it('refuses, without a 5xx, a token of the right length in characters but not in bytes', async () => {
    t = await buildTestApp();
    const visit = await request(t.app).get('/api/auth/csrf').expect(200);
    const token = visit.body.csrfToken as string;
    const cookie = String(visit.headers['set-cookie']).split(';')[0];
    // One raw byte 0xE9 in the header: the server reads it as one character, two bytes in UTF-8.
    const server = t.app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as AddressInfo;
    const body = JSON.stringify({ email: demo('qa'), password: DEMO_PASSWORD });
    const head = [
      'POST /api/auth/login HTTP/1.1',
      `Host: 127.0.0.1:${port}`,
      `Cookie: ${cookie}`,
      `X-CSRF-Token: \u00e9${token.slice(1)}`,
      'Content-Type: application/json',
      `Content-Length: ${Buffer.byteLength(body)}`,
      'Connection: close',
      '',
      body,
    ].join('\r\n');
    const answer = await new Promise<string>((resolve, reject) => {
      const socket = connect(port, '127.0.0.1', () => socket.end(Buffer.from(head, 'latin1')));
      let received = '';
      socket.on('data', (chunk) => (received += chunk.toString('latin1')));
      socket.on('end', () => resolve(received));
      socket.on('error', reject);
    });
    await new Promise((resolve) => server.close(resolve));
    expect(answer.split('\r\n')[0]).toBe('HTTP/1.1 403 Forbidden');
  });
});
