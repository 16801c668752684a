import { createHash } from 'node:crypto';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { approvedLeadStandard, leadPlan, libraryByCode } from '../test-support/demo-plans';
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
const version = (number: number, action: string) => url(`/preparations/${preparationId}/versions/${number}/${action}`);

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  qa = await signIn(t.app, demo('qa'));
  preparationId = await approvedLeadStandard(analyst, qa, labId, DEMO_PASSWORD);
});
afterEach(async () => {
  await t.close();
});

/** Starts version 2 and renames the preparation there (its title and analyte change). */
async function renameInVersionTwo() {
  await analyst.post(url(`/preparations/${preparationId}/versions`), {}).expect(201);
  const library = await libraryByCode(analyst, labId);
  const plan = {
    ...leadPlan(library),
    title: 'Se plan',
    analyte: { ...(leadPlan(library).analyte as object), formula: 'Se' },
  };
  await analyst.agent
    .put(version(2, '').slice(0, -1))
    .set('x-csrf-token', analyst.token)
    .send({ title: 'Renamed working standard', plan })
    .expect(200);
  await t.db('labs').where({ id: labId }).update({ name: 'Renamed Lab' });
}

describe('an approved version keeps what it showed when it was signed', () => {
  it('keeps its title and analyte in the approved list, its search and its record after v2 is renamed', async () => {
    await renameInVersionTwo();
    const records = (await qa.get(url('/approved-records')).expect(200)).body;
    expect(records).toEqual([
      expect.objectContaining({ preparationId, versionNumber: 1, title: 'Pb check standard', analyte: 'Pb' }),
    ]);
    expect((await qa.get(url('/approved-records?q=Pb%20check')).expect(200)).body).toHaveLength(1);
    expect((await qa.get(url('/approved-records?q=Renamed')).expect(200)).body).toHaveLength(0);
    const v1 = (await qa.get(url(`/preparations/${preparationId}/versions/1`)).expect(200)).body;
    expect(v1.approvedAs).toEqual({
      title: 'Pb check standard',
      analyte: 'Pb',
      preparationName: 'Pb 100 mg/L intermediate',
      labName: 'Wellmere Regional Water Laboratory',
    });
  });

  it('prints the frozen title and lab name in the PDF of the approved version', async () => {
    await renameInVersionTwo();
    const pdf = await qa
      .get(version(1, 'record.pdf'))
      .buffer(true)
      .parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      })
      .expect(200);
    const info = (pdf.body as Buffer).toString('latin1');
    // The document's Title and Author entries are the frozen ones (pdfkit writes non-ASCII text as UTF-16BE with a byte-order mark).
    const utf16 = (s: string) => Buffer.from(`\ufeff${s}`, 'utf16le').swap16().toString('latin1');
    const has = (s: string) => info.includes(`(${s})`) || info.includes(`(${utf16(s)})`);
    expect(has('Pb check standard — version 1')).toBe(true);
    expect(has('Renamed working standard — version 1')).toBe(false);
    expect(has('Wellmere Regional Water Laboratory')).toBe(true);
    expect(has('Renamed Lab')).toBe(false);
  });

  it('covers the frozen fields by the signed hash, so editing them breaks verify', async () => {
    const ok = (await qa.get(version(1, 'verify')).expect(200)).body;
    expect(ok.intact).toBe(true);
    expect(ok.record).toMatchObject({ storedSha256: expect.stringMatching(/^[0-9a-f]{64}$/) });
    expect(ok.record.computedSha256).toBe(ok.record.storedSha256);
    expect(ok.record.approvedSha256).toBe(ok.record.storedSha256);
    // The download carries what the hash covers, so anyone can recompute it outside Dilutrace.
    const download = (await qa.get(version(1, 'snapshot.json')).expect(200)).body;
    expect(download).toMatchObject({
      recordSha256: ok.record.storedSha256,
      approvedAs: { title: 'Pb check standard', labName: 'Wellmere Regional Water Laboratory' },
    });
    const recomputed = createHash('sha256')
      .update(
        `{"approvedAs":${JSON.stringify({ analyte: download.approvedAs.analyte, labName: download.approvedAs.labName, preparationName: download.approvedAs.preparationName, title: download.approvedAs.title })},"format":"dilutrace-approved-record/2","snapshotSha256":"${download.snapshotSha256}"}`,
      )
      .digest('hex');
    expect(recomputed).toBe(download.recordSha256);
    await dropTrigger(t.db, 'preparation_versions_approved_no_update', 'preparation_versions');
    await t
      .db('preparation_versions')
      .where({ preparation_id: preparationId, number: 1 })
      .update({ approved_title: 'Forged title' });
    const bad = (await qa.get(version(1, 'verify')).expect(200)).body;
    expect(bad.intact).toBe(false);
    expect(bad.message).toMatch(/title, analyte, preparation name or lab name/);
  });

  it('still reads and verifies an approved version stored before the fields were frozen', async () => {
    // As a version approved before this release: no frozen fields, no record hash in the version or its approval.
    await dropTrigger(t.db, 'preparation_versions_approved_no_update', 'preparation_versions');
    await dropTrigger(t.db, 'version_reviews_no_update', 'version_reviews');
    await t.db('version_reviews').update({ record_sha256: null });
    await t.db('preparation_versions').where({ preparation_id: preparationId, number: 1 }).update({
      approved_title: null,
      approved_analyte: null,
      approved_preparation_name: null,
      approved_lab_name: null,
      record_sha256: null,
    });
    const old = (await qa.get(version(1, 'verify')).expect(200)).body;
    expect(old.intact).toBe(true);
    expect(old.record).toBeNull();
    const v1 = (await qa.get(url(`/preparations/${preparationId}/versions/1`)).expect(200)).body;
    expect(v1.approvedAs).toBeNull();
    expect((await qa.get(url('/approved-records')).expect(200)).body[0].title).toBe('Pb check standard');
  });
});
