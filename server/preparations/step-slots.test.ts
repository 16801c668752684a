import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { toEngineEquipment } from '../../shared/contracts/engine-equipment';
import type { EquipmentItem } from '../../shared/contracts/library';
import { STEP_KINDS } from '../../shared/contracts/step-kinds';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let library: Map<string, EquipmentItem>;
const url = (path: string) => `/api/labs/${labId}${path}`;
const inline = (code: string) => toEngineEquipment(library.get(code)!);

/** Selenium by mass from the demo certified solution: 2 g of it on BAL-04, diluted to 100 g (invented demo plan). */
const gravimetricPlan = () => ({
  formatVersion: 1,
  analyte: { formula: 'Se' },
  settings: { outputUnit: 'mg/kg', labTemperatureC: 20 },
  steps: [
    { kind: 'startFromCertifiedSolution', material: inline('RM-SE-1000') },
    { kind: 'weighAliquot', balance: inline('BAL-04'), netMassG: 2 },
    { kind: 'makeUpToMass', balance: inline('BAL-04'), finalMassG: 100 },
  ],
});

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  library = await libraryByCode(analyst, labId);
});
afterEach(async () => {
  await t.close();
});

describe('the step-kind registry on the server', () => {
  it('fills a slot only with the library kinds the registry names for it', async () => {
    const plan = leadPlan(library);
    expect(STEP_KINDS.weighSolid.slot?.libraryKinds).not.toContain('flask');
    // Balance data inline (so the plan is well formed) but naming a flask of the library.
    Object.assign(plan.steps[0], { balance: { ...inline('BAL-05'), libraryId: String(library.get('VF-100-A')!.id) } });
    const draft = (await analyst.post(url('/preparations'), { title: 'Flask on the pan', plan, seed: 1 }).expect(201))
      .body.current;
    expect(draft.snapshot).toBeNull();
    expect(draft.problem).toEqual({ path: ['steps', 0, 'balance'], message: 'Step 1: VF-100-A is not a balance.' });

    // A piston pipette fills the pipette slot as a glass one does.
    expect(STEP_KINDS.pipetteAliquot.slot?.libraryKinds).toContain('piston-pipette');
    const piston = leadPlan(library);
    Object.assign(piston.steps[2], { pipette: inline('PP-1000'), volumeMl: 1 });
    const computed = (
      await analyst.post(url('/preparations'), { title: 'Piston aliquot', plan: piston, seed: 1 }).expect(201)
    ).body.current;
    expect(computed.problem).toBeNull();
    expect(computed.snapshot.items.map((item: { code: string }) => item.code)).toContain('PP-1000');
  });

  it('records each weighing in the field the registry names: net mass of an aliquot, final mass of a make-up', async () => {
    const id = (
      await analyst.post(url('/preparations'), { title: 'Se by mass', plan: gravimetricPlan(), seed: 3 }).expect(201)
    ).body.id;
    const current = (
      await analyst
        .post(url(`/preparations/${id}/versions/1/readings`), {
          readings: [
            { stepIndex: 1, actualMassG: 2.0013 },
            { stepIndex: 2, actualMassG: 100.0421 },
          ],
        })
        .expect(200)
    ).body.current;
    expect(current.readings.readings).toEqual([
      {
        stepIndex: 1,
        field: STEP_KINDS.weighAliquot.recordedMass,
        plannedG: 2,
        actualG: 2.0013,
        tareG: null,
        grossG: null,
      },
      { stepIndex: 2, field: 'finalMassG', plannedG: 100, actualG: 100.0421, tareG: null, grossG: null },
    ]);
    expect(current.plan.steps[1].netMassG).toBe(2.0013);
    expect(current.plan.steps[2].finalMassG).toBe(100.0421);

    const refused = await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 0, actualMassG: 1 }] })
      .expect(400);
    expect(refused.body.error.message).toBe('Step 1 is not a weighing step.');
  });
});
