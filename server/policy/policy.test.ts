import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let qa: Client;
let url: (path: string) => string;

beforeEach(async () => {
  t = await buildTestApp();
  labId = Number((await t.db('labs').first()).id);
  url = (path) => `/api/labs/${labId}${path}`;
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
});
afterEach(async () => {
  await t.close();
});

type Policy = Record<string, unknown>;
const readPolicy = async (): Promise<Policy> => (await qa.get(url('/policy')).expect(200)).body as Policy;
async function savePolicy(change: Policy, status = 200) {
  const { updatedAt: _at, updatedBy: _by, ...current } = await readPolicy();
  return qa.agent
    .put(url('/policy'))
    .set('x-csrf-token', qa.token)
    .send({ ...current, ...change })
    .expect(status);
}

// Density of 2 % (m/m) nitric acid at 20 °C ≈ 1.0098 g/mL (from memory); its u is the lab's choice.
const NITRIC_2 = { matrix: '2 % HNO3', densityGPerMl: 1.0098, standardUncertaintyGPerMl: 0.0005 };

describe('air buoyancy and solution density in the lab policy', () => {
  it('a lab that never set a policy reads the defaults: correct every weighing, air 1.2 ± 0.05 kg/m³, refuse unknown densities', async () => {
    const policy = await readPolicy();
    expect(policy.airBuoyancy).toEqual({
      treatment: 'correct',
      airDensityKgPerM3: 1.2,
      airDensityHalfRangeKgPerM3: 0.05,
    });
    expect(policy.solutionDensity).toEqual({
      matrixDensities: [],
      otherwise: 'refuse',
      waterStandardUncertaintyGPerMl: 0.006,
    });
  });

  it('round-trips over HTTP: QA sets the treatment, the air density and the matrix table; every member reads them back', async () => {
    const change = {
      airBuoyancy: { treatment: 'boundAsUncertainty', airDensityKgPerM3: 1.15, airDensityHalfRangeKgPerM3: 0.04 },
      solutionDensity: { matrixDensities: [NITRIC_2], otherwise: 'assumeWater', waterStandardUncertaintyGPerMl: 0.004 },
    };
    await savePolicy(change);
    const read = (await analyst.get(url('/policy')).expect(200)).body as Policy;
    expect(read.airBuoyancy).toEqual(change.airBuoyancy);
    expect(read.solutionDensity).toEqual(change.solutionDensity);
  });

  it('refuses an impossible setting in words QA reads', async () => {
    const response = await savePolicy(
      {
        airBuoyancy: { treatment: 'correct', airDensityKgPerM3: 1.2, airDensityHalfRangeKgPerM3: 1.5 },
        solutionDensity: {
          matrixDensities: [NITRIC_2, { ...NITRIC_2, matrix: '2 % hno3' }],
          otherwise: 'refuse',
          waterStandardUncertaintyGPerMl: 0.006,
        },
      },
      400,
    );
    const messages = (response.body.error.details as { message: string }[]).map((detail) => detail.message);
    expect(messages).toContain('The half-range must be smaller than the air density.');
    expect(messages).toContain('Each matrix appears once in the table.');
  });

  it('a policy stored before these fields still reads, with the defaults', async () => {
    await t
      .db('lab_policies')
      .insert({
        lab_id: labId,
        policy_json: JSON.stringify({
          coverage: { mode: 'probability', probability: 0.95 },
          glasswareDistribution: 'rectangular',
          temperatureHalfRangeC: 3,
          minimumWeightRule: false,
        }),
        updated_at: '2026-06-01T00:00:00.000Z',
        updated_by: null,
      })
      .onConflict('lab_id')
      .merge();
    const policy = await readPolicy();
    expect(policy.glasswareDistribution).toBe('rectangular');
    expect(policy.airBuoyancy).toEqual({
      treatment: 'correct',
      airDensityKgPerM3: 1.2,
      airDensityHalfRangeKgPerM3: 0.05,
    });
    expect((policy.solutionDensity as Policy).otherwise).toBe('refuse');
  });
});

describe('budgets follow the policy', () => {
  let library: Map<string, EquipmentItem>;
  beforeEach(async () => {
    library = await libraryByCode(analyst, labId);
  });
  const compute = (plan: unknown) => analyst.post(url('/compute'), { plan, trials: 1000 });

  it('the demo lead nitrate (4.53 g/cm³) is corrected by B = (1 − 1.2/8000)/(1 − 1.2/4530) under the default policy (OIML R 111)', async () => {
    const corrected = (await compute(leadPlan(library)).expect(200)).body;
    await savePolicy({
      airBuoyancy: { treatment: 'boundAsUncertainty', airDensityKgPerM3: 1.2, airDensityHalfRangeKgPerM3: 0.05 },
    });
    const bounded = (await compute(leadPlan(library)).expect(200)).body;
    expect(corrected.budget.value / bounded.budget.value).toBeCloseTo((1 - 1.2 / 8000) / (1 - 1.2 / 4530), 12);
    const rowIds = (body: { budget: { rows: { sourceId: string }[] } }) => body.budget.rows.map((row) => row.sourceId);
    expect(rowIds(corrected)).toContain('plan:air-density');
    expect(rowIds(bounded)).toContain('plan:air-buoyancy-uncorrected');
  });

  it('a solid without a density is refused under the policy, in words a chemist reads', async () => {
    const material = library.get('RM-PBN-01')!;
    // The server resolves the material against the library, so the library entry is the one to lack the density.
    const data = { ...material.current.data, densityGPerCm3: null };
    await qa.agent
      .put(url(`/equipment/${material.id}`))
      .set('x-csrf-token', qa.token)
      .send({ data, reason: 'density not known yet' })
      .expect(200);
    const response = await compute(leadPlan(await libraryByCode(analyst, labId))).expect(400);
    expect(response.body.error.message).toMatch(/Enter the density of Lead\(II\) nitrate.*from its safety data sheet/);
  });

  describe('1000 mg/kg Pb in 2 % HNO3 (no density on its certificate), 1 mL to 100 mL, stated in mg/L', () => {
    async function leadSolutionPlan() {
      const created = (
        await qa
          .post(url('/equipment'), {
            kind: 'solution-material',
            data: {
              code: 'RM-PB-MASS',
              name: 'Lead 1000 mg/kg in 2 % HNO3 (invented)',
              lot: 'PB-26-0001',
              expiresOn: '2027-12-31',
              analyte: 'Pb',
              certifiedValue: 1000,
              certifiedUnit: 'mg/kg',
              expandedUncertainty: 2,
              coverageFactor: 2,
              matrix: '2 % HNO₃',
            },
          })
          .expect(201)
      ).body as EquipmentItem;
      const use = (code: string) => toEngineEquipment(library.get(code)!);
      return {
        formatVersion: 1,
        analyte: { formula: 'Pb' },
        settings: { outputUnit: 'mg/L', labTemperatureC: 20 },
        steps: [
          { kind: 'startFromCertifiedSolution', material: toEngineEquipment(created) },
          { kind: 'pipetteAliquot', pipette: use('GP-1-A'), volumeMl: 1 },
          { kind: 'makeUpToVolume', flask: use('VF-100-A') },
        ],
      };
    }

    it('refused by default, asking for the density or the matrix in the table', async () => {
      const response = await compute(await leadSolutionPlan()).expect(400);
      expect(response.body.error.message).toMatch(
        /certified in mg\/kg and is taken by volume in step 2, which needs the solution's density/,
      );
      expect(response.body.error.message).toMatch(/add its matrix \("2 % HNO₃"\) to the lab’s density table/);
    });

    it("with the lab's table: 1000 mg/kg · 1.0098 g/mL / 100 = 10.098 mg/L (hand computation), the entry named in the budget", async () => {
      await savePolicy({
        solutionDensity: { matrixDensities: [NITRIC_2], otherwise: 'refuse', waterStandardUncertaintyGPerMl: 0.006 },
      });
      const body = (await compute(await leadSolutionPlan()).expect(200)).body;
      expect(body.budget.value).toBeCloseTo(10.098, 9);
      const row = (body.budget.rows as { sourceId: string; label: string }[]).find(
        (each) => each.sourceId === 'item:RM-PB-MASS:density',
      );
      expect(row?.label).toMatch(/density of its matrix "2 % HNO3" \(lab's density table\)/);
      expect(body.warnings).toEqual([]);
    });

    it("with water allowed: water's density at 20 °C (Tanaka 2001) and the assumedWaterDensity warning", async () => {
      await savePolicy({
        solutionDensity: { matrixDensities: [], otherwise: 'assumeWater', waterStandardUncertaintyGPerMl: 0.006 },
      });
      const body = (await compute(await leadSolutionPlan()).expect(200)).body;
      expect(body.budget.value).toBeCloseTo(9.982067, 5);
      expect(body.warnings).toEqual([
        expect.objectContaining({
          code: 'assumedWaterDensity',
          stepIndex: 0,
          params: expect.objectContaining({ materialItemId: 'RM-PB-MASS', standardUncertaintyGPerMl: 0.006 }),
        }),
      ]);
    });
  });
});
