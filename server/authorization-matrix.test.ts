import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../shared/contracts/roles';
import { hashPassword } from './auth/password';
import { listRoutes } from './lib/list-routes';
import {
  agentFor,
  buildTestApp,
  demo,
  DEMO_PASSWORD,
  signIn,
  type Client,
  type TestApp,
} from './test-support/test-app';

/**
 * Who may call each API route. A route the app serves but this table does not list fails the
 * suite, so a new route cannot ship without a decision here.
 *   public: anyone; signedIn: any signed-in user; member: any role in the lab; operator: the
 *   instance operator only (outside lab roles; in the demo the admin account); otherwise the roles.
 */
type Access = 'public' | 'signedIn' | 'member' | 'operator' | Role[];
const KEEPERS: Role[] = ['qa', 'admin'];
const ACCESS: Record<string, Access> = {
  'GET /api/health': 'public',
  'GET /api/auth/csrf': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/logout': 'public',
  'GET /api/auth/me': 'signedIn',
  'POST /api/auth/active-lab': 'signedIn',
  'POST /api/auth/password-reset': 'public',
  'POST /api/auth/password-reset/:token': 'public',
  'GET /api/invitations/:token': 'public',
  'POST /api/invitations/:token/accept': 'public',
  'GET /api/labs/:labId/members': ['admin'],
  'PATCH /api/labs/:labId/members/:userId': ['admin'],
  'DELETE /api/labs/:labId/members/:userId': ['admin'],
  'GET /api/labs/:labId/invitations': ['admin'],
  'POST /api/labs/:labId/invitations': ['admin'],
  'POST /api/labs/:labId/invitations/:invitationId/revoke': ['admin'],
  'GET /api/labs/:labId/delivery-log': ['admin'],
  'GET /api/operator/accounts': 'operator',
  'POST /api/operator/accounts/:userId/disable': 'operator',
  'POST /api/operator/accounts/:userId/enable': 'operator',
  'GET /api/operator/mail': 'operator',
  'GET /api/labs/:labId/equipment-templates': 'member',
  'GET /api/labs/:labId/equipment-csv/columns': 'member',
  'GET /api/labs/:labId/equipment-csv/template': 'member',
  'GET /api/labs/:labId/equipment-csv/export': 'member',
  'POST /api/labs/:labId/equipment-csv/import': KEEPERS,
  'GET /api/labs/:labId/equipment': 'member',
  'POST /api/labs/:labId/equipment': KEEPERS,
  'GET /api/labs/:labId/equipment/:itemId': 'member',
  'PUT /api/labs/:labId/equipment/:itemId': KEEPERS,
  'POST /api/labs/:labId/equipment/:itemId/retire': KEEPERS,
  'GET /api/labs/:labId/equipment/:itemId/revisions/:number': 'member',
  'POST /api/labs/:labId/equipment/:itemId/revisions/:number/certificates': KEEPERS,
  'GET /api/labs/:labId/certificates/:certificateId': 'member',
  'GET /api/labs/:labId/policy': 'member',
  'PUT /api/labs/:labId/policy': ['qa'],
  'GET /api/labs/:labId/audit-events': ['auditor', 'qa', 'admin'],
  'GET /api/labs/:labId/audit-events.csv': ['auditor', 'qa', 'admin'],
  'GET /api/labs/:labId/preparations': 'member',
  'POST /api/labs/:labId/preparations': ['analyst'],
  'GET /api/labs/:labId/preparations/:preparationId': 'member',
  'GET /api/labs/:labId/preparations/:preparationId/versions/:number': 'member',
  'PUT /api/labs/:labId/preparations/:preparationId/versions/:number': ['analyst'],
  'POST /api/labs/:labId/preparations/:preparationId/versions': ['analyst'],
  'POST /api/labs/:labId/preparations/:preparationId/versions/:number/readings': ['analyst'],
  'POST /api/labs/:labId/preparations/:preparationId/duplicate': ['analyst'],
  'POST /api/labs/:labId/route-finder': ['analyst', 'qa'],
  'POST /api/labs/:labId/compute': ['analyst', 'qa'],
  'POST /api/labs/:labId/preparations/:preparationId/versions/:number/submit': ['analyst'],
  'POST /api/labs/:labId/preparations/:preparationId/versions/:number/withdraw': ['analyst'],
  'POST /api/labs/:labId/preparations/:preparationId/versions/:number/approve': ['qa'],
  'POST /api/labs/:labId/preparations/:preparationId/versions/:number/return': ['qa'],
  'GET /api/labs/:labId/preparations/:preparationId/versions/:number/verify': 'member',
  'GET /api/labs/:labId/preparations/:preparationId/versions/:number/snapshot.json': 'member',
  'GET /api/labs/:labId/review-queue': ['qa'],
  'GET /api/labs/:labId/approved-records': 'member',
  'GET /api/labs/:labId/preparations/:preparationId/versions/:number/record.pdf': 'member',
};

const ROLES: Role[] = ['admin', 'qa', 'analyst', 'auditor'];
const LOCAL: Record<Role, 'admin' | 'qa' | 'analyst' | 'auditor'> = {
  admin: 'admin',
  qa: 'qa',
  analyst: 'analyst',
  auditor: 'auditor',
};
/** The demo admin account is also the instance operator; no other demo account is. */
const OPERATOR_ROLE: Role = 'admin';

let t: TestApp;
let ownLab: number;
let otherLab: number;
const clients = new Map<Role, Client>();
let anonymous: Client;

beforeAll(async () => {
  t = await buildTestApp();
  ownLab = (await t.db('labs').first()).id;
  const at = new Date().toISOString();
  const [lab] = await t.db('labs').insert({ name: 'Other lab', slug: 'other-lab', created_at: at }).returning('id');
  otherLab = typeof lab === 'object' ? lab.id : lab;
  const [user] = await t
    .db('users')
    .insert({
      email: 'admin@other.example',
      name: 'Other Admin',
      password_hash: await hashPassword(DEMO_PASSWORD),
      active: true,
      created_at: at,
    })
    .returning('id');
  await t
    .db('memberships')
    .insert({ user_id: typeof user === 'object' ? user.id : user, lab_id: otherLab, role: 'admin', created_at: at });
  for (const role of ROLES) clients.set(role, await signIn(t.app, demo(LOCAL[role])));
  anonymous = await agentFor(t.app);
});
afterAll(async () => {
  await t.close();
});

/** Fills the path with the lab and made-up ids (999 999), so only access decides the status. */
const concrete = (path: string, labId: number) =>
  path
    .replace(':labId', String(labId))
    .replace(':token', 'x'.repeat(43))
    .replace(/:[A-Za-z]+/g, '999999');

async function call(client: Client, method: string, path: string) {
  const verb = method.toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
  const req = client.agent[verb](path);
  return verb === 'get' ? req : req.set('x-csrf-token', client.token).send({});
}

const LAB_HIDDEN = 'The lab was not found.';

describe('authorization matrix: every API route × role × (own lab, other lab, signed out)', () => {
  const routes = () =>
    listRoutes(t.app)
      .filter((r) => r.path.startsWith('/api/'))
      .map((r) => `${r.method} ${r.path}`);

  it('has an access rule for every route the app serves, and no rule for a route that is gone', () => {
    const served = routes();
    expect(
      served.filter((key) => !(key in ACCESS)),
      'routes without an access rule',
    ).toEqual([]);
    expect(
      Object.keys(ACCESS).filter((key) => !served.includes(key)),
      'rules for routes that do not exist',
    ).toEqual([]);
  });

  it('answers each cell as the table says', async () => {
    const failures: string[] = [];
    let cells = 0;
    for (const key of routes()) {
      const [method, path] = key.split(' ');
      const access = ACCESS[key];
      const lab = path.includes(':labId');
      // Signed out: public routes answer something other than 401; all others 401.
      const out = await call(anonymous, method, concrete(path, ownLab));
      cells += 1;
      if (access === 'public' ? out.status === 401 && !path.includes('login') : out.status !== 401)
        failures.push(`${key} signed out → ${out.status}`);
      for (const role of ROLES) {
        const client = clients.get(role)!;
        const own = await call(client, method, concrete(path, ownLab));
        cells += 1;
        const allowed =
          access === 'public' ||
          access === 'signedIn' ||
          access === 'member' ||
          (access === 'operator' ? role === OPERATOR_ROLE : access.includes(role));
        const hidden = own.status === 404 && own.body?.error?.message === LAB_HIDDEN;
        if (allowed && (own.status === 401 || own.status === 403 || hidden))
          failures.push(`${key} as ${role} in own lab → ${own.status}, expected access`);
        if (!allowed && own.status !== 403) failures.push(`${key} as ${role} in own lab → ${own.status}, expected 403`);
        if (lab) {
          const other = await call(client, method, concrete(path, otherLab));
          cells += 1;
          if (!(other.status === 404 && other.body?.error?.message === LAB_HIDDEN))
            failures.push(`${key} as ${role} in another lab → ${other.status}, expected 404`);
        }
      }
      if (method !== 'GET' && path.includes('logout')) {
        // Signing out ends the session: sign the roles in again for the routes after it.
        for (const role of ROLES) clients.set(role, await signIn(t.app, demo(LOCAL[role])));
        anonymous = await agentFor(t.app);
      }
    }
    expect(failures).toEqual([]);
    expect(cells).toBeGreaterThan(300);
    console.log(`authorization matrix: ${routes().length} routes, ${cells} cells`);
  });

  it('returns JSON errors for every refusal', async () => {
    const res = await request(t.app).get(`/api/labs/${ownLab}/members`);
    expect(res.status).toBe(401);
    expect(res.body.error).toMatchObject({ code: 'unauthenticated' });
  });
});
