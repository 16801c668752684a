import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';
import { createComputePool, type Computer, type ComputeLimits } from './compute-pool';

let t: TestApp | undefined;
let pool: Computer | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
  pool = undefined;
});

/** The demo lab on a fresh database, with a compute pool of the given limits the test can watch. */
async function setUp(
  limits: Partial<ComputeLimits> = {},
  wrap: (computer: Computer) => Computer = (computer) => computer,
) {
  pool = createComputePool(limits);
  t = await buildTestApp({ computer: wrap(pool) });
  const labId = Number((await t.db('labs').first()).id);
  const analyst = await signIn(t.app, demo('analyst'));
  const library = await libraryByCode(analyst, labId);
  return { app: t.app, labId, analyst, library, url: (path: string) => `/api/labs/${labId}${path}` };
}

const routeRequest = (library: Map<string, EquipmentItem>) => ({
  target: { value: 10, unit: 'µg/L' },
  analyte: 'Se',
  materialLibraryId: String(library.get('RM-SE-1000')!.id),
  maximumDilutions: 3,
});

describe('compute isolation', () => {
  it('runs the route finder in the compute pool, not on the request thread, and says whether the search was complete', async () => {
    const routeJobs: number[] = [];
    const { analyst, library, url, labId } = await setUp({}, (computer) => ({
      ...computer,
      routes: (lab, request, signal) => {
        routeJobs.push(lab);
        return computer.routes(lab, request, signal);
      },
    }));
    const res = await analyst.post(url('/route-finder'), routeRequest(library)).expect(200);
    expect(routeJobs).toEqual([labId]);
    expect(res.body.routes.length).toBeGreaterThan(0);
    expect(res.body.stoppedEarly).toBe(false);
    expect(res.body.searchNote).toBeNull();
  });

  it('answers 503 with Retry-After when a lab floods the compute route past its share', async () => {
    const { analyst, library, url } = await setUp({ threads: 1, jobsPerLab: 2 });
    const body = { plan: leadPlan(library), trials: 1_000_000, seed: 1 };
    const answers = await Promise.all(Array.from({ length: 5 }, () => analyst.post(url('/compute'), body)));
    const refused = answers.filter((res) => res.status === 503);
    expect(refused).toHaveLength(3);
    expect(refused[0].headers['retry-after']).toBe('5');
    expect(refused[0].body.error.code).toBe('compute_busy');
    expect(answers.filter((res) => res.status === 200)).toHaveLength(2);
  });

  it('stops the computation when the client closes the request before the answer', async () => {
    const { app, analyst, library, url } = await setUp({ threads: 1 });
    const server = app.listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    try {
      const body = JSON.stringify({ plan: leadPlan(library), trials: 1_000_000, seed: 1 });
      const cookie = (
        analyst.agent as unknown as { jar: { getCookies: (access: object) => { toValueString: () => string }[] } }
      ).jar
        .getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false })
        .map((c) => c.toValueString())
        .join('; ');
      const req = httpRequest({
        host: '127.0.0.1',
        port: (server.address() as AddressInfo).port,
        method: 'POST',
        path: url('/compute'),
        headers: { 'content-type': 'application/json', 'x-csrf-token': analyst.token, cookie },
      });
      req.on('error', () => undefined);
      req.end(body);
      await vi.waitFor(() => expect(pool!.stats().active).toBe(1), { timeout: 10_000, interval: 10 });
      req.destroy();
      await vi.waitFor(() => expect(pool!.stats()).toMatchObject({ active: 0, cancelled: 1 }), {
        timeout: 10_000,
        interval: 20,
      });
    } finally {
      server.close();
    }
  });
});

describe('no 5xx from input', () => {
  const refusedPlan = async (analyst: Client, path: string, plan: object) =>
    (await analyst.post(path, { plan, trials: 1000 })).body.error;

  it('refuses a plan of 2002 steps with the cap in plain words, before any compute', async () => {
    const { analyst, library, url } = await setUp();
    const plan = leadPlan(library);
    const steps = [
      plan.steps[0],
      plan.steps[1],
      ...Array.from({ length: 1000 }, () => [plan.steps[2], plan.steps[3]]).flat(),
    ];
    const res = await analyst.post(url('/compute'), { plan: { ...plan, steps }, trials: 1000 }).expect(400);
    expect(res.body.error.message).toBe('A plan can have at most 20 steps; this one has 2002.');
    const saved = await analyst.post(url('/preparations'), { title: 'Too long', plan: { ...plan, steps } }).expect(400);
    expect(saved.body.error.message).toBe('A plan can have at most 20 steps; this one has 2002.');
    expect(pool!.stats().active).toBe(0);
  });

  it('refuses 5000 extra sources on a step', async () => {
    const { analyst, library, url } = await setUp();
    const plan = leadPlan(library);
    const source = {
      name: 'evaporation',
      effect: 'relative',
      distribution: { shape: 'rectangular', halfWidth: 0.001 },
    };
    const steps = plan.steps.map((step, index) =>
      index === 1 ? { ...step, extraSources: Array.from({ length: 5000 }, () => source) } : step,
    );
    const error = await refusedPlan(analyst, url('/compute'), { ...plan, steps });
    expect(error.message).toMatch(/at most 20 extra sources; it has 5000\./);
  });

  it('answers 400, not 500, for a formula nested 200 000 levels deep', async () => {
    const { analyst, library, url } = await setUp();
    const abyss = `${'('.repeat(200_000)}Pb${')'.repeat(200_000)}`;
    const res = await analyst.post(url('/compute'), {
      plan: { ...leadPlan(library), analyte: { formula: abyss } },
      trials: 1000,
    });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/at most 100 characters/);
    const routes = await analyst.post(url('/route-finder'), { ...routeRequest(library), analyte: abyss });
    expect(routes.status).toBe(400);
  });

  it('refuses a policy k the engine cannot use, and computes at the largest k it accepts', async () => {
    const { app, analyst, library, url } = await setUp();
    const qa = await signIn(app, demo('qa'));
    const policy = (await qa.get(url('/policy')).expect(200)).body;
    const write = (k: number) =>
      qa.agent
        .put(url('/policy'))
        .set('x-csrf-token', qa.token)
        .send({ ...policy, updatedAt: undefined, updatedBy: undefined, coverage: { mode: 'fixed-k', k } });
    const refused = await write(8.5);
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/at most 8/);
    await write(8).expect(200);
    const computed = await analyst.post(url('/compute'), { plan: leadPlan(library), trials: 1000 }).expect(200);
    expect(computed.body.budget.coverageFactor).toBe(8);
  });
});

describe.runIf(!process.env.DATABASE_URL)('a locked database', () => {
  // better-sqlite3 waits synchronously (busy_timeout 5 s), and the session is written at the end of the request too.
  it('waits, then answers 503 with Retry-After; health still answers', { timeout: 60_000 }, async () => {
    const { app, analyst, library, url } = await setUp();
    const Database = (await import('better-sqlite3')).default;
    const holder = new Database(t!.file);
    holder.exec('BEGIN EXCLUSIVE');
    try {
      const res = await analyst.post(url('/preparations'), { title: 'While locked', plan: leadPlan(library) });
      expect(res.status).toBe(503);
      expect(res.headers['retry-after']).toBe('5');
      expect(res.body.error.code).toBe('database_busy');
      expect(res.body.error.message).toMatch(/database is busy/);
      await request(app).get('/api/health').expect(200);
    } finally {
      holder.exec('ROLLBACK');
      holder.close();
    }
    await analyst.post(url('/preparations'), { title: 'After the lock', plan: leadPlan(library) }).expect(201);
  });
});

describe.runIf(process.env.DATABASE_URL)('a locked PostgreSQL table', () => {
  it(
    'waits for the lock timeout, then answers 503 with Retry-After; health still answers',
    { timeout: 60_000 },
    async () => {
      const { app, analyst, library, url } = await setUp();
      const holder = await t!.db.transaction();
      await holder.raw('lock table preparations in share mode');
      try {
        const res = await analyst.post(url('/preparations'), { title: 'While locked', plan: leadPlan(library) });
        expect(res.status).toBe(503);
        expect(res.headers['retry-after']).toBe('5');
        expect(res.body.error.code).toBe('database_busy');
        await request(app).get('/api/health').expect(200);
      } finally {
        await holder.rollback();
      }
      await analyst.post(url('/preparations'), { title: 'After the lock', plan: leadPlan(library) }).expect(201);
    },
  );
});
