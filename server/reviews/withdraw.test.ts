import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { preparationsRepository } from '../preparations/preparations-repository';
import { plannedLeadStandard } from '../test-support/demo-plans';
import {
  buildTestApp,
  countRows,
  demo,
  DEMO_PASSWORD,
  signIn,
  type Client,
  type TestApp,
} from '../test-support/test-app';

let t: TestApp;
let labId: number;
let analyst: Client;
let qa: Client;
let preparationId: number;

const url = (path: string) => `/api/labs/${labId}${path}`;
const v1 = (action: string) => url(`/preparations/${preparationId}/versions/1/${action}`);
const APPROVAL = { password: DEMO_PASSWORD, statement: 'Reviewed against SOP-CHEM-014.' };
const READINGS = { readings: [{ stepIndex: 0, actualMassG: 0.16042 }], deviations: 'None.' };

const actionsOf = (detail: { current: { reviews: { action: string }[] } }) =>
  detail.current.reviews.map((review) => review.action);
const statusInDb = async () =>
  (await t.db('preparation_versions').where({ preparation_id: preparationId, number: 1 }).first()).status as string;

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
  preparationId = await plannedLeadStandard(analyst, labId);
});
afterEach(async () => {
  await t.close();
});

describe('the analyst withdraws a submitted version before QA decides', () => {
  it('takes a version without readings back to draft, out of the queue, with its reason, an audit event and no mail', async () => {
    await analyst.post(v1('submit'), { comment: 'For the Friday run' }).expect(200);
    expect((await qa.get(url('/review-queue')).expect(200)).body).toHaveLength(1);
    const mails = await countRows(t.db('outbox'));

    const withdrawn = (await analyst.post(v1('withdraw'), { comment: 'Wrong flask entered.' }).expect(200)).body;
    expect(withdrawn.current.status).toBe('draft');
    expect(withdrawn.current.editable).toBe(true);
    expect(withdrawn.current.allowedActions).toMatchObject({ edit: true, submit: true, withdraw: false });
    expect(actionsOf(withdrawn)).toEqual(['submitted', 'withdrawn']);
    expect(withdrawn.current.reviews[1]).toMatchObject({ actor: 'Dev Okonjo', comment: 'Wrong flask entered.' });
    expect(await statusInDb()).toBe('draft');

    expect((await qa.get(url('/review-queue')).expect(200)).body).toEqual([]);
    expect(await countRows(t.db('outbox'))).toBe(mails);
    const { events } = (await qa.get(url('/audit-events?action=preparation.withdrawn')).expect(200)).body;
    expect(events).toEqual([
      expect.objectContaining({
        actor: 'Dev Okonjo',
        entityType: 'preparation',
        entityId: String(preparationId),
        summary: 'Dev Okonjo withdrew version 1 of “Pb check standard” from review: Wrong flask entered.',
        before: { status: 'submitted' },
        after: { status: 'draft' },
      }),
    ]);

    // QA can no longer decide on it; the analyst can submit it again and it is back in the queue.
    const late = await qa.post(v1('approve'), APPROVAL).expect(409);
    // QA is told why, not just the state: the analyst took it back.
    expect(late.body.error.message).toMatch(/withdrawn from review by its analyst/);
    await analyst.post(v1('submit'), {}).expect(200);
    const queue = (await qa.get(url('/review-queue')).expect(200)).body;
    expect(queue).toEqual([expect.objectContaining({ preparationId, versionNumber: 1 })]);
  });

  it('takes a version with bench readings back to prepared, readings kept', async () => {
    await analyst.post(v1('readings'), READINGS).expect(200);
    await analyst.post(v1('submit'), {}).expect(200);
    const withdrawn = (await analyst.post(v1('withdraw'), {}).expect(200)).body;
    expect(withdrawn.current.status).toBe('prepared');
    expect(withdrawn.current.readings.readings[0].actualG).toBe(0.16042);
    expect(withdrawn.current.reviews[1]).toMatchObject({ action: 'withdrawn', comment: '' });
    expect(withdrawn.current.allowedActions).toMatchObject({ recordReadings: true, submit: true, edit: false });
  });

  it('refuses another analyst, QA and the auditor, and leaves the version in review', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    const analyst2 = await signIn(t.app, demo('analyst2'));
    const other = await analyst2.post(v1('withdraw'), {}).expect(403);
    expect(other.body.error.message).toBe('Only the analyst who owns this preparation can withdraw it from review.');
    await qa.post(v1('withdraw'), {}).expect(403);
    await (await signIn(t.app, demo('auditor'))).post(v1('withdraw'), {}).expect(403);
    await analyst.post(url(`/preparations/${preparationId}/versions/9/withdraw`), {}).expect(404);
    expect(await statusInDb()).toBe('submitted');
    expect(await countRows(t.db('audit_events').where({ action: 'preparation.withdrawn' }))).toBe(0);
  });

  it('refuses a draft, and a version QA has approved or returned, with a plain 409', async () => {
    const draft = await analyst.post(v1('withdraw'), {}).expect(409);
    expect(draft.body.error.message).toBe('Version 1 is draft; only a submitted version can be withdrawn from review.');
    await analyst.post(v1('submit'), {}).expect(200);
    await qa.post(v1('return'), { comment: 'Name the pipette used.' }).expect(200);
    await analyst.post(v1('withdraw'), {}).expect(409);
    await analyst.post(v1('submit'), {}).expect(200);
    await qa.post(v1('approve'), APPROVAL).expect(200);
    const approved = await analyst.post(v1('withdraw'), { comment: 'Too late' }).expect(409);
    expect(approved.body.error).toMatchObject({
      code: 'not_submitted',
      message: 'Version 1 is approved; only a submitted version can be withdrawn from review.',
    });
    expect(await statusInDb()).toBe('approved');
  });

  it('refuses a reason longer than 2000 characters in plain words', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    const res = await analyst.post(v1('withdraw'), { comment: 'x'.repeat(2001) }).expect(400);
    expect(JSON.stringify(res.body.error)).toContain('Use at most 2000 characters.');
    expect(await statusInDb()).toBe('submitted');
  });

  it('moves the status only while the version is still submitted (the guard a withdrawal that loses a race meets)', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    await qa.post(v1('approve'), APPROVAL).expect(200);
    const versionId = (await t.db('preparation_versions').where({ preparation_id: preparationId }).first()).id;
    expect(await preparationsRepository(t.db).withdraw(versionId, 'draft', t.db)).toBe(0);
    expect(await statusInDb()).toBe('approved');
  });

  it('lets exactly one of a withdrawal and an approval sent together win; the other gets a 409', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    // The approval is sent first: it reads the version, then checks the password while the withdrawal runs.
    const [approve, withdraw] = await Promise.all([
      qa.post(v1('approve'), APPROVAL),
      analyst.post(v1('withdraw'), { comment: 'Wrong flask.' }),
    ]);
    expect([withdraw.status, approve.status].sort()).toEqual([200, 409]);
    const loser = withdraw.status === 409 ? withdraw : approve;
    expect(loser.body.error.message).toMatch(/meanwhile|only a submitted version|withdrawn from review by its analyst/);
    const reviews = (await t.db('version_reviews').orderBy('id')).map((r: { action: string }) => r.action);
    if (withdraw.status === 200) {
      expect(await statusInDb()).toBe('draft');
      expect(reviews).toEqual(['submitted', 'withdrawn']);
    } else {
      expect(await statusInDb()).toBe('approved');
      expect(reviews).toEqual(['submitted', 'approved']);
    }
  });
});
