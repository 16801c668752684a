import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { buildTestApp, countRows, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

const fixtures = join(import.meta.dirname, '..', '..', 'tests', 'fixtures', 'library');

/** An invented class A 100 mL flask; its ± 0.10 mL is ISO 1042:1998 class A for 100 mL (read from a national verification table identical to it). */
const flask100 = {
  code: 'T-VF-100',
  description: '100 mL one-mark flask',
  nominalMl: 100,
  glassClass: 'A',
  toleranceMl: 0.1,
  toleranceDistribution: null,
  fillRepeatabilityMl: 0.02,
  calibrationTemperatureC: 20,
};

/** An invented five-place balance. */
const balance = {
  code: 'T-BAL-1',
  description: 'Five-place analytical balance',
  capacityG: 220,
  readabilityG: 0.00001,
  repeatabilityG: 0.00002,
  linearityG: 0.00005,
  sensitivityRelativeExpanded: 0.000002,
  sensitivityCoverageFactor: 2,
  calibratedOn: '2026-06-01',
  calibrationDueOn: '2026-12-20',
};

let t: TestApp;
let labId: number;
let qa: Client;
beforeEach(async () => {
  t = await buildTestApp();
  labId = (await t.db('labs').first()).id;
  qa = await signIn(t.app, demo('qa'));
});
afterEach(async () => {
  await t.close();
});

const url = (path: string) => `/api/labs/${labId}${path}`;

describe('library items and roles', () => {
  it('lets QA and admin add items; analysts and auditors read but cannot change', async () => {
    const created = await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201);
    expect(created.body.current.number).toBe(1);
    const admin = await signIn(t.app, demo('admin'));
    await admin.post(url('/equipment'), { kind: 'balance', data: balance }).expect(201);
    for (const who of ['analyst', 'auditor'] as const) {
      const client = await signIn(t.app, demo(who));
      const list = (await client.get(url('/equipment')).expect(200)).body as { code: string }[];
      expect(list.map((i) => i.code)).toEqual(expect.arrayContaining(['T-BAL-1', 'T-VF-100']));
      await client.get(url(`/equipment/${created.body.id}`)).expect(200);
      await client.post(url('/equipment'), { kind: 'flask', data: { ...flask100, code: 'X' } }).expect(403);
      await client.agent
        .put(url(`/equipment/${created.body.id}`))
        .set('x-csrf-token', client.token)
        .send({ data: flask100, reason: 'try' })
        .expect(403);
      await client.post(url(`/equipment/${created.body.id}/retire`), { reason: 'try it' }).expect(403);
    }
  });

  it('computes the USP <41> minimum weight of a balance and flags a calibration due within 30 days', async () => {
    const res = await qa.post(url('/equipment'), { kind: 'balance', data: balance }).expect(201);
    // USP <41> Weights and Balances (read): m_min = 2000 · max(s, 0.41·d) = 2000 · 0.00002 g = 0.04 g.
    expect(res.body.minimumWeightG).toBeCloseTo(0.04, 12);
    // The test clock stands at 2026-12-02; due 2026-12-20 is within the 30-day warning.
    expect(res.body.calibration).toBe('due-soon');
    t.clock.advance(20 * 86_400_000);
    qa = await signIn(t.app, demo('qa'));
    const later = (await qa.get(url(`/equipment/${res.body.id}`)).expect(200)).body;
    expect(later.calibration).toBe('overdue');
    expect(later.flags[0]).toMatch(/Calibration overdue since 2026-12-20/);
  });

  it('names the field and says what is wrong for bad data', async () => {
    const res = await qa
      .post(url('/equipment'), { kind: 'flask', data: { ...flask100, toleranceMl: -0.1 } })
      .expect(400);
    expect(res.body.error.details[0].path).toBe('data.toleranceMl');
    expect(res.body.error.details[0].message).toMatch(/greater than zero/);
    const clash = await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201);
    expect(clash.body.code).toBe('T-VF-100');
    const again = await qa
      .post(url('/equipment'), { kind: 'flask', data: { ...flask100, code: 't-vf-100' } })
      .expect(409);
    expect(again.body.error.code).toBe('code_taken');
  });
});

describe('revisions, not overwrites', () => {
  it('keeps the old revision readable and unchanged when an item is edited', async () => {
    const created = (await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201)).body;
    const firstRevisionId = created.current.id;
    const before = await t.db('equipment_revisions').where({ id: firstRevisionId }).first();

    await qa.agent
      .put(url(`/equipment/${created.id}`))
      .set('x-csrf-token', qa.token)
      .send({ data: { ...flask100, fillRepeatabilityMl: 0.03 } })
      .expect(400);
    const revised = (
      await qa.agent
        .put(url(`/equipment/${created.id}`))
        .set('x-csrf-token', qa.token)
        .send({ data: { ...flask100, fillRepeatabilityMl: 0.03 }, reason: 'New fill check, Nov 2026' })
        .expect(200)
    ).body;
    expect(revised.current.number).toBe(2);
    expect(revised.revisions.map((r: { number: number }) => r.number)).toEqual([2, 1]);
    expect(revised.revisions[0]).toMatchObject({ reason: 'New fill check, Nov 2026', createdBy: 'Imogen Tasker' });

    const first = (await qa.get(url(`/equipment/${created.id}/revisions/1`)).expect(200)).body;
    expect(first.data.fillRepeatabilityMl).toBe(0.02);
    expect(await t.db('equipment_revisions').where({ id: firstRevisionId }).first()).toEqual(before);
    await expect(
      t.db('equipment_revisions').where({ id: firstRevisionId }).update({ reason: 'tamper' }),
    ).rejects.toThrow(/immutable/);
    expect((await t.db('audit_events').where({ action: 'library.revised' })).length).toBe(1);
  });

  it('retires an item: it leaves the active list, stays readable, and cannot be revised', async () => {
    const created = (await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201)).body;
    const retired = (await qa.post(url(`/equipment/${created.id}/retire`), { reason: 'Chipped neck' }).expect(200))
      .body;
    expect(retired.status).toBe('retired');
    const active = (await qa.get(url('/equipment?kind=flask')).expect(200)).body as { code: string }[];
    expect(active.map((i) => i.code)).not.toContain('T-VF-100');
    expect((await qa.get(url('/equipment?status=retired')).expect(200)).body[0].flags).toContain(
      'Retired: Chipped neck',
    );
    await qa.agent
      .put(url(`/equipment/${created.id}`))
      .set('x-csrf-token', qa.token)
      .send({ data: flask100, reason: 'fix' })
      .expect(409);
  });

  it('flags an expired reference material', async () => {
    const material = {
      code: 'T-RM-PB',
      name: 'Lead(II) nitrate, certified purity',
      lot: 'L-2291',
      supplier: 'Invented supplier',
      expiresOn: '2026-11-30',
      hazardNotes: 'Toxic; oxidiser.',
      formula: 'Pb(NO3)2',
      analyte: 'Pb',
      purity: 0.9998,
      purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
    };
    const res = (await qa.post(url('/equipment'), { kind: 'solid-material', data: material }).expect(201)).body;
    expect(res.expiry).toBe('expired');
    expect(res.flags).toContain('Expired on 2026-11-30');
  });

  it('refuses a mistyped formula where it is typed, in the words the planner would use, and stores nothing', async () => {
    const material = {
      code: 'T-RM-TYPO',
      name: 'Lead(II) nitrate',
      lot: 'L-2292',
      supplier: 'Invented supplier',
      expiresOn: '2027-11-30',
      hazardNotes: '',
      analyte: 'Pb',
      purity: 0.9998,
      purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
    };
    const before = await t.db('equipment_items').count({ n: '*' }).first();
    for (const [formula, words] of [
      ['Pb(NO3', /unclosed parenthesis/],
      ['Xx2O', /"Xx" is not an element/],
    ] as const) {
      const res = await qa
        .post(url('/equipment'), { kind: 'solid-material', data: { ...material, formula } })
        .expect(400);
      expect(res.body.error.details).toEqual([expect.objectContaining({ path: 'data.formula' })]);
      expect(res.body.error.details[0].message).toMatch(words);
    }
    expect(await t.db('equipment_items').count({ n: '*' }).first()).toEqual(before);
  });
});

describe('certificates', () => {
  const pdf = Buffer.from('%PDF-1.4\n1 0 obj<<>>endobj\ntrailer<<>>\n%%EOF\n');
  const png = Buffer.from('89504e470d0a1a0a0000000d4948445200000001000000010806000000', 'hex');
  const elf = Buffer.concat([Buffer.from('7f454c46020101000000000000000000', 'hex'), Buffer.alloc(64)]);

  it('stores a PDF under a generated name and serves it as an attachment to lab members only', async () => {
    const item = (await qa.post(url('/equipment'), { kind: 'balance', data: balance }).expect(201)).body;
    const res = await qa.agent
      .post(url(`/equipment/${item.id}/revisions/1/certificates`))
      .set('x-csrf-token', qa.token)
      .attach('file', pdf, { filename: 'calibration 2026.pdf', contentType: 'application/pdf' })
      .expect(201);
    expect(res.body).toMatchObject({
      mediaType: 'application/pdf',
      revisionNumber: 1,
      originalName: 'calibration 2026.pdf',
    });
    const stored = await t.db('certificates').where({ id: res.body.id }).first();
    expect(stored.stored_name).toMatch(/^[0-9a-f-]{36}\.pdf$/);

    const auditor = await signIn(t.app, demo('auditor'));
    const download = await auditor.get(url(`/certificates/${res.body.id}`)).expect(200);
    expect(download.headers['content-disposition']).toMatch(/^attachment/);
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.from(download.body).subarray(0, 5).toString()).toBe('%PDF-');

    await qa.post('/api/auth/logout').expect(204);
    await request(t.app)
      .get(url(`/certificates/${res.body.id}`))
      .expect(401);
  });

  it('refuses a renamed executable and accepts a PNG whatever it is called', async () => {
    const item = (await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201)).body;
    const refused = await qa.agent
      .post(url(`/equipment/${item.id}/revisions/1/certificates`))
      .set('x-csrf-token', qa.token)
      .attach('file', elf, { filename: 'certificate.pdf', contentType: 'application/pdf' })
      .expect(400);
    expect(refused.body.error.code).toBe('unsupported_file_type');
    await qa.agent
      .post(url(`/equipment/${item.id}/revisions/1/certificates`))
      .set('x-csrf-token', qa.token)
      .attach('file', png, { filename: 'scan.txt', contentType: 'text/plain' })
      .expect(201);
    expect(await countRows(t.db('certificates').where({ item_id: item.id }))).toBe(1);
  });

  it('refuses a file over the size limit', async () => {
    const item = (await qa.post(url('/equipment'), { kind: 'flask', data: flask100 }).expect(201)).body;
    const big = Buffer.concat([pdf, Buffer.alloc(10 * 1024 * 1024)]);
    const res = await qa.agent
      .post(url(`/equipment/${item.id}/revisions/1/certificates`))
      .set('x-csrf-token', qa.token)
      .attach('file', big, { filename: 'huge.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
  });
});

describe('CSV import and export', () => {
  it('dry-runs a good file without writing, then imports it in one go, and exports it back', async () => {
    const csv = readFileSync(join(fixtures, 'flasks-good.csv'), 'utf8');
    const dry = (await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv, dryRun: true }).expect(200)).body;
    expect(dry.rows.map((r: { line: number; action: string }) => [r.line, r.action])).toEqual([
      [2, 'create'],
      [3, 'create'],
      [4, 'create'],
    ]);
    const countBefore = await countRows(t.db('equipment_items'));
    expect(await countRows(t.db('equipment_items').whereLike('code', 'VF-IMP-%'))).toBe(0);
    const done = (await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv, dryRun: false }).expect(200)).body;
    expect(done.written).toBe(true);
    expect(await countRows(t.db('equipment_items'))).toBe(countBefore + 3);
    const exported = (await qa.get(url('/equipment-csv/export?kind=flask')).expect(200)).text;
    // The export writes every documented column; the file's (older) column set is part of it.
    const template = (await qa.get(url('/equipment-csv/template?kind=flask')).expect(200)).text;
    expect(exported.split('\n')[0]).toBe(template.split('\n')[0]);
    expect(exported.split('\n')[0].trim().split(',')).toEqual(
      expect.arrayContaining(csv.split('\n')[0].trim().split(',')),
    );
    expect(exported).toContain('VF-IMP-500B');
    const again = (
      await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv: exported, dryRun: true }).expect(200)
    ).body;
    const actions = again.rows.map((r: { action: string }) => r.action);
    expect(actions.length).toBeGreaterThanOrEqual(3 + 11); // the three imported flasks and the demo lab's eleven
    expect(new Set(actions)).toEqual(new Set(['unchanged']));
  });

  it('reports every broken row by line number and writes nothing', async () => {
    const csv = readFileSync(join(fixtures, 'flasks-broken.csv'), 'utf8');
    const dry = (await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv, dryRun: true }).expect(200)).body;
    const byLine = Object.fromEntries(
      dry.rows.map((r: { line: number; errors: { column: string }[] }) => [r.line, r.errors.map((e) => e.column)]),
    );
    expect(byLine[2]).toEqual([]);
    expect(byLine[3]).toEqual(['tolerance_ml']);
    expect(byLine[4]).toEqual(['glass_class']);
    expect(byLine[5]).toEqual(['code']);
    expect(byLine[6]).toEqual(expect.arrayContaining(['nominal_ml', 'calibration_due_on']));
    const refused = await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv, dryRun: false }).expect(400);
    expect(refused.body.error.code).toBe('import_rejected');
    expect(await countRows(t.db('equipment_items').whereLike('code', 'VF-OK-%'))).toBe(0);
  });

  it('reports unknown and missing columns against the header line', async () => {
    const res = (
      await qa
        .post(url('/equipment-csv/import'), { kind: 'balance', csv: 'code,colour\nB-1,red\n', dryRun: true })
        .expect(200)
    ).body;
    expect(res.rows[0].line).toBe(1);
    expect(res.rows[0].errors.map((e: { message: string }) => e.message).join(' ')).toMatch(
      /Unknown column “colour”.*Missing column “capacity_g”/,
    );
  });

  // A balance's repeatability s may say how many readings it came from (Type A, ν = n − 1, JCGM 100:2008 4.2.6).
  it('keeps the readings behind a balance’s repeatability, from the form and from a CSV, and refuses fewer than 2', async () => {
    const plain = (await qa.post(url('/equipment'), { kind: 'balance', data: balance }).expect(201)).body;
    expect(plain.current.data.repeatabilityReadings).toBeNull();
    const counted = (
      await qa
        .post(url('/equipment'), { kind: 'balance', data: { ...balance, code: 'T-BAL-2', repeatabilityReadings: 10 } })
        .expect(201)
    ).body;
    expect(counted.current.data.repeatabilityReadings).toBe(10);
    const refused = await qa
      .post(url('/equipment'), { kind: 'balance', data: { ...balance, code: 'T-BAL-3', repeatabilityReadings: 1 } })
      .expect(400);
    expect(JSON.stringify(refused.body.error)).toMatch(/at least 2 readings/);

    const template = (await qa.get(url('/equipment-csv/template?kind=balance')).expect(200)).text;
    expect(template.trim().split(',')).toContain('repeatability_readings');
    const csv =
      'code,capacity_g,readability_g,repeatability_g,repeatability_readings,linearity_g,sensitivity_relative_expanded,sensitivity_coverage_factor\n' +
      'T-BAL-4,220,0.00001,0.00002,6,0.00005,0.000002,2\n' +
      'T-BAL-5,220,0.00001,0.00002,,0.00005,0.000002,2\n';
    await qa.post(url('/equipment-csv/import'), { kind: 'balance', csv, dryRun: false }).expect(200);
    const list = (await qa.get(url('/equipment')).expect(200)).body as {
      code: string;
      current: { data: { repeatabilityReadings: number | null } };
    }[];
    const readingsOf = (code: string) => list.find((item) => item.code === code)?.current.data.repeatabilityReadings;
    expect(readingsOf('T-BAL-4')).toBe(6);
    expect(readingsOf('T-BAL-5')).toBeNull();
  });

  it('offers a template with the documented columns', async () => {
    const res = await qa.get(url('/equipment-csv/template?kind=piston-pipette')).expect(200);
    expect(res.headers['content-disposition']).toMatch(/attachment/);
    expect(res.text.trim().split(',')).toContain('systematic_error_ul_1');
  });
});

describe('lab policy', () => {
  it('starts from the default, lets QA change it, and refuses others', async () => {
    const initial = (await qa.get(url('/policy')).expect(200)).body;
    expect(initial).toMatchObject({
      coverage: { mode: 'probability', probability: 0.9545 },
      glasswareDistribution: 'triangular',
      updatedAt: null,
    });
    const next = {
      coverage: { mode: 'fixed-k', k: 2 },
      glasswareDistribution: 'rectangular',
      temperatureHalfRangeC: 3,
      minimumWeightRule: true,
    };
    const saved = (await qa.agent.put(url('/policy')).set('x-csrf-token', qa.token).send(next).expect(200)).body;
    expect(saved).toMatchObject({ ...next, updatedBy: 'Imogen Tasker' });
    const analyst = await signIn(t.app, demo('analyst'));
    await analyst.agent.put(url('/policy')).set('x-csrf-token', analyst.token).send(next).expect(403);
    const bad = await qa.agent
      .put(url('/policy'))
      .set('x-csrf-token', qa.token)
      .send({ ...next, coverage: { mode: 'probability', probability: 0.9 } })
      .expect(400);
    expect(bad.body.error.details[0].path).toMatch(/^coverage/);
  });
});
