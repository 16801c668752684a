import { createHash } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { hashPassword } from '../auth/password';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, countRows, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let library: Map<string, EquipmentItem>;

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  library = await libraryByCode(analyst, labId);
});
afterEach(async () => {
  await t.close();
});

const use = (code: string) => toEngineEquipment(library.get(code)!);
const leadPlanWith = (choice: { balance?: string; aliquotFlask?: string } = {}) => leadPlan(library, choice);

const url = (path: string) => `/api/labs/${labId}${path}`;

describe('saving a preparation computes and stores its snapshot', () => {
  it('stores value, budget, Monte Carlo, the revisions used, engine version, seed and a SHA-256 of the snapshot', async () => {
    const res = await analyst
      .post(url('/preparations'), { title: 'Pb 100 mg/L intermediate', plan: leadPlanWith(), seed: 20261202 })
      .expect(201);
    const version = res.body.current;
    expect(version.status).toBe('draft');
    expect(version.problem).toBeNull();
    const snapshot = version.snapshot;
    // c = m·P·(M_Pb/M_Pb(NO3)2)/V₀ · V_a/V_f with the CIAAW 2021 interval midpoints the engine uses
    // (Pb [206.14, 207.94] → 207.04, N [14.00643, 14.00728] → 14.006855, O [15.99903, 15.99977] → 15.9994; CIAAW 2021 standard atomic weights, read):
    // 0.1599 g · 0.9998 · 207.04/331.048110 / 0.1 L · 10/100 = 99.982 mg/L, times the air-buoyancy factor of the
    // default lab policy B = (1 − 1.2/8000)/(1 − 1.2/4530) for lead nitrate 4.53 g/cm³ (OIML R 111; density from
    // memory) = 1.000115 → 99.994 mg/L. Relative 1e-9: same arithmetic.
    const molarMassLeadNitrate = 207.04 + 2 * (14.006855 + 3 * 15.9994);
    const buoyancy = (1 - 1.2 / 8000) / (1 - 1.2 / 4530);
    const expected = ((0.1599 * 0.9998 * (207.04 / molarMassLeadNitrate)) / 0.1) * 1000 * (10 / 100) * buoyancy;
    expect(Math.abs(snapshot.budget.value / expected - 1)).toBeLessThan(1e-9);
    expect(snapshot.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    expect(snapshot.seed).toBe(20261202);
    expect(snapshot.trials).toBeGreaterThanOrEqual(100_000);
    expect(snapshot.items.map((i: { code: string }) => i.code).sort()).toEqual([
      'BAL-05',
      'GP-10-A',
      'RM-PBN-01',
      'VF-100-A',
      'VF-100-B',
    ]);
    expect(snapshot.items.find((i: { code: string }) => i.code === 'RM-PBN-01').hazardNotes).toMatch(/toxic/i);
    const stored = await t.db('preparation_versions').where({ id: version.id }).first();
    expect(version.snapshotSha256).toBe(createHash('sha256').update(stored.snapshot_json).digest('hex'));
    expect(res.body.materialCode).toBe('RM-PBN-01');
    expect(version.resultStatement).toContain('mg/L');
  });

  it('computes from the library, not from equipment data sent by the browser', async () => {
    const plan = leadPlanWith();
    (plan.steps[1] as { flask: { toleranceMl: number } }).flask.toleranceMl = 0.000001;
    const res = await analyst.post(url('/preparations'), { title: 'Forged tolerance', plan }).expect(201);
    expect(res.body.current.snapshot.plan.steps[1].flask.toleranceMl).toBe(0.1);
  });

  it('refuses equipment from another lab and writes nothing', async () => {
    const at = new Date().toISOString();
    const [other] = await t.db('labs').insert({ name: 'Other lab', slug: 'other', created_at: at }).returning('id');
    const otherLab = typeof other === 'object' ? other.id : other;
    const [owner] = await t
      .db('users')
      .insert({
        email: 'o@other.example',
        name: 'O',
        password_hash: await hashPassword('x-password-1'),
        active: true,
        created_at: at,
      })
      .returning('id');
    const [item] = await t
      .db('equipment_items')
      .insert({
        lab_id: otherLab,
        kind: 'flask',
        code: 'FOREIGN-1',
        status: 'active',
        created_at: at,
        created_by: typeof owner === 'object' ? owner.id : owner,
      })
      .returning('id');
    const plan = leadPlanWith();
    (plan.steps[1] as { flask: { libraryId: string } }).flask.libraryId = String(
      typeof item === 'object' ? item.id : item,
    );
    const res = await analyst.post(url('/preparations'), { title: 'Sneaky', plan }).expect(400);
    expect(res.body.error.code).toBe('foreign_equipment');
    expect(res.body.error.details[0].path).toBe('steps.1.flask');
    expect(await countRows(t.db('preparations'))).toBe(0);
  });

  it('keeps a draft the engine cannot compute, with the problem and its path', async () => {
    const plan = leadPlanWith();
    (plan.steps[2] as { pipette: unknown }).pipette = use('GP-25-A');
    (plan.steps[2] as { volumeMl: number }).volumeMl = 25;
    (plan.steps[1] as { flask: unknown }).flask = use('VF-10-A');
    const res = await analyst.post(url('/preparations'), { title: 'Aliquot too big', plan }).expect(201);
    expect(res.body.current.snapshot).toBeNull();
    expect(res.body.current.problem.path.slice(0, 2)).toEqual(['steps', 2]);
    expect(res.body.current.problem.message).toMatch(/25 mL|larger/);
    // The list still names the material chosen, though nothing could be computed.
    expect(res.body.materialCode).toBe('RM-PBN-01');
    const listed = (await analyst.get(url('/preparations?q=Aliquot')).expect(200)).body;
    expect(listed).toEqual([expect.objectContaining({ title: 'Aliquot too big', materialCode: 'RM-PBN-01' })]);
  });

  it('needs a recorded reason to use an overdue balance', async () => {
    t.clock.advance(25 * 86_400_000); // BAL-04 falls due 20 days after the seed
    analyst = await signIn(t.app, demo('analyst'));
    const items = (await analyst.get(url('/equipment?status=all')).expect(200)).body as EquipmentItem[];
    library = new Map(items.map((item) => [item.code, item]));
    expect(library.get('BAL-04')!.calibration).toBe('overdue');
    const blocked = await analyst
      .post(url('/preparations'), { title: 'On the old balance', plan: leadPlanWith({ balance: 'BAL-04' }) })
      .expect(201);
    expect(blocked.body.current.problem.message).toMatch(/BAL-04.*overdue.*reason/);
    const libraryId = String(library.get('BAL-04')!.id);
    // The rule's words are the planner's own (shared/contracts overrideReasonSchema).
    const tooShort = await analyst
      .post(url('/preparations'), {
        title: 'On the old balance',
        plan: leadPlanWith({ balance: 'BAL-04' }),
        overrides: [{ libraryId, reason: ' ok ' }],
      })
      .expect(400);
    expect(tooShort.body.error.details).toEqual([
      { path: 'overrides.0.reason', message: 'Say why this item may be used, in a few words (at least 3 characters).' },
    ]);
    const allowed = await analyst
      .post(url('/preparations'), {
        title: 'On the old balance',
        plan: leadPlanWith({ balance: 'BAL-04' }),
        overrides: [{ libraryId, reason: 'BAL-05 out for service; BAL-04 checked with 10 g weight today' }],
      })
      .expect(201);
    expect(allowed.body.current.problem).toBeNull();
    expect(allowed.body.current.snapshot.items.find((i: { code: string }) => i.code === 'BAL-04').override).toMatch(
      /out for service/,
    );
  });

  it('keeps what a stored budget read when the library item is revised later', async () => {
    const res = await analyst
      .post(url('/preparations'), { title: 'Pinned revisions', plan: leadPlanWith() })
      .expect(201);
    const before = await t.db('preparation_versions').where({ id: res.body.current.id }).first();
    const qa = await signIn(t.app, demo('qa'));
    const flask = library.get('VF-100-A')!;
    await qa.agent
      .put(url(`/equipment/${flask.id}`))
      .set('x-csrf-token', qa.token)
      .send({ data: { ...flask.current.data, toleranceMl: 0.2 }, reason: 'Recalibrated' })
      .expect(200);
    const after = await t.db('preparation_versions').where({ id: res.body.current.id }).first();
    expect(after).toEqual(before);
    const read = (await analyst.get(url(`/preparations/${res.body.id}`)).expect(200)).body;
    expect(read.current.snapshot.plan.steps[1].flask.toleranceMl).toBe(0.1);
    expect(read.current.snapshot.items.find((i: { code: string }) => i.code === 'VF-100-A').revisionNumber).toBe(1);
  });
});

describe('malformed plans and the compute-only route', () => {
  it('refuses a plan that is not a plan document, names the field and writes nothing', async () => {
    const plan = leadPlanWith();
    (plan.steps[0] as { netMassG: unknown }).netMassG = 'a spoonful';
    const res = await analyst.post(url('/preparations'), { title: 'Bad', plan }).expect(400);
    expect(res.body.error.code).toBe('plan_invalid');
    expect(res.body.error.details[0].path).toBe('plan.steps.0.netMassG');
    const unit = leadPlanWith();
    (unit.settings as { outputUnit: string }).outputUnit = 'ppm-ish';
    const refused = await analyst.post(url('/preparations'), { title: 'Bad unit', plan: unit }).expect(400);
    expect(refused.body.error.message).toMatch(/unit/i);
    expect(await countRows(t.db('preparations'))).toBe(0);
  });

  it('computes without saving, with the trials asked for', async () => {
    const res = (await analyst.post(url('/compute'), { plan: leadPlanWith(), seed: 5, trials: 20_000 }).expect(200))
      .body;
    expect(res.monteCarlo.trials).toBe(20_000);
    expect(res.monteCarlo.seed).toBe(5);
    expect(res.budget.unit).toBe('mg/L');
    expect(await countRows(t.db('preparations'))).toBe(0);
    await analyst.post(url('/compute'), { plan: leadPlanWith(), trials: 5_000_000 }).expect(400);
  });
});

describe('drafts, versions, variants and roles', () => {
  it('autosaves the draft in place, refuses another analyst, and lists with filters', async () => {
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb working', plan: leadPlanWith() }).expect(201)
    ).body;
    const saved = (
      await analyst.agent
        .put(url(`/preparations/${created.id}/versions/1`))
        .set('x-csrf-token', analyst.token)
        .send({ title: 'Pb working standard', plan: leadPlanWith({ aliquotFlask: 'VF-200-A' }) })
        .expect(200)
    ).body;
    expect(saved.title).toBe('Pb working standard');
    expect(saved.versions).toHaveLength(1);
    expect(saved.current.seed).toBe(created.current.seed);

    const other = await signIn(t.app, demo('analyst2'));
    await other.agent
      .put(url(`/preparations/${created.id}/versions/1`))
      .set('x-csrf-token', other.token)
      .send({ title: 'Mine now', plan: leadPlanWith() })
      .expect(403);
    const variant = (await other.post(url(`/preparations/${created.id}/duplicate`), {}).expect(201)).body;
    expect(variant.title).toBe('Pb working standard (variant)');
    expect(variant.createdBy).toBe('Lucía Ferreira-Blom');

    const mine = (await analyst.get(url(`/preparations?analyst=${saved.createdById}`)).expect(200)).body;
    expect(mine.map((p: { id: number }) => p.id)).toEqual([created.id]);
    const byMaterial = (await analyst.get(url('/preparations?material=RM-PBN-01&status=draft')).expect(200)).body;
    expect(byMaterial).toHaveLength(2);
    await analyst.get(url('/preparations?status=finished')).expect(400);
  });

  it('lets QA and auditors read but not plan', async () => {
    const created = (await analyst.post(url('/preparations'), { title: 'Pb', plan: leadPlanWith() }).expect(201)).body;
    for (const who of ['qa', 'auditor'] as const) {
      const client = await signIn(t.app, demo(who));
      await client.get(url(`/preparations/${created.id}`)).expect(200);
      await client.post(url('/preparations'), { title: 'x', plan: leadPlanWith() }).expect(403);
    }
  });

  it('finds routes to a target over the lab library', async () => {
    const res = (
      await analyst
        .post(url('/route-finder'), {
          target: { value: 10, unit: 'µg/L' },
          analyte: 'Se',
          materialLibraryId: String(library.get('RM-SE-1000')!.id),
          maximumDilutions: 3,
        })
        .expect(200)
    ).body;
    expect(res.routes.length).toBeGreaterThan(1);
    const best = res.routes[0];
    // 1000 mg/L to 10 µg/L is a factor of 10⁵: at least three dilutions with this glassware.
    expect(best.value).toBeGreaterThan(10 * 0.995);
    expect(best.value).toBeLessThan(10 * 1.005);
    const spreads = res.routes.map(
      (route: { relativeExpandedUncertainty: number }) => route.relativeExpandedUncertainty,
    );
    expect(spreads).toEqual([...spreads].sort((left, right) => left - right));
    expect(res.skipped).toEqual([]);
  });
});
