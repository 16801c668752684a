import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

// Common practice: a flask holds one solution at a time. The demo lead standard (invented Wellmere data) makes
// its stock in VF-100-A; making up the 10 mL aliquot of that stock in VF-100-A again is the case refused.

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

const url = (path: string) => `/api/labs/${labId}${path}`;
/** The lead standard with its aliquot made up in the stock's own flask, said (or not) to be bottled first. */
function reusingStockFlask(flaskEmptiedBefore?: boolean) {
  const plan = leadPlan(library, { aliquotFlask: 'VF-100-A' });
  if (flaskEmptiedBefore !== undefined) Object.assign(plan.steps[3], { flaskEmptiedBefore });
  return plan;
}

describe('a flask reused while it holds the stock', () => {
  it('is kept as a draft naming the problem at that flask, with both steps', async () => {
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb reused flask', plan: reusingStockFlask() }).expect(201)
    ).body;
    expect(created.current.problem).toMatchObject({ path: ['steps', 3, 'flask'] });
    expect(created.current.problem.message).toBe(
      'Step 4: flask VF-100-A still holds the solution made up in it at step 2, from which step 3 takes its aliquot. ' +
        'Choose another flask, or state that the solution of step 2 is first transferred to a labelled storage bottle and the flask rinsed.',
    );
    expect(created.current.resultStatement).toBeNull();
  });

  it('computes when the plan says the stock was bottled first, and keeps that statement in the stored plan', async () => {
    const created = (
      await analyst.post(url('/preparations'), { title: 'Pb bottled stock', plan: reusingStockFlask(true) }).expect(201)
    ).body;
    expect(created.current.problem).toBeNull();
    expect(created.current.resultStatement).toMatch(/^c\(Pb\) = \(99\.99 ± /);
    expect(created.current.snapshot.plan.steps[3].flaskEmptiedBefore).toBe(true);
  });
});
