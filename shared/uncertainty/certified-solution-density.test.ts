import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { matrixKey } from './certified-solution-density';
import { evaluatePlan } from './evaluate-plan';
import { PlanError } from './plan-error';
import type { PlanInput } from './plan-schema';
import { waterDensityKgPerM3 } from './water-density';

type LoosePlan = { analyte?: unknown; settings: Record<string, unknown>; steps: Record<string, unknown>[] };
const selenium = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/plans/selenium-working-standard.json', import.meta.url), 'utf8'),
) as LoosePlan;
const evaluate = (plan: LoosePlan) => evaluatePlan(plan as unknown as PlanInput);

/** 1000 mg/kg Pb in 2 % HNO3 (no density on its certificate), 1 mL pipetted and made up to 100 mL, stated in mg/L. */
function leadOneToHundred(settings: Record<string, unknown> = {}): LoosePlan {
  const plan = structuredClone(selenium);
  plan.analyte = { formula: 'Pb' };
  plan.settings = { ...plan.settings, labTemperatureC: 20, outputUnit: 'mg/L', ...settings };
  plan.steps = [
    {
      kind: 'startFromCertifiedSolution',
      material: {
        kind: 'certifiedSolution',
        itemId: 'CRM-PB-0877',
        name: 'Lead 1000 mg/kg in 2 % HNO3 (demo certificate)',
        certifiedValue: 1000,
        certifiedUnit: 'mg/kg',
        uncertainty: { shape: 'normal', expandedUncertainty: 2, coverageFactor: 2 },
        matrix: '2 % HNO₃',
      },
    },
    plan.steps[1],
    plan.steps[2],
  ];
  return plan;
}

// Density of 2 % (m/m) nitric acid at 20 °C ≈ 1.0098 g/mL (from memory, handbook tables of HNO3 solutions); the
// ± 0.0005 g/mL standard uncertainty is the lab's choice (common practice: half the last digit a table gives).
const TABLE = [{ matrix: '2 % HNO3', densityGPerMl: 1.0098, standardUncertaintyGPerMl: 0.0005 }];

describe('density of a certified solution stated per mass and used per volume', () => {
  it('1:100 Pb from 1000 mg/kg in 2 % HNO3, density from the lab table: c = 1000 mg/kg · 1.0098 g/mL / 100 (hand computation)', () => {
    const result = evaluate(
      leadOneToHundred({ certifiedSolutionDensity: { matrixDensities: TABLE, otherwise: 'refuse' } }),
    );
    // w·ρ·V_a/V_f = 1000 mg/kg · 1.0098 kg/L · 1 mL / 100 mL = 10.098 mg/L.
    expect(result.value).toBeCloseTo(10.098, 9);
    expect(result.warnings).toEqual([]);
    const density = result.rows.find((row) => row.sourceId === 'item:CRM-PB-0877:density');
    expect(density?.label).toBe(
      'Lead 1000 mg/kg in 2 % HNO3 (demo certificate) (CRM-PB-0877): density of its matrix "2 % HNO3" (lab\'s density table)',
    );
    // Its share: relative u = 0.0005/1.0098 (GUM 5.1.6 for a product).
    expect(Math.abs(density?.contribution ?? 0) / result.value).toBeCloseTo(0.0005 / 1.0098, 12);
  });

  it('the table matches the matrix exactly, ignoring case, spaces and subscript digits', () => {
    expect(matrixKey('2 % HNO₃')).toBe(matrixKey('2% hno3'));
    expect(matrixKey(' 2 %  HNO3 ')).toBe(matrixKey('2 % HNO3'));
    expect(matrixKey('2 % HNO3 + 0.5 % HCl')).not.toBe(matrixKey('2 % HNO3'));
    expect(matrixKey('20 % HNO3')).not.toBe(matrixKey('2 % HNO3'));
  });

  it("the certificate's own density comes before the table", () => {
    const plan = leadOneToHundred({ certifiedSolutionDensity: { matrixDensities: TABLE, otherwise: 'refuse' } });
    Object.assign(plan.steps[0].material as object, { densityGPerMl: 1.011, densityStandardUncertaintyGPerMl: 0.002 });
    const result = evaluate(plan);
    expect(result.value).toBeCloseTo(10.11, 9);
    expect(result.rows.find((row) => row.sourceId === 'item:CRM-PB-0877:density')?.label).toMatch(/: density$/);
  });

  it('no density, the lab refuses: the plan is refused at the certified solution with what to do', () => {
    const plan = leadOneToHundred({ certifiedSolutionDensity: { matrixDensities: [], otherwise: 'refuse' } });
    expect(() => evaluate(plan)).toThrow(PlanError);
    try {
      evaluate(plan);
    } catch (error) {
      expect((error as PlanError).path).toEqual(['steps', 0, 'material', 'densityGPerMl']);
      expect((error as PlanError).message).toMatch(
        /is certified in mg\/kg and is taken by volume in step 2, which needs the solution's density: enter the density from its certificate in the library, or add its matrix \("2 % HNO₃"\) to the lab’s density table/,
      );
    }
  });

  it("no density, the lab takes water's with an uncertainty: water at 20 °C (Tanaka 2001), its u in the budget, and a warning", () => {
    const plan = leadOneToHundred({
      certifiedSolutionDensity: {
        matrixDensities: [],
        otherwise: 'assumeWater',
        waterStandardUncertaintyGPerMl: 0.006,
      },
    });
    const result = evaluate(plan);
    const water = waterDensityKgPerM3(20) / 1000;
    expect(result.value).toBeCloseTo(10 * water, 9);
    expect(result.warnings).toEqual([
      {
        code: 'assumedWaterDensity',
        stepIndex: 0,
        params: {
          materialItemId: 'CRM-PB-0877',
          materialName: 'Lead 1000 mg/kg in 2 % HNO3 (demo certificate)',
          certifiedUnit: 'mg/kg',
          densityGPerMl: water,
          standardUncertaintyGPerMl: 0.006,
        },
      },
    ]);
    const density = result.rows.find((row) => row.sourceId === 'item:CRM-PB-0877:density');
    expect(Math.abs(density?.contribution ?? 0) / result.value).toBeCloseTo(0.006 / water, 12);
  });

  it('a plan from before the setting computes as it did (water, no uncertainty) but no longer silently: it warns', () => {
    const result = evaluate(leadOneToHundred());
    // Today's number: 1000 · 0.9982067 / 100, about 1.1 % below the 10.098 mg/L of the table's density.
    expect(result.value).toBeCloseTo(9.982067, 6);
    expect(result.warnings.map((warning) => warning.code)).toEqual(['assumedWaterDensity']);
    expect(result.rows.find((row) => row.sourceId === 'item:CRM-PB-0877:density')).toBeUndefined();
  });

  it('a certified solution used in its own basis needs no density and raises nothing', () => {
    const plan = leadOneToHundred({ certifiedSolutionDensity: { matrixDensities: [], otherwise: 'refuse' } });
    plan.settings.outputUnit = 'mg/kg';
    plan.steps = [
      plan.steps[0],
      {
        kind: 'weighAliquot',
        balance: {
          kind: 'balance',
          itemId: 'B-01',
          capacityG: 220,
          readabilityG: 0.0001,
          repeatabilityG: 5e-5,
          linearityG: 0.0002,
        },
        netMassG: 1,
        containerMassG: 60,
      },
      {
        kind: 'makeUpToMass',
        balance: {
          kind: 'balance',
          itemId: 'B-01',
          capacityG: 220,
          readabilityG: 0.0001,
          repeatabilityG: 5e-5,
          linearityG: 0.0002,
        },
        finalMassG: 100,
        containerMassG: 60,
      },
    ];
    const result = evaluate(plan);
    expect(result.value).toBeCloseTo(10, 9);
    expect(result.warnings).toEqual([]);
  });
});
