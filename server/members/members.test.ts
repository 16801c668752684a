import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import request from 'supertest';
import { hashPassword } from '../auth/password';
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
let labId: number;
let otherLabId: number;

/** A second, unrelated lab with its own admin, to check that labs never see each other. */
async function addOtherLab(db: TestApp['db']): Promise<number> {
  const at = new Date().toISOString();
  const [lab] = await db('labs')
    .insert({ name: 'Harrowgate Food Testing', slug: 'harrowgate', created_at: at })
    .returning('id');
  const id = typeof lab === 'object' ? lab.id : lab;
  const [user] = await db('users')
    .insert({
      email: 'admin@harrowgate.example',
      name: 'Ode Marlow',
      password_hash: await hashPassword(DEMO_PASSWORD),
      active: true,
      created_at: at,
    })
    .returning('id');
  await db('memberships').insert({
    user_id: typeof user === 'object' ? user.id : user,
    lab_id: id,
    role: 'admin',
    created_at: at,
  });
  await db('outbox').insert({
    lab_id: id,
    from_address: 'x',
    to_address: 'y@harrowgate.example',
    subject: 'Harrowgate only',
    text_body: 'secret',
    created_at: at,
  });
  return id;
}

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  otherLabId = await addOtherLab(t.db);
});
afterEach(async () => {
  await t.close();
});

describe('role boundaries on the member routes', () => {
  const adminRoutes = (lab: () => number) =>
    [
      ['get', () => `/api/labs/${lab()}/members`],
      ['get', () => `/api/labs/${lab()}/invitations`],
      ['get', () => `/api/labs/${lab()}/delivery-log`],
      ['post', () => `/api/labs/${lab()}/invitations`],
    ] as const;

  it('lets the admin in and keeps qa, analyst and auditor out (403)', async () => {
    const admin = await signIn(t.app, demo('admin'));
    for (const [method, url] of adminRoutes(() => labId)) {
      const res =
        method === 'get'
          ? await admin.get(url())
          : await admin.post(url(), {
              email: 'new.person@wellmere-water.example',
              name: 'New Person',
              role: 'analyst',
            });
      expect([200, 201], `${method} ${url()}`).toContain(res.status);
    }
    for (const who of ['qa', 'analyst', 'analyst2', 'auditor'] as const) {
      const client = await signIn(t.app, demo(who));
      for (const [method, url] of adminRoutes(() => labId)) {
        const res =
          method === 'get'
            ? await client.get(url())
            : await client.post(url(), { email: 'x@y.example', name: 'X', role: 'analyst' });
        expect(res.status, `${who} ${method} ${url()}`).toBe(403);
        expect(res.body.error.code).toBe('forbidden');
      }
    }
  });

  it('answers 401 when signed out', async () => {
    const anonymous = await agentFor(t.app);
    for (const [method, url] of adminRoutes(() => labId)) {
      const res = method === 'get' ? await anonymous.get(url()) : await anonymous.post(url(), {});
      expect(res.status, `${method} ${url()}`).toBe(401);
    }
  });

  it("never shows one lab's members, invitations or mail to another lab's admin (404)", async () => {
    const admin = await signIn(t.app, demo('admin'));
    for (const [method, url] of adminRoutes(() => otherLabId)) {
      const res =
        method === 'get'
          ? await admin.get(url())
          : await admin.post(url(), { email: 'x@y.example', name: 'X', role: 'analyst' });
      expect(res.status, `${method} ${url()}`).toBe(404);
    }
    const log = (await admin.get(`/api/labs/${labId}/delivery-log`).expect(200)).body as { subject: string }[];
    expect(log.map((m) => m.subject)).not.toContain('Harrowgate only');
    const otherAdmin = await signIn(t.app, 'admin@harrowgate.example');
    const members = (await otherAdmin.get(`/api/labs/${otherLabId}/members`).expect(200)).body as { email: string }[];
    expect(members.map((m) => m.email)).toEqual(['admin@harrowgate.example']);
    await otherAdmin.get(`/api/labs/${labId}/members`).expect(404);
  });

  it('refuses switching to a lab the user is not in', async () => {
    const admin = await signIn(t.app, demo('admin'));
    await admin.post('/api/auth/active-lab', { labId: otherLabId }).expect(403);
    const res = await admin.post('/api/auth/active-lab', { labId }).expect(200);
    expect(res.body.activeLabId).toBe(labId);
  });
});

describe('invitations through the captured mail', () => {
  it('invites a new analyst who sets a password and joins with that role', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const invited = await admin
      .post(`/api/labs/${labId}/invitations`, {
        email: 'Priya.Nandakumar@Wellmere-Water.example',
        name: 'Priya Nandakumar',
        role: 'analyst',
      })
      .expect(201);
    expect(invited.body.email).toBe('priya.nandakumar@wellmere-water.example');

    const log = (await admin.get(`/api/labs/${labId}/delivery-log`).expect(200)).body as {
      subject: string;
      to: string;
    }[];
    expect(log[0].subject).toMatch(/invited to Wellmere Regional Water Laboratory/);
    expect(log[0].to).toContain('priya.nandakumar@wellmere-water.example');
    // The demo admin is also the instance operator, who reads the captured body.
    const mail = (await admin.get('/api/operator/mail').expect(200)).body as { html: string }[];
    expect(mail[0].html).toMatch(/<a href="http:\/\/dilutrace\.test\/invitation\//);

    const token = await tokenFromOutbox(t.db, 'priya.nandakumar@wellmere-water.example', '/invitation/');
    const visitor = await agentFor(t.app);
    const preview = (await visitor.get(`/api/invitations/${token}`).expect(200)).body;
    expect(preview).toMatchObject({
      labName: 'Wellmere Regional Water Laboratory',
      role: 'analyst',
      existingAccount: false,
    });

    const short = await visitor
      .post(`/api/invitations/${token}/accept`, { name: 'Priya Nandakumar', password: 'short' })
      .expect(400);
    expect(short.body.error.details[0].path).toBe('password');
    const nameless = await visitor
      .post(`/api/invitations/${token}/accept`, { password: 'bench-ready-2026' })
      .expect(400);
    expect(nameless.body.error.details[0].path).toBe('name');
    const me = (
      await visitor
        .post(`/api/invitations/${token}/accept`, { name: 'Priya Nandakumar', password: 'bench-ready-2026' })
        .expect(200)
    ).body;
    expect(me.user.email).toBe('priya.nandakumar@wellmere-water.example');
    expect(me.labs[0].roles).toEqual(['analyst']);
    visitor.setToken(me.csrfToken);
    await visitor.get('/api/auth/me').expect(200);

    await (
      await agentFor(t.app)
    )
      .post(`/api/invitations/${token}/accept`, { name: 'Again', password: 'bench-ready-2026' })
      .expect(404);
    await signIn(t.app, 'priya.nandakumar@wellmere-water.example', 'bench-ready-2026');
    const list = (await admin.get(`/api/labs/${labId}/invitations`).expect(200)).body;
    expect(list[0].acceptedAt).not.toBeNull();
    expect(await t.db('audit_events').where({ action: 'member.joined' })).toHaveLength(1);
  });

  it('lets a person with an account in another lab join, signed in as themselves', async () => {
    const admin = await signIn(t.app, demo('admin'));
    await admin
      .post(`/api/labs/${labId}/invitations`, {
        email: 'admin@harrowgate.example',
        name: 'Ode Marlow',
        role: 'auditor',
      })
      .expect(201);
    const token = await tokenFromOutbox(t.db, 'admin@harrowgate.example', '/invitation/');
    const visitor = await agentFor(t.app);
    expect((await visitor.get(`/api/invitations/${token}`)).body.existingAccount).toBe(true);
    await visitor.post(`/api/invitations/${token}/accept`, { password: DEMO_PASSWORD }).expect(401);
    const invitee = await signIn(t.app, 'admin@harrowgate.example');
    const me = (await invitee.post(`/api/invitations/${token}/accept`, {}).expect(200)).body;
    expect(me.labs.map((l: { name: string }) => l.name).sort()).toEqual([
      'Harrowgate Food Testing',
      'Wellmere Regional Water Laboratory',
    ]);
    expect(me.activeLabId).toBe(labId);
  });

  it('refuses to invite someone who is already a member', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const res = await admin
      .post(`/api/labs/${labId}/invitations`, { email: demo('qa'), name: 'Imogen Tasker', role: 'qa' })
      .expect(409);
    expect(res.body.error.code).toBe('already_member');
  });

  it('expires an invitation after seven days', async () => {
    const admin = await signIn(t.app, demo('admin'));
    await admin
      .post(`/api/labs/${labId}/invitations`, {
        email: 'late@wellmere-water.example',
        name: 'Late Comer',
        role: 'analyst',
      })
      .expect(201);
    const token = await tokenFromOutbox(t.db, 'late@wellmere-water.example', '/invitation/');
    t.clock.advance(8 * 24 * 60 * 60 * 1000);
    await request(t.app).get(`/api/invitations/${token}`).expect(404);
  });
});

describe('roles and removal', () => {
  it('changes roles, removes a member from the lab (who then has no lab) and keeps their account and records', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const members = (await admin.get(`/api/labs/${labId}/members`).expect(200)).body as {
      userId: number;
      email: string;
    }[];
    const analyst2 = members.find((m) => m.email === demo('analyst2'))!;
    const session = await signIn(t.app, demo('analyst2'));

    const changed = await admin
      .patch(`/api/labs/${labId}/members/${analyst2.userId}`, { roles: ['analyst', 'qa'] })
      .expect(200);
    expect(changed.body.roles.sort()).toEqual(['analyst', 'qa']);
    await admin.delete(`/api/labs/${labId}/members/${analyst2.userId}`).expect(204);

    await session.get(`/api/labs/${labId}/preparations`).expect(404);
    expect((await session.get('/api/auth/me').expect(200)).body).toMatchObject({ labs: [], activeLabId: null });
    expect(
      Boolean(
        (
          await t
            .db('users')
            .where({ email: demo('analyst2') })
            .first()
        ).active,
      ),
    ).toBe(true);
    expect(
      (await admin.get(`/api/labs/${labId}/members`).expect(200)).body.map((m: { email: string }) => m.email),
    ).not.toContain(demo('analyst2'));
    expect(await t.db('audit_events').where({ action: 'member.removed', lab_id: labId })).toHaveLength(1);
  });

  it('keeps at least one active admin', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const me = (await admin.get('/api/auth/me')).body;
    const res = await admin.patch(`/api/labs/${labId}/members/${me.user.id}`, { roles: ['analyst'] }).expect(409);
    expect(res.body.error.code).toBe('last_admin');
    const roles = await t.db('memberships').where({ user_id: me.user.id, lab_id: labId });
    expect(roles.map((r: { role: string }) => r.role)).toEqual(['admin']);
  });

  it('refuses an unknown role with a message naming the field', async () => {
    const admin = await signIn(t.app, demo('admin'));
    const res = await admin
      .post(`/api/labs/${labId}/invitations`, { email: 'a@b.example', name: 'A', role: 'superuser' })
      .expect(400);
    expect(res.body.error.details[0].path).toBe('role');
  });
});
