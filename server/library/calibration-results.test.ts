import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import type { EquipmentItem } from '../../shared/contracts/library';
import { plannedLeadStandard } from '../test-support/demo-plans';
import { buildTestApp, demo, signIn, type Client, type TestApp } from '../test-support/test-app';

const fixtures = join(import.meta.dirname, '..', '..', 'tests', 'fixtures', 'library');

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

/** The demo flask VF-100-A with a calibration: +0.03 mL, U = 0.02 mL, k = 2 (an invented certificate). */
async function calibrateDemoFlask(): Promise<EquipmentItem> {
  const items = (await qa.get(url('/equipment?kind=flask')).expect(200)).body as EquipmentItem[];
  const flask = items.find((item) => item.code === 'VF-100-A')!;
  expect(flask.current.data.calibrationCorrectionMl ?? null).toBeNull();
  return (
    await qa.agent
      .put(url(`/equipment/${flask.id}`))
      .set('x-csrf-token', qa.token)
      .send({
        data: {
          ...flask.current.data,
          certificateReference: 'WL-CAL-2291',
          calibratedOn: '2026-11-02',
          calibrationDueOn: '2027-11-02',
          calibrationCorrectionMl: 0.03,
          calibrationExpandedUncertaintyMl: 0.02,
          calibrationCoverageFactor: 2,
        },
        reason: 'Gravimetric calibration, Nov 2026',
      })
      .expect(200)
  ).body as EquipmentItem;
}

describe('calibration results in the library (JCGM 100:2008 4.3.3: U with k is normal, u = U/k)', () => {
  it('stores a flask’s calibration and the planner’s budget applies it in place of the class tolerance', async () => {
    const revised = await calibrateDemoFlask();
    expect(revised.current.data).toMatchObject({
      calibrationCorrectionMl: 0.03,
      calibrationExpandedUncertaintyMl: 0.02,
    });
    const analyst = await signIn(t.app, demo('analyst'));
    const id = await plannedLeadStandard(analyst, labId);
    const version = (await analyst.get(url(`/preparations/${id}/versions/1`)).expect(200)).body as {
      snapshot: {
        budget: { rows: { label: string; category: string; standardUncertainty: number; estimate: number }[] };
      };
    };
    const rows = version.snapshot.budget.rows.filter((row) => row.label.includes('VF-100-A'));
    expect(rows.map((row) => row.category)).not.toContain('volumetricTolerance');
    const calibration = rows.find((row) => row.category === 'calibrationCorrection');
    expect(calibration?.label).toBe(
      'Flask VF-100-A (100 mL): calibration correction +0.03 mL (certificate WL-CAL-2291, 2026-11-02)',
    );
    expect(calibration?.estimate).toBe(0.03);
    expect(calibration?.standardUncertainty).toBeCloseTo(0.01, 15);
  });

  it('refuses a correction without its U, k and date, in plain words', async () => {
    const created = await qa
      .post(url('/equipment'), {
        kind: 'flask',
        data: {
          code: 'T-VF-50',
          nominalMl: 50,
          glassClass: 'A',
          toleranceMl: 0.06,
          fillRepeatabilityMl: 0.01,
          calibrationCorrectionMl: -0.01,
        },
      })
      .expect(400);
    expect(created.body.error.details[0].message).toMatch(
      /calibration correction with its U, its k and the calibration date/,
    );
  });

  it('exports the calibration in its CSV columns and imports the export unchanged; an old CSV still imports', async () => {
    await calibrateDemoFlask();
    const exported = (await qa.get(url('/equipment-csv/export?kind=flask')).expect(200)).text;
    const header = exported.split('\n')[0].trim().split(',');
    expect(header).toEqual(
      expect.arrayContaining([
        'calibration_correction_ml',
        'calibration_expanded_uncertainty_ml',
        'calibration_coverage_factor',
      ]),
    );
    const line = exported.split('\n').find((row) => row.startsWith('VF-100-A,'))!;
    // correction, U and k sit side by side in the column set.
    expect(line).toContain(',0.03,0.02,2,');
    const again = (
      await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv: exported, dryRun: true }).expect(200)
    ).body as { rows: { code: string; action: string }[] };
    expect(again.rows.find((row) => row.code === 'VF-100-A')?.action).toBe('unchanged');
    // A file written before the calibration columns existed (tests/fixtures/library/flasks-good.csv) still imports.
    const old = readFileSync(join(fixtures, 'flasks-good.csv'), 'utf8');
    expect(old.split('\n')[0]).not.toMatch(/calibration_correction/);
    const imported = (
      await qa.post(url('/equipment-csv/import'), { kind: 'flask', csv: old, dryRun: false }).expect(200)
    ).body as { written: boolean; errorCount: number };
    expect(imported).toMatchObject({ written: true, errorCount: 0 });
  });

  it('round-trips a piston pipette’s corrections per volume through the API and the CSV', async () => {
    const data = {
      code: 'T-PP-1000',
      adjustable: true,
      minVolumeUl: 100,
      maxVolumeUl: 1000,
      errorBasis: 'own',
      points: [
        { volumeUl: 100, systematicErrorUl: 0.8, randomErrorUl: 0.3, correctionUl: 0.4, correctionExpandedUl: 0.2 },
        { volumeUl: 1000, systematicErrorUl: 8, randomErrorUl: 3, correctionUl: -2, correctionExpandedUl: 1.2 },
      ],
      calibrationCoverageFactor: 2,
      calibratedOn: '2026-10-12',
    };
    const created = (await qa.post(url('/equipment'), { kind: 'piston-pipette', data }).expect(201)).body;
    expect(created.current.data.points[1]).toMatchObject({ correctionUl: -2, correctionExpandedUl: 1.2 });
    const exported = (await qa.get(url('/equipment-csv/export?kind=piston-pipette')).expect(200)).text;
    const again = (
      await qa.post(url('/equipment-csv/import'), { kind: 'piston-pipette', csv: exported, dryRun: true }).expect(200)
    ).body as { rows: { code: string; action: string }[] };
    expect(again.rows.find((row) => row.code === 'T-PP-1000')?.action).toBe('unchanged');
  });
});
