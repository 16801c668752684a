import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { leadPlan, libraryByCode, plannedLeadStandard } from '../test-support/demo-plans';
import {
  buildTestApp,
  demo,
  DEMO_PASSWORD,
  dropTrigger,
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

const mailTo = async (address: string) =>
  (await t.db('outbox').orderBy('id', 'desc')).filter((m: { to_address: string }) => m.to_address.includes(address));

describe('draft → submitted → approved or returned', () => {
  it('lets only the owning analyst submit, and e-mails QA with a link to the record', async () => {
    for (const who of ['qa', 'auditor', 'analyst2'] as const) {
      const client = who === 'qa' ? qa : await signIn(t.app, demo(who));
      expect((await client.post(v1('submit'), {})).status, who).toBe(403);
    }
    const res = await analyst.post(v1('submit'), { comment: 'For the Friday calibration run' }).expect(200);
    expect(res.body.current.status).toBe('submitted');
    expect(res.body.current.editable).toBe(false);
    const [mail] = await mailTo(demo('qa'));
    expect(mail.subject).toBe('Review requested: Pb check standard (version 1)');
    expect(mail.text_body).toContain(`http://dilutrace.test/records/${preparationId}/v/1`);
    expect(mail.html_body).toContain('<a href=');
    await analyst.post(v1('submit'), {}).expect(409);
    const queue = (await qa.get(url('/review-queue')).expect(200)).body;
    expect(queue).toEqual([
      expect.objectContaining({
        preparationId,
        versionNumber: 1,
        submittedBy: 'Dev Okonjo',
        comment: 'For the Friday calibration run',
      }),
    ]);
    await analyst.get(url('/review-queue')).expect(403);
  });

  it('returns with comments to an editable version the analyst can change and resubmit', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    await qa.post(v1('return'), { comment: 'x' }).expect(400);
    const returned = (
      await qa.post(v1('return'), { comment: 'Use the five-place balance for masses below 0.3 g.' }).expect(200)
    ).body;
    expect(returned.current.status).toBe('returned');
    expect(returned.current.editable).toBe(true);
    expect(returned.current.reviews.map((r: { action: string }) => r.action)).toEqual(['submitted', 'returned']);
    expect(returned.current.reviews[1].comment).toMatch(/five-place/);
    const [mail] = await mailTo(demo('analyst'));
    expect(mail.subject).toBe('Returned: Pb check standard (version 1)');
    const library = await libraryByCode(analyst, labId);
    await analyst.agent
      .put(url(`/preparations/${preparationId}/versions/1`))
      .set('x-csrf-token', analyst.token)
      .send({ title: 'Pb check standard', plan: leadPlan(library) })
      .expect(200);
    await analyst.post(v1('submit'), {}).expect(200);
  });

  it('approves only with the reviewer’s password and never by the submitter', async () => {
    await analyst.post(v1('submit'), {}).expect(200);
    const wrong = await qa
      .post(v1('approve'), { password: 'not-my-password', statement: 'Reviewed against SOP-CHEM-014.' })
      .expect(400);
    expect(wrong.body.error.details[0].path).toBe('password');
    expect((await t.db('preparation_versions').where({ preparation_id: preparationId }).first()).status).toBe(
      'submitted',
    );
    const approved = (
      await qa.post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Reviewed against SOP-CHEM-014.' }).expect(200)
    ).body;
    expect(approved.current.status).toBe('approved');
    const approval = approved.current.reviews.find((r: { action: string }) => r.action === 'approved');
    expect(approval).toMatchObject({
      actor: 'Imogen Tasker',
      comment: 'Reviewed against SOP-CHEM-014.',
      snapshotSha256: approved.current.snapshotSha256,
    });
    expect((await mailTo(demo('analyst')))[0].subject).toBe('Approved: Pb check standard (version 1)');
    const actions = (await t.db('audit_events').where({ entity_type: 'preparation' }).orderBy('id')).map(
      (e: { action: string }) => e.action,
    );
    expect(actions).toEqual([
      'preparation.created',
      'preparation.submitted',
      'preparation.approval_refused',
      'preparation.approved',
    ]);
  });

  it('refuses self-approval by a QA member who submitted', async () => {
    // A person holding both roles plans and submits, then tries to approve their own work.
    const user = await t
      .db('users')
      .where({ email: demo('qa') })
      .first();
    await t
      .db('memberships')
      .insert({ user_id: user.id, lab_id: labId, role: 'analyst', created_at: new Date().toISOString() });
    qa = await signIn(t.app, demo('qa'));
    const library = await libraryByCode(qa, labId);
    const own = (await qa.post(url('/preparations'), { title: 'QA own plan', plan: leadPlan(library) }).expect(201))
      .body.id;
    await qa.post(url(`/preparations/${own}/versions/1/submit`), {}).expect(200);
    const res = await qa
      .post(url(`/preparations/${own}/versions/1/approve`), { password: DEMO_PASSWORD, statement: 'Looks fine to me.' })
      .expect(403);
    expect(res.body.error.message).toMatch(/another member of QA/);
  });
});

describe('an approved version never changes', () => {
  async function approve() {
    await analyst.post(v1('submit'), {}).expect(200);
    await qa.post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Approved for use.' }).expect(200);
    return t.db('preparation_versions').where({ preparation_id: preparationId, number: 1 }).first();
  }

  it('refuses edits, recompute, resubmission and review, leaving the row byte-identical', async () => {
    const before = await approve();
    const library = await libraryByCode(analyst, labId);
    await analyst.agent
      .put(url(`/preparations/${preparationId}/versions/1`))
      .set('x-csrf-token', analyst.token)
      .send({ title: 'Changed', plan: leadPlan(library, { aliquotFlask: 'VF-200-A' }) })
      .expect(409);
    await analyst.post(v1('submit'), {}).expect(409);
    await qa.post(v1('return'), { comment: 'Changed my mind.' }).expect(409);
    await expect(
      t.db('preparation_versions').where({ id: before.id }).update({ result_statement: 'tampered' }),
    ).rejects.toThrow(/immutable/);
    await expect(t.db('preparation_versions').where({ id: before.id }).delete()).rejects.toThrow(/immutable/);
    expect(await t.db('preparation_versions').where({ id: before.id }).first()).toEqual(before);
  });

  it('takes changes into a new draft version', async () => {
    await approve();
    const next = (await analyst.post(url(`/preparations/${preparationId}/versions`), {}).expect(201)).body;
    expect(next.versions.map((v: { number: number; status: string }) => [v.number, v.status])).toEqual([
      [2, 'draft'],
      [1, 'approved'],
    ]);
  });

  it('verifies the snapshot hash and detects a tampered row', async () => {
    const row = await approve();
    const ok = (await analyst.get(v1('verify')).expect(200)).body;
    expect(ok).toMatchObject({
      intact: true,
      approvedSha256: row.snapshot_sha256,
      computedSha256: createHash('sha256').update(row.snapshot_json).digest('hex'),
    });
    // Someone with direct database access drops the guard and edits the stored result.
    await dropTrigger(t.db, 'preparation_versions_approved_no_update', 'preparation_versions');
    await t
      .db('preparation_versions')
      .where({ id: row.id })
      .update({ snapshot_json: row.snapshot_json.replace('"value":', '"value":1e-9+') });
    const bad = (await analyst.get(v1('verify')).expect(200)).body;
    expect(bad.intact).toBe(false);
    expect(bad.message).toMatch(/does NOT match/);
  });

  it('lists approved records for auditors, with the snapshot JSON to download', async () => {
    await approve();
    const auditor = await signIn(t.app, demo('auditor'));
    const records = (await auditor.get(url('/approved-records?q=Pb')).expect(200)).body;
    expect(records).toEqual([
      expect.objectContaining({ preparationId, versionNumber: 1, analyst: 'Dev Okonjo', approvedBy: 'Imogen Tasker' }),
    ]);
    const download = await auditor.get(v1('snapshot.json')).expect(200);
    expect(download.headers['content-disposition']).toMatch(/attachment/);
    expect(download.body.snapshotSha256).toBe(records[0].snapshotSha256);
    await auditor.post(v1('approve'), { password: DEMO_PASSWORD, statement: 'Auditors cannot.' }).expect(403);
  });
});
