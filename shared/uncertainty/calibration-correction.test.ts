import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import { runMonteCarlo } from './monte-carlo';
import type { PlanInput } from './plan-schema';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
const a1 = readJson<{ plan: PlanInput; exact: Record<string, number> }>('engine/eurachem-cg4-a1.json');
const leadPlan = readJson<PlanInput>('plans/lead-standard-from-nitrate.json');

type Step = Record<string, Record<string, unknown> | unknown>;
const withStep = (plan: PlanInput, index: number, change: (step: Step) => void): PlanInput => {
  const copy = structuredClone(plan);
  change(copy.steps[index] as unknown as Step);
  return copy;
};

/** A1 with its 100 mL flask calibrated: correction +0.03 mL, U = 0.02 mL (k = 2). */
const calibratedA1 = withStep(a1.plan, 1, (step) => {
  (step.flask as Record<string, unknown>).calibration = {
    correctionMl: 0.03,
    expandedUncertaintyMl: 0.02,
    coverageFactor: 2,
    certificate: 'WL-CAL-17',
    date: '2026-02-10',
  };
});

describe('calibration results replace tolerances (JCGM 100:2008 4.3.3: a certificate U with k is normal, u = U/k)', () => {
  it('a flask corrected by +0.03 mL, U 0.02 mL k 2: V = 100.03 mL, u = 0.01 mL, no triangular tolerance term', () => {
    const result = evaluatePlan(calibratedA1);
    // c = 1000·m·P/V: the A1 value (EURACHEM/CITAC CG4 A1) with V = 100.03 mL instead of 100 mL.
    expect(result.value).toBeCloseTo((a1.exact.concentrationMgPerL * 100) / 100.03, 4);
    const flaskRows = result.rows.filter((row) => row.stepIndices.includes(1));
    expect(flaskRows.map((row) => row.category)).not.toContain('volumetricTolerance');
    const calibration = flaskRows.find((row) => row.category === 'calibrationCorrection');
    expect(calibration?.estimate).toBe(0.03);
    expect(calibration?.distribution).toBe('normal');
    expect(calibration?.standardUncertainty).toBeCloseTo(0.01, 15);
    expect(calibration?.label).toBe(
      'Flask A1-FLASK-100 (100 mL): calibration correction +0.03 mL (certificate WL-CAL-17, 2026-02-10)',
    );
    // u_i(c) = c/V · 0.01 mL (exact derivative of 1/V).
    expect(calibration?.contribution).toBeCloseTo((result.value / 100.03) * 0.01, 12);
  });

  it('the same flask without a calibration keeps its triangular tolerance ±0.1 mL (ISO 1042 class A, u = 0.1/√6)', () => {
    const row = evaluatePlan(a1.plan).rows.find((entry) => entry.category === 'volumetricTolerance');
    expect(row?.standardUncertainty).toBeCloseTo(0.1 / Math.sqrt(6), 12);
  });

  it('Monte Carlo draws the corrected volume about 100.03 mL (mean within 4 standard errors, JCGM 101:2008 7.6)', () => {
    const gum = evaluatePlan(calibratedA1);
    const trials = 200_000;
    const monteCarlo = runMonteCarlo(calibratedA1, { trials, seed: 12 });
    expect(Math.abs(monteCarlo.mean - gum.value)).toBeLessThan((4 * gum.standardUncertainty) / Math.sqrt(trials));
  });

  it('a piston pipette calibrated at 100 and 1000 µL: the correction (interpolated) replaces the ISO 8655-2 systematic error', () => {
    const calibrated = withStep(leadPlan, 4, (step) => {
      (step.pipette as Record<string, unknown>).calibration = {
        points: [
          { volumeUl: 100, correctionUl: 0.4, expandedUncertaintyUl: 0.2, coverageFactor: 2 },
          { volumeUl: 1000, correctionUl: -2, expandedUncertaintyUl: 1.2, coverageFactor: 2 },
        ],
        certificate: 'PP-CAL-3',
      };
      step.volumeMl = 0.55;
    });
    const rows = evaluatePlan(calibrated).rows.filter((row) => row.stepIndices.includes(4));
    expect(rows.map((row) => row.category)).not.toContain('pipetteSystematicError');
    const calibration = rows.find((row) => row.category === 'calibrationCorrection');
    // Halfway between 100 and 1000 µL: correction (0.4 − 2)/2 = −0.8 µL, u = (0.1 + 0.6)/2 = 0.35 µL (linear, common practice).
    expect(calibration?.estimate).toBeCloseTo(-0.0008, 15);
    expect(calibration?.standardUncertainty).toBeCloseTo(0.00035, 15);
    expect(calibration?.label).toMatch(/calibration correction −0\.8 µL \(certificate PP-CAL-3\)/);
  });

  it('a piston pipette set outside its calibrated volumes falls back to the ISO 8655-2 maximum permissible error', () => {
    const calibrated = withStep(leadPlan, 4, (step) => {
      (step.pipette as Record<string, unknown>).calibration = {
        points: [{ volumeUl: 500, correctionUl: 1, expandedUncertaintyUl: 1, coverageFactor: 2 }],
      };
    });
    const categories = evaluatePlan(calibrated)
      .rows.filter((row) => row.stepIndices.includes(4))
      .map((row) => row.category);
    expect(categories).toContain('pipetteSystematicError');
    expect(categories).not.toContain('calibrationCorrection');
  });

  it('a balance with a relative correction of its indication +1×10⁻⁴ (U 2×10⁻⁵, k 2) weighs 1.0001 times the reading', () => {
    const corrected = withStep(leadPlan, 0, (step) => {
      (step.balance as { sensitivity: Record<string, unknown> }).sensitivity.relativeCorrection = 1e-4;
      (step.balance as { sensitivity: Record<string, unknown> }).sensitivity.date = '2026-01-20';
    });
    const before = evaluatePlan(leadPlan);
    const after = evaluatePlan(corrected);
    // B-01 weighs the solid only: c is proportional to the net mass.
    expect(after.value / before.value).toBeCloseTo(1.0001, 12);
    const row = after.rows.find((entry) => entry.sourceId === 'item:B-01:sensitivity');
    expect(row?.category).toBe('calibrationCorrection');
    expect(row?.label).toBe('Balance B-01 indication: calibration correction +0.0001 (relative) (2026-01-20)');
    expect(row?.standardUncertainty).toBeCloseTo(1e-5, 15);
  });
});
