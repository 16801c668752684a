import { createServer, type Server } from 'node:http';
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../shared/contracts/library';
import { leadPlan } from './test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, type TestApp } from './test-support/test-app';

/**
 * Property-based bad input (fast-check): valid documents with one field broken at random, random
 * JSON, and random query strings, thrown at the compute, plan and library routes. Every refusal
 * must be a 4xx in the JSON error shape naming the field; nothing may answer 5xx, hang, or change a
 * row when it refuses.
 */
let t: TestApp;
let server: Server;
let agent: ReturnType<typeof request.agent>;
let token: string;
let labId: number;
let library: Map<string, EquipmentItem>;
let cases = 0;

const tables = ['equipment_items', 'equipment_revisions', 'preparations', 'preparation_versions', 'lab_policies'];
async function rowCounts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of tables) out[table] = Number((await t.db(table).count({ n: '*' }).first())?.n ?? 0);
  return out;
}

beforeAll(async () => {
  t = await buildTestApp();
  server = createServer(t.app).listen(0);
  agent = request.agent(server);
  token = (await agent.get('/api/auth/csrf')).body.csrfToken;
  // QA and analyst in one account, so one session reaches the library writes and the plan routes.
  const user = await t
    .db('users')
    .where({ email: demo('qa') })
    .first();
  labId = (await t.db('labs').first()).id;
  await t
    .db('memberships')
    .insert({ user_id: user.id, lab_id: labId, role: 'analyst', created_at: new Date().toISOString() });
  token = (
    await agent
      .post('/api/auth/login')
      .set('x-csrf-token', token)
      .send({ email: demo('qa'), password: DEMO_PASSWORD })
      .expect(200)
  ).body.csrfToken;
  const items = (await agent.get(`/api/labs/${labId}/equipment?status=all`).expect(200)).body as EquipmentItem[];
  library = new Map(items.map((item) => [item.code, item]));
}, 60_000);
afterAll(async () => {
  console.log(`fuzz: ${cases} malformed requests`);
  server.close();
  await t.close();
});

/** Leaf paths of a document, e.g. ['steps', 2, 'pipette', 'toleranceMl']. */
function leafPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value === null || typeof value !== 'object') return [prefix];
  const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
  return [prefix, ...entries.flatMap(([key, child]) => leafPaths(child, [...prefix, key]))];
}

function withValueAt(document: unknown, path: (string | number)[], value: unknown, remove: boolean): unknown {
  const copy = structuredClone(document) as Record<string | number, unknown>;
  if (path.length === 0) return value;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string | number, unknown>;
  const last = path[path.length - 1];
  if (remove) {
    if (Array.isArray(node)) node.splice(Number(last), 1);
    else delete node[last];
  } else node[last] = value;
  return copy;
}

const junk = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.integer({ min: -1_000_000, max: 0 }),
  fc.double({ noNaN: false }),
  fc.constantFrom(null, true, false, 0, -1, 1e308, -1e-300, '', 'NaN', 'Infinity', '1,5', [], {}),
  fc.array(fc.integer(), { maxLength: 3 }),
  fc.dictionary(fc.string({ maxLength: 5 }), fc.string({ maxLength: 5 }), { maxKeys: 3 }),
);

/** A document with one field replaced by junk or removed, or an unknown field added. */
const broken = (document: unknown) => {
  const paths = leafPaths(document).filter((p) => p.length > 0);
  return fc.oneof(
    fc
      .record({ path: fc.constantFrom(...paths), value: junk, remove: fc.boolean() })
      .map(({ path, value, remove }) => withValueAt(document, path, value, remove)),
    fc
      .record({
        path: fc.constantFrom(...paths.filter((p) => typeof p[p.length - 1] === 'string')),
        key: fc.string({ minLength: 1, maxLength: 8 }),
      })
      .map(({ path, key }) => withValueAt(document, [...path.slice(0, -1), `x_${key}`], 1, false)),
  );
};

function expectRefusalShape(res: request.Response, what: string) {
  expect(res.status, `${what} → ${res.status} ${JSON.stringify(res.body).slice(0, 300)}`).toBeLessThan(500);
  if (res.status >= 400) {
    expect(typeof res.body?.error?.code, what).toBe('string');
    expect(res.body.error.message.length, what).toBeGreaterThan(0);
    if (res.body.error.code === 'validation_failed' || res.body.error.code === 'plan_invalid') {
      expect(res.body.error.details?.[0]?.path, `${what}: the details must name the field`).toBeTruthy();
      // The field path stays in the details; the message is words a chemist reads.
      expect(res.body.error.message.startsWith(`${res.body.error.details[0].path}:`), what).toBe(false);
    }
  }
}

/** Sends any JSON value as the raw body (supertest refuses bare numbers and strings). */
const post = (path: string, body: unknown) =>
  agent
    .post(`/api/labs/${labId}${path}`)
    .set('x-csrf-token', token)
    .set('content-type', 'application/json')
    .send(typeof body === 'string' ? body : JSON.stringify(body));

describe('bad input never breaks the server', () => {
  it('compute: 4000 plans with one field broken', async () => {
    const valid = leadPlan(library);
    let accepted = 0;
    const before = await rowCounts();
    await fc.assert(
      fc.asyncProperty(broken(valid), async (plan) => {
        cases += 1;
        const res = await post('/compute', { plan, trials: 1000, seed: 1 });
        expectRefusalShape(res, 'compute');
        if (res.status < 400) accepted += 1;
      }),
      { numRuns: 4000, seed: 20261202 },
    );
    expect(await rowCounts()).toEqual(before);
    expect(accepted).toBeLessThan(4000);
  }, 300_000);

  it('plans: 1500 saves with one field broken; refusals write nothing', async () => {
    const valid = leadPlan(library);
    await fc.assert(
      fc.asyncProperty(broken(valid), async (plan) => {
        cases += 1;
        const before = await rowCounts();
        const res = await post('/preparations', { title: 'Fuzzed plan', plan });
        expectRefusalShape(res, 'plan');
        if (res.status >= 400) expect(await rowCounts()).toEqual(before);
        // A well-formed plan the engine cannot compute is kept as a draft naming its problem.
        else if (res.body.current.problem) expect(res.body.current.problem.message.length).toBeGreaterThan(0);
      }),
      { numRuns: 1500, seed: 7 },
    );
  }, 300_000);

  it('library: 3000 equipment records with one field broken, and random JSON', async () => {
    const flask = library.get('VF-100-A')!;
    const solid = library.get('RM-PBN-01')!;
    const piston = library.get('PP-100')!;
    const recordArb = fc.oneof(
      broken({ kind: 'flask', data: { ...flask.current.data, code: 'FZ-FLASK' } }),
      broken({ kind: 'solid-material', data: { ...solid.current.data, code: 'FZ-SOLID' } }),
      broken({ kind: 'piston-pipette', data: { ...piston.current.data, code: 'FZ-PIPETTE' } }),
      fc.jsonValue({ maxDepth: 4 }),
    );
    await fc.assert(
      fc.asyncProperty(recordArb, async (record) => {
        cases += 1;
        const before = await rowCounts();
        const res = await post('/equipment', record);
        expectRefusalShape(res, 'equipment');
        if (res.status >= 400) expect(await rowCounts()).toEqual(before);
        else await t.db.transaction(async () => undefined); // an accepted record is a real new item: fine
      }),
      { numRuns: 3000, seed: 11 },
    );
  }, 300_000);

  it('query strings: 2000 random filters on the list routes', async () => {
    const routes = ['/equipment', '/preparations', '/audit-events', '/approved-records', '/equipment-csv/export'];
    const keys = fc.constantFrom(
      'kind',
      'status',
      'analyst',
      'material',
      'from',
      'to',
      'q',
      'limit',
      'offset',
      'actor',
      'action',
      'entityType',
      'x',
    );
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...routes),
        fc.array(fc.tuple(keys, fc.string({ maxLength: 20 })), { maxLength: 4 }),
        async (route, pairs) => {
          cases += 1;
          const query = pairs.map(([k, v]) => `${encodeURIComponent(k)}=${encodeURIComponent(v)}`).join('&');
          const res = await agent.get(`/api/labs/${labId}${route}?${query}`);
          expectRefusalShape(res, `GET ${route}?${query}`);
        },
      ),
      { numRuns: 2000, seed: 3 },
    );
  }, 300_000);
});

describe('refused before any route', () => {
  it('an oversized body (413), deep JSON (400), a wrong content type (415), and Infinity in a number (400)', async () => {
    const before = await rowCounts();
    const big = await post('/compute', { plan: { padding: 'x'.repeat(1_100_000) } });
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('too_large');
    const nest = (levels: number) => {
      let deep: unknown = 1;
      for (let i = 0; i < levels; i += 1) deep = [deep];
      return deep;
    };
    const nested = await post('/compute', { plan: nest(100) });
    expect(nested.status).toBe(400);
    expect(nested.body.error.code).toBe('too_deep');
    // Far deeper than the JSON parser will go: refused as unreadable JSON, still a 400.
    const abyss = await post('/compute', `{"plan":${'['.repeat(20_000)}1${']'.repeat(20_000)}}`);
    expect(abyss.status).toBe(400);
    const text = await agent
      .post(`/api/labs/${labId}/equipment`)
      .set('x-csrf-token', token)
      .set('content-type', 'text/plain')
      .send('kind=flask');
    expect(text.status).toBe(415);
    const infinite = await agent
      .post(`/api/labs/${labId}/equipment`)
      .set('x-csrf-token', token)
      .set('content-type', 'application/json')
      .send(
        `{"kind":"flask","data":${JSON.stringify({ ...library.get('VF-100-A')!.current.data, code: 'FZ-INF' }).replace('"toleranceMl":0.1', '"toleranceMl":1e999')}}`,
      );
    expect(infinite.status).toBe(400);
    expect(infinite.body.error.details[0].path).toBe('data.toleranceMl');
    const nan = await agent
      .post(`/api/labs/${labId}/equipment`)
      .set('x-csrf-token', token)
      .set('content-type', 'application/json')
      .send('{"kind":"flask","data":{"toleranceMl":NaN}}');
    expect(nan.status).toBe(400);
    expect(nan.body.error.code).toBe('malformed_json');
    expect(await rowCounts()).toEqual(before);
  });
});
