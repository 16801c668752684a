import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { hashPassword } from '../auth/password';
import { insertedId } from '../db/inserted-id';
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

/**
 * Two labs on one instance: the demo lab (A, Wellmere) and Harrowgate (B) with its own admin.
 * Lab B's admin tries, through the public API, what the issue found: reading another lab's
 * member's reset link, guessing a password through an invitation, switching an account off
 * everywhere, and racing one invitation.
 */
let t: TestApp;
let labA: number;
let labB: number;
const ADMIN_B = 'admin@harrowgate.example';

beforeEach(async () => {
  t = await buildTestApp();
  labA = (await t.db('labs').where({ slug: 'wellmere-water' }).first()).id;
  const at = t.clock.now().toISOString();
  labB = insertedId(
    (
      await t.db('labs').insert({ name: 'Harrowgate Food Testing', slug: 'harrowgate', created_at: at }).returning('id')
    )[0],
  );
  const adminB = insertedId(
    (
      await t
        .db('users')
        .insert({
          email: ADMIN_B,
          name: 'Ode Marlow',
          password_hash: await hashPassword(DEMO_PASSWORD),
          active: true,
          created_at: at,
        })
        .returning('id')
    )[0],
  );
  await t.db('memberships').insert({ user_id: adminB, lab_id: labB, role: 'admin', created_at: at });
});
afterEach(async () => {
  await t.close();
});

const userId = async (email: string): Promise<number> => (await t.db('users').where({ email }).first()).id;

/** Lab B's admin invites a lab A person into lab B, and she accepts signed in as herself. */
async function joinLabB(email: string, role: 'qa' | 'auditor' | 'admin') {
  const adminB = await signIn(t.app, ADMIN_B);
  await adminB.post(`/api/labs/${labB}/invitations`, { email, name: 'Guest', role }).expect(201);
  const token = await tokenFromOutbox(t.db, email, '/invitation/');
  const guest = await signIn(t.app, email);
  await guest.post(`/api/invitations/${token}/accept`, {}).expect(200);
  return adminB;
}

/** The same guest membership written directly, so a finding reproduces whatever the accept route does. */
async function guestInLabB(email: string, role: 'qa' | 'auditor' | 'admin') {
  await t
    .db('memberships')
    .insert({ user_id: await userId(email), lab_id: labB, role, created_at: t.clock.now().toISOString() });
  return signIn(t.app, ADMIN_B);
}

describe('reset links stay with their recipient', () => {
  it("files a reset mail by recipient, so lab B's admin never reads lab A's QA reset link", async () => {
    // Lab B (Harrowgate) sorts before lab A (Wellmere): it became her "first lab".
    const adminB = await guestInLabB(demo('qa'), 'auditor');
    await (await agentFor(t.app)).post('/api/auth/password-reset', { email: demo('qa') }).expect(202);
    const token = await tokenFromOutbox(t.db, demo('qa'), '/reset-password/');

    const reset = await t.db('outbox').where('text_body', 'like', '%/reset-password/%').first();
    expect(reset.lab_id).toBeNull();
    for (const path of ['outbox', 'delivery-log']) {
      const res = await adminB.get(`/api/labs/${labB}/${path}`);
      expect(JSON.stringify(res.body)).not.toContain(token);
      expect(JSON.stringify(res.body)).not.toContain('/reset-password/');
    }
    // Nor does lab A's own admin (who is not the instance operator here) read it.
    await t
      .db('users')
      .where({ email: demo('admin') })
      .update({ operator: false });
    const adminA = await signIn(t.app, demo('admin'));
    expect(JSON.stringify((await adminA.get(`/api/labs/${labA}/delivery-log`).expect(200)).body)).not.toContain(token);
    await adminA.get('/api/operator/mail').expect(403);
  });

  it('shows a lab admin a delivery log of their own lab: to, subject and time, no bodies or links', async () => {
    const adminA = await signIn(t.app, demo('admin'));
    await adminA
      .post(`/api/labs/${labA}/invitations`, {
        email: 'new.person@wellmere-water.example',
        name: 'New Person',
        role: 'analyst',
      })
      .expect(201);
    const adminB = await signIn(t.app, ADMIN_B);
    await adminB
      .post(`/api/labs/${labB}/invitations`, {
        email: 'b.person@harrowgate.example',
        name: 'B Person',
        role: 'analyst',
      })
      .expect(201);

    const log = (await adminA.get(`/api/labs/${labA}/delivery-log`).expect(200)).body as Record<string, unknown>[];
    expect(log).toHaveLength(1);
    expect(Object.keys(log[0]).sort()).toEqual(['createdAt', 'id', 'subject', 'to']);
    expect(log[0].to).toContain('new.person@wellmere-water.example');
    expect(JSON.stringify(log)).not.toContain('/invitation/');
  });
});

describe('invitations for an existing account', () => {
  it('asks no password through the link: the person accepts signed in as themselves', async () => {
    const adminB = await signIn(t.app, ADMIN_B);
    await adminB
      .post(`/api/labs/${labB}/invitations`, { email: demo('qa'), name: 'Imogen Tasker', role: 'qa' })
      .expect(201);
    const token = await tokenFromOutbox(t.db, demo('qa'), '/invitation/');

    const visitor = await agentFor(t.app);
    expect((await visitor.get(`/api/invitations/${token}`).expect(200)).body.existingAccount).toBe(true);
    // The right password and a wrong one get the same answer: the link checks no password.
    const wrong = await visitor.post(`/api/invitations/${token}/accept`, { password: 'wrong-password-123' });
    const right = await visitor.post(`/api/invitations/${token}/accept`, { password: DEMO_PASSWORD });
    expect([wrong.status, right.status]).toEqual([401, 401]);
    expect(right.body).toEqual(wrong.body);
    expect(right.body.error.message).toMatch(/Sign in as qa@wellmere-water\.example/);

    const someoneElse = await signIn(t.app, demo('analyst'));
    const refused = await someoneElse.post(`/api/invitations/${token}/accept`, {}).expect(403);
    expect(refused.body.error.message).toMatch(/qa@wellmere-water\.example/);
    expect(await t.db('memberships').where({ lab_id: labB, user_id: await userId(demo('qa')) })).toHaveLength(0);

    const invitee = await signIn(t.app, 'QA@Wellmere-Water.example');
    const me = (await invitee.post(`/api/invitations/${token}/accept`, {}).expect(200)).body;
    expect(me.activeLabId).toBe(labB);
    expect(me.labs.map((l: { name: string }) => l.name).sort()).toEqual([
      'Harrowgate Food Testing',
      'Wellmere Regional Water Laboratory',
    ]);
    await invitee.post(`/api/invitations/${token}/accept`, {}).expect(404);
    // The mail tells her to sign in, not to set a password.
    const mail = await t.db('outbox').where('text_body', 'like', '%/invitation/%').first();
    expect(mail.text_body).toMatch(/sign in as usual to accept/);
    expect(mail.text_body).not.toMatch(/set your password/);
  });

  it('answers 409 to all but one of four concurrent accepts of one invitation', async () => {
    const adminA = await signIn(t.app, demo('admin'));
    await adminA
      .post(`/api/labs/${labA}/invitations`, {
        email: 'rush@wellmere-water.example',
        name: 'Rush Hour',
        role: 'analyst',
      })
      .expect(201);
    const token = await tokenFromOutbox(t.db, 'rush@wellmere-water.example', '/invitation/');
    const visitors = await Promise.all([1, 2, 3, 4].map(() => agentFor(t.app)));
    const answers = await Promise.all(
      visitors.map((v) =>
        v.post(`/api/invitations/${token}/accept`, { name: 'Rush Hour', password: 'bench-ready-2026' }),
      ),
    );
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409, 409, 409]);
    expect(await countRows(t.db('users').where({ email: 'rush@wellmere-water.example' }))).toBe(1);
  });

  it('answers 409, not 5xx, when invitations from two labs to one new e-mail are accepted at once', async () => {
    const email = 'both.labs@example.org';
    await (
      await signIn(t.app, demo('admin'))
    )
      .post(`/api/labs/${labA}/invitations`, { email, name: 'Both Labs', role: 'analyst' })
      .expect(201);
    const tokenA = await tokenFromOutbox(t.db, email, '/invitation/');
    await (
      await signIn(t.app, ADMIN_B)
    )
      .post(`/api/labs/${labB}/invitations`, { email, name: 'Both Labs', role: 'qa' })
      .expect(201);
    const tokenB = await tokenFromOutbox(t.db, email, '/invitation/');
    expect(tokenB).not.toBe(tokenA);
    const [first, second] = await Promise.all([agentFor(t.app), agentFor(t.app)]);
    const answers = await Promise.all([
      first.post(`/api/invitations/${tokenA}/accept`, { name: 'Both Labs', password: 'bench-ready-2026' }),
      second.post(`/api/invitations/${tokenB}/accept`, { name: 'Both Labs', password: 'bench-ready-2026' }),
    ]);
    expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
    expect(answers.find((a) => a.status === 409)?.body.error.message).toMatch(/Sign in as both\.labs@example\.org/);
    expect(await countRows(t.db('users').where({ email }))).toBe(1);
    // The losing invitation is still open: the new account signs in and accepts it.
    const loser = answers[0].status === 409 ? tokenA : tokenB;
    const person = await signIn(t.app, email, 'bench-ready-2026');
    await person.post(`/api/invitations/${loser}/accept`, {}).expect(200);
  });

  it('lets the lab admin revoke a pending invitation, after which the link is dead', async () => {
    const adminA = await signIn(t.app, demo('admin'));
    const invitation = (
      await adminA
        .post(`/api/labs/${labA}/invitations`, {
          email: 'later@wellmere-water.example',
          name: 'Later',
          role: 'analyst',
        })
        .expect(201)
    ).body;
    const token = await tokenFromOutbox(t.db, 'later@wellmere-water.example', '/invitation/');
    const adminB = await signIn(t.app, ADMIN_B);
    await adminB.post(`/api/labs/${labB}/invitations/${invitation.id}/revoke`).expect(404);
    const revoked = (await adminA.post(`/api/labs/${labA}/invitations/${invitation.id}/revoke`).expect(200)).body;
    expect(revoked.revokedAt).not.toBeNull();
    await adminA.post(`/api/labs/${labA}/invitations/${invitation.id}/revoke`).expect(409);
    await (await agentFor(t.app)).get(`/api/invitations/${token}`).expect(404);
    await (
      await agentFor(t.app)
    )
      .post(`/api/invitations/${token}/accept`, { name: 'Later', password: 'bench-ready-2026' })
      .expect(404);
    expect(await t.db('audit_events').where({ action: 'member.invitation_revoked', lab_id: labA })).toHaveLength(1);
  });
});

describe('a lab admin manages memberships of their own lab only', () => {
  it("cannot switch off lab A's only admin from lab B, and lab A keeps an active admin", async () => {
    const adminB = await guestInLabB(demo('admin'), 'auditor');
    const guestId = await userId(demo('admin'));
    const res = await adminB.patch(`/api/labs/${labB}/members/${guestId}`, { active: false });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/changes roles only/);
    expect(Boolean((await t.db('users').where({ id: guestId }).first()).active)).toBe(true);
    await signIn(t.app, demo('admin'));
  });

  it('removes a member from the lab: their other labs, account and records stay, their session loses the lab', async () => {
    const adminB = await joinLabB(demo('admin'), 'auditor');
    const guestId = await userId(demo('admin'));
    const guest = await signIn(t.app, demo('admin'));
    await guest.post('/api/auth/active-lab', { labId: labB }).expect(200);
    await guest.get(`/api/labs/${labB}/approved-records`).expect(200);

    await adminB.delete(`/api/labs/${labB}/members/${guestId}`).expect(204);
    await guest.get(`/api/labs/${labB}/approved-records`).expect(404);
    const me = (await guest.get('/api/auth/me').expect(200)).body;
    expect(me.labs.map((l: { id: number }) => l.id)).toEqual([labA]);
    expect(me.activeLabId).toBe(labA);
    expect(Boolean((await t.db('users').where({ id: guestId }).first()).active)).toBe(true);
    expect(await t.db('memberships').where({ user_id: guestId, lab_id: labA, role: 'admin' })).toHaveLength(1);
    const event = await t.db('audit_events').where({ action: 'member.removed' }).first();
    expect(event.lab_id).toBe(labB);

    await adminB.delete(`/api/labs/${labB}/members/${guestId}`).expect(404);
    const adminA = await signIn(t.app, demo('admin'));
    await adminA.delete(`/api/labs/${labA}/members/${await userId(ADMIN_B)}`).expect(404);
  });

  it('keeps the last admin per lab: removing or demoting the only admin of a lab is refused', async () => {
    const adminB = await signIn(t.app, ADMIN_B);
    const self = await userId(ADMIN_B);
    expect((await adminB.delete(`/api/labs/${labB}/members/${self}`).expect(409)).body.error.code).toBe('last_admin');
    expect(
      (await adminB.patch(`/api/labs/${labB}/members/${self}`, { roles: ['qa'] }).expect(409)).body.error.code,
    ).toBe('last_admin');
    // An admin of lab A who is also admin of lab B does not count for lab B once removed from it.
    await joinLabB(demo('admin'), 'admin');
    await adminB.delete(`/api/labs/${labB}/members/${await userId(demo('admin'))}`).expect(204);
    await adminB.patch(`/api/labs/${labB}/members/${self}`, { roles: ['qa'] }).expect(409);
  });
});

describe('failed sign-ins are filed with every lab of the account', () => {
  it('shows lab A a failed sign-in of its QA even when she is also a guest of lab B', async () => {
    await guestInLabB(demo('qa'), 'auditor');
    await (
      await agentFor(t.app)
    )
      .post('/api/auth/login', { email: demo('qa'), password: 'not-her-password-1' })
      .expect(401);
    const failures = await t
      .db('audit_events')
      .where({ action: 'auth.sign_in_failed', entity_id: String(await userId(demo('qa'))) });
    expect(failures.map((row) => row.lab_id).sort()).toEqual([labA, labB].sort());
  });
});
