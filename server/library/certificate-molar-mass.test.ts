import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { libraryRepository } from './library-repository';
import { buildTestApp, countRows, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

/** An invented lot of potassium dichromate; CIAAW 2021 atomic weights give M(K2Cr2O7) = 294.18 g/mol. */
const dichromate = {
  code: 'T-RM-CR',
  name: 'Potassium dichromate, certified purity',
  lot: 'L-0415',
  supplier: 'Invented supplier',
  expiresOn: '2027-11-30',
  hazardNotes: 'Toxic; oxidiser.',
  formula: 'K2Cr2O7',
  analyte: 'Cr',
  purity: 0.9998,
  purityUncertainty: { shape: 'normal', expandedUncertainty: 0.0002, coverageFactor: 2 },
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
const create = (data: Record<string, unknown>) => qa.post(url('/equipment'), { kind: 'solid-material', data });

describe('the certificate molar mass is checked against the formula (CIAAW 2021; 0.05 %, common practice)', () => {
  it('refuses a molar mass 0.11 % away from the formula’s, naming both numbers, and stores nothing', async () => {
    const before = await countRows(t.db('equipment_items'));
    const res = await create({ ...dichromate, certificateMolarMassGPerMol: 294.5 }).expect(400);
    expect(res.body.error.details).toEqual([expect.objectContaining({ path: 'data.certificateMolarMassGPerMol' })]);
    expect(res.body.error.details[0].message).toMatch(/gives 294\.18 g\/mol but the certificate states 294\.50 g\/mol/);
    expect(res.body.error.details[0].message).toMatch(/differ by 0\.11 %, more than the 0\.050 % allowed/);
    expect(await countRows(t.db('equipment_items'))).toBe(before);
  });

  it('refuses a hydrate typed without its water (CuSO4 for the pentahydrate, 249.69 g/mol)', async () => {
    const res = await create({
      ...dichromate,
      code: 'T-RM-CU',
      formula: 'CuSO4',
      analyte: 'Cu',
      certificateMolarMassGPerMol: 249.69,
    }).expect(400);
    expect(res.body.error.details[0].message).toMatch(/gives 159\.61 g\/mol but the certificate states 249\.69 g\/mol/);
  });

  it('accepts the certificate’s value within 0.05 %, and a lead salt within the span of the CIAAW Pb interval', async () => {
    const ok = (await create({ ...dichromate, certificateMolarMassGPerMol: 294.185 }).expect(201)).body;
    expect(ok.current.data.certificateMolarMassGPerMol).toBe(294.185);
    // Handbooks print 331.2 g/mol for Pb(NO3)2 with the conventional Pb 207.2; CIAAW 2021's midpoint gives 331.05,
    // and Pb anywhere in [206.14, 207.94] moves M by up to ±0.90 g/mol, so 331.2 is accepted.
    await create({
      ...dichromate,
      code: 'T-RM-PB',
      formula: 'Pb(NO3)2',
      analyte: 'Pb',
      certificateMolarMassGPerMol: 331.2,
    }).expect(201);
  });

  it('refuses a 0 typed for O with the suggestion ("K2Cr207" read as Cr × 207)', async () => {
    const res = await create({ ...dichromate, formula: 'K2Cr207' }).expect(400);
    expect(res.body.error.details[0].message).toMatch(/Did you mean "K2Cr2O7"\?/);
  });
});

describe('atomic weights per lot in the library (CIAAW; Possolo et al. 2018, from memory)', () => {
  const lead = { ...dichromate, code: 'T-RM-PB2', formula: 'Pb(NO3)2', analyte: 'Pb' };
  it('stores the lot’s atomic weight of the analyte with its U, k and source', async () => {
    const data = {
      ...lead,
      analyteAtomicWeightGPerMol: 207.21,
      analyteAtomicWeightExpandedUncertaintyGPerMol: 0.02,
      analyteAtomicWeightCoverageFactor: 2,
      compositionSource: 'certificate lot 2291, isotopic analysis',
    };
    const item = (await create(data).expect(201)).body;
    expect(item.current.data).toMatchObject({ analyteAtomicWeightGPerMol: 207.21, certificateMolarMassGPerMol: null });
  });

  it('refuses an atomic weight without its uncertainty or source, and both lot values in the model at once', async () => {
    const bare = await create({ ...lead, analyteAtomicWeightGPerMol: 207.21 }).expect(400);
    expect(bare.body.error.details[0].message).toMatch(/expanded uncertainty with its coverage factor k/);
    const unsourced = await create({
      ...lead,
      analyteAtomicWeightGPerMol: 207.21,
      analyteAtomicWeightExpandedUncertaintyGPerMol: 0.02,
      analyteAtomicWeightCoverageFactor: 2,
    }).expect(400);
    expect(unsourced.body.error.details[0].message).toMatch(/Say where the value comes from/);
    const both = await create({
      ...lead,
      analyteAtomicWeightGPerMol: 207.21,
      analyteAtomicWeightExpandedUncertaintyGPerMol: 0.02,
      analyteAtomicWeightCoverageFactor: 2,
      certificateMolarMassGPerMol: 331.22,
      certificateMolarMassExpandedUncertaintyGPerMol: 0.04,
      certificateMolarMassCoverageFactor: 2,
      compositionSource: 'certificate lot 2291',
    }).expect(400);
    expect(both.body.error.details[0].message).toMatch(/not both/);
  });
});

describe('CSV of solid materials with the certificate columns', () => {
  it('exports the new columns, and an old file without them re-imports as unchanged', async () => {
    const exported = (await qa.get(url('/equipment-csv/export?kind=solid-material')).expect(200)).text;
    const [header, ...lines] = exported.trim().split('\n');
    expect(header.split(',')).toEqual(
      expect.arrayContaining([
        'certificate_molar_mass_g_per_mol',
        'analyte_atomic_weight_g_per_mol',
        'composition_source',
      ]),
    );
    expect(lines.length).toBeGreaterThan(0);
    const again = async (csv: string) =>
      (await qa.post(url('/equipment-csv/import'), { kind: 'solid-material', csv, dryRun: true }).expect(200)).body
        .rows as { action: string; errors: unknown[] }[];
    const roundTrip = await again(exported);
    expect(roundTrip.length).toBeGreaterThan(0);
    expect(new Set(roundTrip.map((row) => row.action))).toEqual(new Set(['unchanged']));
    // A file as written before these columns existed (an invented lot; cells without commas).
    const old = [
      'code,description,certificate_reference,name,lot,supplier,expires_on,hazard_notes,formula,analyte,purity,purity_uncertainty_shape,purity_expanded_uncertainty,purity_coverage_factor,purity_half_width',
      'T-RM-OLD,,C-1,Potassium dichromate,L-0416,Invented supplier,2027-11-30,Toxic,K2Cr2O7,Cr,0.9998,normal,0.0002,2,',
    ].join('\n');
    const first = await qa
      .post(url('/equipment-csv/import'), { kind: 'solid-material', csv: old, dryRun: false })
      .expect(200);
    expect(first.body.rows.map((row: { action: string }) => row.action)).toEqual(['create']);
    const item = (await qa.get(url('/equipment')).expect(200)).body.find(
      (candidate: { code: string }) => candidate.code === 'T-RM-OLD',
    );
    expect(item.current.data.certificateMolarMassGPerMol).toBeNull();
    expect((await again(old)).map((row) => row.action)).toEqual(['unchanged']);
    // A revision stored before the columns existed has none of the new fields; it reads as the same data.
    const stored = Object.fromEntries(
      Object.entries(item.current.data as Record<string, unknown>).filter(
        ([key]) => !/^(certificateMolarMass|analyteAtomicWeight|compositionSource)/.test(key),
      ),
    );
    expect(Object.keys(stored)).not.toContain('certificateMolarMassGPerMol');
    const qaId = (
      await t
        .db('users')
        .where({ email: demo('qa') })
        .first()
    ).id;
    await t.db.transaction((trx) =>
      libraryRepository(trx).appendRevision(
        item.id,
        {
          data: stored,
          reason: 'as stored before',
          createdAt: '2026-11-01T00:00:00.000Z',
          createdBy: qaId,
          code: 'T-RM-OLD',
        },
        trx,
      ),
    );
    expect((await again(old)).map((row) => row.action)).toEqual(['unchanged']);
  });
});
