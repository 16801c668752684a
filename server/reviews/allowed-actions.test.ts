import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { AllowedActions } from '../../shared/contracts/preparations';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type Client, type TestApp } from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let qa: Client;

const url = (path: string) => `/api/labs/${labId}${path}`;
const NONE: AllowedActions = {
  edit: false,
  submit: false,
  withdraw: false,
  recordReadings: false,
  review: false,
  startNewVersion: false,
  reviewRefusal: null,
};
const READINGS = {
  readings: [{ stepIndex: 0, actualMassG: 0.16042, tareG: 12.38115, grossG: 12.54157 }],
  deviations: 'Weighed 0.45 mg over the target.',
};

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
});
afterEach(async () => {
  await t.close();
});

describe('allowedActions: what the signed-in member may do with a version', () => {
  it('differs for the owner, another analyst, QA and the auditor at each stage', async () => {
    const analyst2 = await signIn(t.app, demo('analyst2'));
    const auditor = await signIn(t.app, demo('auditor'));
    const library = await libraryByCode(analyst, labId);
    const id = (await analyst.post(url('/preparations'), { title: 'Pb check', plan: leadPlan(library) }).expect(201))
      .body.id as number;
    const v1 = (action = '') => url(`/preparations/${id}/versions/1${action}`);
    /** Each reader's allowedActions, read from the preparation and from the version itself (they must agree). */
    const seenBy = async () => {
      const seen: Record<string, AllowedActions> = {};
      for (const [who, client] of Object.entries({ analyst, analyst2, qa, auditor })) {
        const detail = (await client.get(url(`/preparations/${id}`)).expect(200)).body;
        const version = (await client.get(v1()).expect(200)).body;
        expect(version.allowedActions, who).toEqual(detail.current.allowedActions);
        seen[who] = detail.current.allowedActions;
      }
      return seen;
    };

    expect(await seenBy()).toEqual({
      analyst: { ...NONE, edit: true, submit: true, recordReadings: true },
      analyst2: NONE,
      qa: NONE,
      auditor: NONE,
    });

    // The answer to a change is for the member who made it.
    const prepared = (await analyst.post(v1('/readings'), READINGS).expect(200)).body;
    expect(prepared.current.allowedActions).toEqual({ ...NONE, submit: true, recordReadings: true });
    expect(await seenBy()).toEqual({
      analyst: { ...NONE, submit: true, recordReadings: true },
      analyst2: NONE,
      qa: NONE,
      auditor: NONE,
    });

    await analyst.post(v1('/submit'), {}).expect(200);
    expect(await seenBy()).toEqual({
      analyst: { ...NONE, withdraw: true },
      analyst2: NONE,
      qa: { ...NONE, review: true },
      auditor: NONE,
    });

    const returned = (await qa.post(v1('/return'), { comment: 'Say which pipette was used.' }).expect(200)).body;
    expect(returned.current.allowedActions).toEqual(NONE); // QA's own answer after returning it
    expect((await seenBy()).analyst).toEqual({ ...NONE, edit: true, submit: true, recordReadings: true });

    await analyst.post(v1('/submit'), {}).expect(200);
    await qa.post(v1('/approve'), { password: DEMO_PASSWORD, statement: 'Budget reviewed.' }).expect(200);
    expect(await seenBy()).toEqual({
      analyst: { ...NONE, startNewVersion: true },
      analyst2: { ...NONE, startNewVersion: true },
      qa: NONE,
      auditor: NONE,
    });

    // Version 1 is no longer the latest once version 2 starts: no second new version from it.
    await analyst2.post(url(`/preparations/${id}/versions`), {}).expect(201);
    expect((await analyst.get(v1()).expect(200)).body.allowedActions).toEqual(NONE);
  });

  it('tells a member of QA who submitted the version why they may not review it, and the server refuses them', async () => {
    // One person holding both roles plans and submits; the same rule refuses them after the
    // preparation passes to another owner, because they remain its submitter.
    const user = await t
      .db('users')
      .where({ email: demo('qa') })
      .first();
    await t
      .db('memberships')
      .insert({ user_id: user.id, lab_id: labId, role: 'analyst', created_at: new Date().toISOString() });
    qa = await signIn(t.app, demo('qa'));
    const library = await libraryByCode(qa, labId);
    const id = (await qa.post(url('/preparations'), { title: 'QA own plan', plan: leadPlan(library) }).expect(201)).body
      .id as number;
    const v1 = (action = '') => url(`/preparations/${id}/versions/1${action}`);
    await qa.post(v1('/submit'), {}).expect(200);
    const own = { ...NONE, reviewRefusal: 'You submitted this version; another member of QA must review it.' };
    // As its owner they may still withdraw it from review.
    expect((await qa.get(v1()).expect(200)).body.allowedActions).toEqual({ ...own, withdraw: true });

    // No route hands a preparation over yet: the owner is changed in the database directly.
    const analystId = (
      await t
        .db('users')
        .where({ email: demo('analyst') })
        .first()
    ).id;
    await t.db('preparations').where({ id }).update({ created_by: analystId });
    expect((await qa.get(v1()).expect(200)).body.allowedActions).toEqual(own);
    const refused = await qa.post(v1('/approve'), { password: DEMO_PASSWORD, statement: 'Looks fine.' }).expect(403);
    expect(refused.body.error.message).toMatch(/another member of QA must review it/);
    await qa.post(v1('/return'), { comment: 'Returning my own work.' }).expect(403);
  });
});
