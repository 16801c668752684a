import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { preparationDetailSchema, versionDetailSchema } from '../../shared/contracts/preparations';
import { warningText } from '../../shared/contracts/warning-text';
import { canonicalJson } from '../lib/canonical-json';
import { leadPlan, libraryByCode } from '../test-support/demo-plans';
import { buildTestApp, demo, DEMO_PASSWORD, signIn, type Client, type TestApp } from '../test-support/test-app';

const legacy = JSON.parse(
  readFileSync(
    new URL('../../tests/fixtures/snapshots/lead-standard-stored-before-typing.json', import.meta.url),
    'utf8',
  ),
) as {
  snapshotSha256: string;
  snapshotJson: string;
};
const sha256 = (text: string) => createHash('sha256').update(text, 'utf8').digest('hex');

let t: TestApp;
let labId: number;
let analyst: Client;
let preparationId: number;

beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  analyst = await signIn(t.app, demo('analyst'));
  const library = await libraryByCode(analyst, labId);
  preparationId = (
    await analyst
      .post(`/api/labs/${labId}/preparations`, {
        title: 'Pb 100 mg/L intermediate',
        plan: leadPlan(library),
        seed: 20261203,
      })
      .expect(201)
  ).body.id;
});
afterEach(async () => {
  await t.close();
});

const v1 = (path = '') => `/api/labs/${labId}/preparations/${preparationId}/versions/1${path}`;
const storedRow = () => t.db('preparation_versions').where({ preparation_id: preparationId, number: 1 }).first();

describe('a snapshot stored now', () => {
  it('writes an infinite ν_eff as "Infinity" in the stored text its SHA-256 covers, and in the response', async () => {
    const row = await storedRow();
    expect(row.snapshot_json).toContain('"effectiveDegreesOfFreedom":"Infinity"');
    expect(row.snapshot_json).not.toMatch(/"degreesOfFreedom":null/);
    expect(sha256(row.snapshot_json)).toBe(row.snapshot_sha256);
    const res = await analyst.get(v1()).expect(200);
    expect(res.text).toContain('"effectiveDegreesOfFreedom":"Infinity"');
    // What the client's fetcher does with the answer: parse it with the same schema.
    expect(versionDetailSchema.parse(res.body).snapshot?.budget.effectiveDegreesOfFreedom).toBe(Infinity);
  });
});

describe('a snapshot stored before snapshots were typed (tests/fixtures/snapshots)', () => {
  beforeEach(async () => {
    // The row as the earlier code left it: its snapshot text and hash, byte for byte.
    await t
      .db('preparation_versions')
      .where({ preparation_id: preparationId, number: 1 })
      .update({ snapshot_json: legacy.snapshotJson, snapshot_sha256: legacy.snapshotSha256 });
  });

  it('reads through the API, its null ν_eff sent as "Infinity" and parsed by the client schema as ∞', async () => {
    const version = (await analyst.get(v1()).expect(200)).body;
    expect(version.snapshot.budget.effectiveDegreesOfFreedom).toBe('Infinity');
    const parsed = versionDetailSchema.parse(version);
    expect(parsed.snapshot?.budget.effectiveDegreesOfFreedom).toBe(Infinity);
    expect(parsed.snapshotSha256).toBe(legacy.snapshotSha256);
    const detail = preparationDetailSchema.parse(
      (await analyst.get(`/api/labs/${labId}/preparations/${preparationId}`).expect(200)).body,
    );
    expect(detail.current.snapshot?.budget.rows.length).toBeGreaterThan(5);
  });

  it('is never rewritten: it verifies, can be approved, and its download hashes to the stored SHA-256', async () => {
    expect((await analyst.get(v1('/verify')).expect(200)).body.intact).toBe(true);
    await analyst.post(v1('/submit'), {}).expect(200);
    const qa = await signIn(t.app, demo('qa'));
    await qa.post(v1('/approve'), { password: DEMO_PASSWORD, statement: 'Reviewed against SOP-CHEM-014.' }).expect(200);
    const verified = (await qa.get(v1('/verify')).expect(200)).body;
    expect(verified).toMatchObject({ intact: true, computedSha256: legacy.snapshotSha256 });
    expect((await storedRow()).snapshot_json).toBe(legacy.snapshotJson);
    // Anyone can recompute the hash from the download: its snapshot is the stored document, null and all.
    const download = (await qa.get(v1('/snapshot.json')).expect(200)).body;
    expect(download.snapshot.budget.effectiveDegreesOfFreedom).toBeNull();
    expect(canonicalJson(download.snapshot)).toBe(legacy.snapshotJson);
    expect(sha256(canonicalJson(download.snapshot))).toBe(download.snapshotSha256);
  });
});

describe('a snapshot stored while warnings were sentences (tests/fixtures/snapshots)', () => {
  const withTextWarnings = JSON.parse(
    readFileSync(
      new URL('../../tests/fixtures/snapshots/lead-standard-stored-with-text-warnings.json', import.meta.url),
      'utf8',
    ),
  ) as { snapshotSha256: string; snapshotJson: string };
  const storedSentence = (JSON.parse(withTextWarnings.snapshotJson) as { warnings: string[] }).warnings[0];

  beforeEach(async () => {
    await t
      .db('preparation_versions')
      .where({ preparation_id: preparationId, number: 1 })
      .update({ snapshot_json: withTextWarnings.snapshotJson, snapshot_sha256: withTextWarnings.snapshotSha256 });
  });

  it('reads through the API and the client schema, each sentence a warning whose words are the stored text', async () => {
    expect(storedSentence).toMatch(/^Step 1: 0\.1599 g is below the minimum weight of Balance BAL-04/);
    const parsed = versionDetailSchema.parse((await analyst.get(v1()).expect(200)).body);
    const recorded = { code: 'recordedText', params: { text: storedSentence } };
    expect(parsed.snapshot?.warnings).toEqual([recorded]);
    expect(parsed.snapshot?.budget.warnings).toEqual([recorded]);
    expect(parsed.snapshot?.warnings.map(warningText)).toEqual([storedSentence]);
  });

  it('is never rewritten: it verifies, and its download is the stored text', async () => {
    expect((await analyst.get(v1('/verify')).expect(200)).body).toMatchObject({
      intact: true,
      computedSha256: withTextWarnings.snapshotSha256,
    });
    const download = (await analyst.get(v1('/snapshot.json')).expect(200)).body;
    expect(download.snapshot.warnings).toEqual([storedSentence]);
    expect(canonicalJson(download.snapshot)).toBe(withTextWarnings.snapshotJson);
  });
});
