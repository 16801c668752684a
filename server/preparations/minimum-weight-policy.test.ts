import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

// 0.1599 g on the four-place balance BAL-04 (s = 0.08 mg, d = 0.1 mg): below its USP <41> minimum weight
// m_min = 2000·max(s, 0.41·d) = 0.160 g, so the engine warns.
let t: TestApp;
let analyst: Client;
let qa: Client;
let library: Map<string, EquipmentItem>;
let url: (path: string) => string;

type WarningBody = { code: string; stepIndex?: number; params: Record<string, unknown> };

beforeEach(async () => {
  t = await buildTestApp();
  const labId = Number((await t.db('labs').first()).id);
  url = (path) => `/api/labs/${labId}${path}`;
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
  library = await libraryByCode(analyst, labId);
});
afterEach(async () => {
  await t.close();
});

async function setMinimumWeightRule(on: boolean) {
  const policy = (await qa.get(url('/policy')).expect(200)).body;
  await qa.agent
    .put(url('/policy'))
    .set('x-csrf-token', qa.token)
    .send({ ...policy, updatedAt: undefined, updatedBy: undefined, minimumWeightRule: on })
    .expect(200);
}

const codes = (warnings: WarningBody[]) => warnings.map((warning) => warning.code);

describe('the lab’s minimum-weight rule', () => {
  it('on: the stored snapshot keeps the engine’s belowMinimumWeight warning for the step', async () => {
    const created = (
      await analyst
        .post(url('/preparations'), { title: 'Pb on BAL-04', plan: leadPlan(library, { balance: 'BAL-04' }) })
        .expect(201)
    ).body;
    const warnings = created.current.snapshot.warnings as WarningBody[];
    expect(warnings).toEqual([
      {
        code: 'belowMinimumWeight',
        stepIndex: 0,
        params: { balanceItemId: 'BAL-04', netMassG: 0.1599, minimumWeightG: expect.closeTo(0.16, 10) },
      },
    ]);
  });

  it('off: the stored snapshot drops that warning by its code, while the engine still raised it', async () => {
    await setMinimumWeightRule(false);
    const created = (
      await analyst
        .post(url('/preparations'), { title: 'Pb on BAL-04', plan: leadPlan(library, { balance: 'BAL-04' }) })
        .expect(201)
    ).body;
    const { snapshot } = created.current as {
      snapshot: { warnings: WarningBody[]; budget: { warnings: WarningBody[] } };
    };
    expect(codes(snapshot.budget.warnings)).toEqual(['belowMinimumWeight']);
    expect(snapshot.warnings).toEqual([]);
  });

  it('applies alike to a computation that is not saved', async () => {
    const compute = async () =>
      (
        await analyst
          .post(url('/compute'), { plan: leadPlan(library, { balance: 'BAL-04' }), trials: 1000 })
          .expect(200)
      ).body as { warnings: WarningBody[]; budget: { warnings: WarningBody[] } };
    expect(codes((await compute()).warnings)).toEqual(['belowMinimumWeight']);
    await setMinimumWeightRule(false);
    const off = await compute();
    expect(codes(off.budget.warnings)).toEqual(['belowMinimumWeight']);
    expect(off.warnings).toEqual([]);
  });
});
