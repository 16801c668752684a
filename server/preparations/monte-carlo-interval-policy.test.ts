import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { snapshotSchema } from '../../shared/contracts/snapshot';
import { resultStatement } from '../../shared/uncertainty';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

// The demo lead plan with a dominant ±2 % rectangular source: Monte Carlo does not validate GUM (JCGM 101:2008 §8),
// so the result states the Monte Carlo coverage interval the lab policy chooses (JCGM 101:2008 7.7).
let t: TestApp;
let labId: number;
let analyst: Client;
let qa: Client;
let library: Map<string, EquipmentItem>;
const url = (path: string) => `/api/labs/${labId}${path}`;

beforeEach(async () => {
  t = await buildTestApp();
  labId = Number((await t.db('labs').first()).id);
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
  library = await libraryByCode(analyst, labId);
});
afterEach(async () => {
  await t.close();
});

function dominatedPlan() {
  const plan = leadPlan(library);
  Object.assign(plan.steps[3], {
    extraSources: [
      { name: 'Evaporation before use', effect: 'relative', distribution: { shape: 'rectangular', halfWidth: 0.02 } },
    ],
  });
  return plan;
}

async function savePolicy(change: Record<string, unknown>) {
  const policy = (await qa.get(url('/policy')).expect(200)).body;
  await qa.agent
    .put(url('/policy'))
    .set('x-csrf-token', qa.token)
    .send({ ...policy, updatedAt: undefined, updatedBy: undefined, ...change })
    .expect(200);
}

describe('the Monte Carlo interval a record states (lab policy)', () => {
  it('reads a policy stored before the choice existed as the probabilistically symmetric interval, and mails QA that statement', async () => {
    await savePolicy({});
    const row = await t.db('lab_policies').where({ lab_id: labId }).first();
    const stored = JSON.parse(row.policy_json) as Record<string, unknown>;
    delete stored.monteCarloInterval;
    await t
      .db('lab_policies')
      .where({ lab_id: labId })
      .update({ policy_json: JSON.stringify(stored) });
    expect((await qa.get(url('/policy')).expect(200)).body.monteCarloInterval).toBe('symmetric');
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb', plan: dominatedPlan(), seed: 5 }).expect(201)
    ).body;
    const { monteCarlo, validation } = created.current.snapshot;
    expect(validation.passed).toBe(false);
    expect(created.current.resultStatement).toContain('Monte Carlo interval (probabilistically symmetric;');
    expect(created.current.resultStatement).toContain(
      `[${monteCarlo.symmetricInterval.low.toFixed(1)}, ${monteCarlo.symmetricInterval.high.toFixed(1)}] mg/L`,
    );
    // QA's review request states the result in the same words as the record, with the reason.
    await analyst.post(url(`/preparations/${created.id}/versions/1/submit`), {}).expect(200);
    const mails = (await t.db('outbox').orderBy('id', 'desc')).filter((mail: { to_address: string }) =>
      mail.to_address.includes(demo('qa')),
    );
    expect(mails.length).toBeGreaterThan(0);
    const statement = resultStatement(snapshotSchema.parse(created.current.snapshot));
    expect(mails[0].text_body).toContain(`Result: ${statement.text}`);
    expect(mails[0].text_body).toContain(statement.reason);
  });

  it('states the shortest interval when QA chooses it, and refuses a choice it does not know', async () => {
    await savePolicy({ monteCarloInterval: 'shortest' });
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb', plan: dominatedPlan(), seed: 5 }).expect(201)
    ).body;
    const { monteCarlo, plan } = created.current.snapshot;
    expect(plan.settings.monteCarloInterval).toBe('shortest');
    expect(created.current.resultStatement).toContain('Monte Carlo interval (shortest;');
    expect(created.current.resultStatement).toContain(
      `[${monteCarlo.shortestInterval.low.toFixed(1)}, ${monteCarlo.shortestInterval.high.toFixed(1)}] mg/L`,
    );
    const policy = (await qa.get(url('/policy')).expect(200)).body;
    const refused = await qa.agent
      .put(url('/policy'))
      .set('x-csrf-token', qa.token)
      .send({ ...policy, updatedAt: undefined, updatedBy: undefined, monteCarloInterval: 'widest' })
      .expect(400);
    expect(refused.body.error.message).toContain('Choose the probabilistically symmetric or the shortest interval.');
  });
});
