import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let id: number;
const url = (path: string) => `/api/labs/${labId}${path}`;

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  const library = await libraryByCode(analyst, labId);
  id = (
    await analyst.post(url('/preparations'), { title: 'Pb intermediate', plan: leadPlan(library), seed: 9 }).expect(201)
  ).body.id;
});
afterEach(async () => {
  await t.close();
});

describe('actual readings', () => {
  it('recomputes the budget on the mass actually weighed and marks the version prepared', async () => {
    const planned = (await analyst.get(url(`/preparations/${id}`)).expect(200)).body.current;
    const res = (
      await analyst
        .post(url(`/preparations/${id}/versions/1/readings`), {
          readings: [{ stepIndex: 0, actualMassG: 0.16042, tareG: 12.38115, grossG: 12.54157 }],
          deviations: 'Weighed 0.45 mg over the target; made up as planned.',
        })
        .expect(200)
    ).body.current;
    expect(res.status).toBe('prepared');
    expect(res.editable).toBe(false);
    expect(res.plan.steps[0].netMassG).toBe(0.16042);
    expect(res.readings).toMatchObject({
      recordedBy: 'Dev Okonjo',
      deviations: /0.45 mg/,
      readings: [{ stepIndex: 0, field: 'netMassG', plannedG: 0.1599, actualG: 0.16042 }],
    });
    // c is proportional to the mass weighed (model c = m·P·F/V₀·V_a/V_f), so the ratio of results
    // equals the ratio of masses; 1e-12 relative is arithmetic rounding.
    expect(res.snapshot.budget.value / planned.snapshot.budget.value).toBeCloseTo(0.16042 / 0.1599, 12);
    expect(res.snapshotSha256).not.toBe(planned.snapshotSha256);
    expect(await t.db('audit_events').where({ action: 'preparation.prepared' })).toHaveLength(1);

    // Correcting a reading keeps the originally planned mass in the record.
    const corrected = (
      await analyst
        .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 0, actualMassG: 0.16024 }] })
        .expect(200)
    ).body.current;
    expect(corrected.readings.readings[0]).toMatchObject({ plannedG: 0.1599, actualG: 0.16024 });

    // A prepared version goes to review like a draft, and then its readings are fixed.
    await analyst.post(url(`/preparations/${id}/versions/1/submit`), {}).expect(200);
    await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 0, actualMassG: 0.2 }] })
      .expect(409);
    const qa = await signIn(t.app, demo('qa'));
    await qa
      .post(url(`/preparations/${id}/versions/1/approve`), {
        password: DEMO_PASSWORD,
        statement: 'Prepared as recorded.',
      })
      .expect(200);
  });

  it('refuses a reading for a step that weighs nothing, and tare/gross that do not add up', async () => {
    const volume = await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 1, actualMassG: 1 }] })
      .expect(400);
    expect(volume.body.error.details[0]).toMatchObject({
      path: 'readings.0.stepIndex',
      message: 'Step 2 is not a weighing step.',
    });
    const sums = await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), {
        readings: [{ stepIndex: 0, actualMassG: 0.16, tareG: 10, grossG: 10.2 }],
      })
      .expect(400);
    // 10.2 − 10 is 0.1999999999999993 in binary; the chemist reads the difference as typed.
    expect(sums.body.error.details[0]).toEqual({
      path: 'readings.0.actualMassG',
      message: 'Gross − tare is 0.2 g, not 0.16 g.',
    });
    expect((await t.db('preparation_versions').first()).status).toBe('draft');
  });

  it('refuses a gross not above the tare, and a missing net, with the readings form’s words at those fields', async () => {
    // The rule and its words live once, in shared/contracts readingSchema; the form resolves with the same schema.
    const refused = await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), {
        readings: [{ stepIndex: 0, actualMassG: 0.5, tareG: 10, grossG: 9.5 }],
      })
      .expect(400);
    expect(refused.body.error.details).toEqual([
      { path: 'readings.0.grossG', message: 'The gross must be more than the tare.' },
    ]);
    const missing = await analyst
      .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 0, tareG: 'ten' }] })
      .expect(400);
    expect(missing.body.error.details).toEqual(
      expect.arrayContaining([
        { path: 'readings.0.actualMassG', message: 'Enter the net mass weighed, or the tare and gross.' },
        { path: 'readings.0.tareG', message: 'Enter the mass as a number, e.g. 0.15990.' },
      ]),
    );
    expect((await t.db('preparation_versions').first()).status).toBe('draft');
  });

  it('lets only the owning analyst record readings', async () => {
    const other = await signIn(t.app, demo('analyst2'));
    await other
      .post(url(`/preparations/${id}/versions/1/readings`), { readings: [{ stepIndex: 0, actualMassG: 0.16 }] })
      .expect(403);
  });
});
