import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { plannedLeadStandard } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let qa: Client;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  qa = await signIn(t.app, demo('qa'));
});
afterEach(async () => {
  await t.close();
});

const url = (path: string) => `/api/labs/${labId}${path}`;
const stored = {
  coverage: { mode: 'probability', probability: 0.9545 },
  glasswareDistribution: 'triangular',
  temperatureHalfRangeC: 4,
  minimumWeightRule: true,
};

interface Budget {
  statement: string;
  standardUncertainty: number;
  rows: { sourceId: string; stepIndices: number[]; contribution: number }[];
}
async function plannedBudget(): Promise<Budget> {
  const analyst = await signIn(t.app, demo('analyst'));
  const id = await plannedLeadStandard(analyst, labId);
  return (await analyst.get(url(`/preparations/${id}/versions/1`)).expect(200)).body.snapshot.budget as Budget;
}

describe('lab policy: reference temperature, temperature treatment and balance linearity', () => {
  it('a policy stored before these options reads with today’s treatment (per use, independent, 20 °C)', async () => {
    const user = await t
      .db('users')
      .where({ email: demo('qa') })
      .first();
    await t.db('lab_policies').insert({
      lab_id: labId,
      policy_json: JSON.stringify(stored),
      updated_at: '2026-01-01T00:00:00Z',
      updated_by: user.id,
    });
    const policy = (await qa.get(url('/policy')).expect(200)).body;
    expect(policy).toMatchObject({
      ...stored,
      referenceTemperatureC: 20,
      temperatureTreatment: 'perUse',
      operationTemperatureHalfRangeC: 0.5,
      linearityCorrelation: 0,
      linearityCorrelationNetFraction: 0.1,
    });
    const budget = await plannedBudget();
    expect(budget.statement).toMatch(/mg\/L at 20 °C/);
    expect(budget.rows.map((row) => row.sourceId)).not.toContain('lab:temperature');
  });

  it('one shared lab temperature: a single source for every volume of the plan (EURACHEM/CITAC CG4 A1 γ, ±4 °C)', async () => {
    const perUse = await plannedBudget();
    await qa.agent
      .put(url('/policy'))
      .set('x-csrf-token', qa.token)
      .send({ ...stored, temperatureTreatment: 'sharedLab', operationTemperatureHalfRangeC: 0.5 })
      .expect(200);
    const shared = await plannedBudget();
    const lab = shared.rows.find((row) => row.sourceId === 'lab:temperature');
    // Three flask and pipette uses (steps 2, 3 and 4) share it; in the 10 mL → 100 mL dilution it cancels, the stock's flask keeps it.
    expect(lab?.stepIndices).toEqual([1, 2, 3]);
    expect(shared.standardUncertainty).toBeLessThan(perUse.standardUncertainty);
  });

  it('refuses a linearity correlation outside 0 to 1 in plain words', async () => {
    const refused = await qa.agent
      .put(url('/policy'))
      .set('x-csrf-token', qa.token)
      .send({ ...stored, linearityCorrelation: 1.5 })
      .expect(400);
    expect(refused.body.error.details[0].message).toBe('Give a correlation between 0 and 1.');
  });
});
