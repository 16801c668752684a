import bcrypt from 'bcryptjs';
import { afterEach, describe, expect, it } from 'vitest';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type TestApp } from '../test-support/test-app';
import { hashPassword, needsRehash, verifyPassword } from './password';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

describe('password hashing', () => {
  it('hashes with scrypt, its parameters in the stored string, and a fresh salt each time', async () => {
    const first = await hashPassword('a-long-enough-password');
    const second = await hashPassword('a-long-enough-password');
    expect(first).toMatch(/^\$scrypt\$ln=15,r=8,p=1\$[A-Za-z0-9+/]{22}\$[A-Za-z0-9+/]{43}$/);
    expect(second).not.toBe(first);
    expect(await verifyPassword('a-long-enough-password', first)).toBe(true);
    expect(await verifyPassword('a-long-enough-passwore', first)).toBe(false);
    expect(needsRehash(first)).toBe(false);
  });

  it('still verifies a bcrypt hash, and marks it for an upgrade', async () => {
    const old = bcrypt.hashSync('an-old-password-1', 4);
    expect(await verifyPassword('an-old-password-1', old)).toBe(true);
    expect(await verifyPassword('not-the-password', old)).toBe(false);
    expect(needsRehash(old)).toBe(true);
  });

  it('refuses a stored string it cannot read instead of throwing', async () => {
    expect(await verifyPassword('x', '$scrypt$ln=99,r=8,p=1$AAAA$BBBB')).toBe(false);
    expect(await verifyPassword('x', 'not a hash')).toBe(false);
  });

  it('keeps the event loop free while it hashes', async () => {
    let ticks = 0;
    const timer = setInterval(() => (ticks += 1), 5);
    await Promise.all(Array.from({ length: 4 }, () => hashPassword('a-long-enough-password')));
    clearInterval(timer);
    // Hashing on the main thread would starve the 5 ms timer; in the thread pool it keeps firing.
    expect(ticks).toBeGreaterThan(3);
  });
});

describe('upgrade of old hashes at sign-in', () => {
  it('signs in a user whose stored hash is bcrypt and stores a scrypt hash afterwards', async () => {
    t = await buildTestApp();
    await t
      .db('users')
      .where({ email: demo('qa') })
      .update({ password_hash: bcrypt.hashSync(DEMO_PASSWORD, 4) });
    const client = await signIn(t.app, demo('qa'));
    const row = await t
      .db('users')
      .where({ email: demo('qa') })
      .first();
    expect(row.password_hash).toMatch(/^\$scrypt\$/);
    expect(await verifyPassword(DEMO_PASSWORD, row.password_hash)).toBe(true);
    await client.post('/api/auth/logout').expect(204);
    await signIn(t.app, demo('qa'));
  });

  it('leaves a bcrypt hash alone after a wrong password', async () => {
    t = await buildTestApp();
    const old = bcrypt.hashSync(DEMO_PASSWORD, 4);
    await t
      .db('users')
      .where({ email: demo('qa') })
      .update({ password_hash: old });
    const { agentFor } = await import('../test-support/test-app');
    const client = await agentFor(t.app);
    await client.post('/api/auth/login', { email: demo('qa'), password: 'not-the-password' }).expect(401);
    expect(
      (
        await t
          .db('users')
          .where({ email: demo('qa') })
          .first()
      ).password_hash,
    ).toBe(old);
  });

  it('seeds the demo people with scrypt hashes', async () => {
    t = await buildTestApp();
    const hashes: { password_hash: string }[] = await t.db('users').select('password_hash');
    expect(hashes.length).toBeGreaterThan(0);
    for (const row of hashes) expect(row.password_hash).toMatch(/^\$scrypt\$/);
  });
});
