import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluatePlan } from './evaluate-plan';
import type { PlanInput } from './plan-schema';
import { referenceVolumeFactor } from './volume-delivery';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
const a1 = readJson<{ plan: PlanInput; exact: Record<string, number> }>('engine/eurachem-cg4-a1.json');
const leadPlan = readJson<PlanInput>('plans/lead-standard-from-nitrate.json');
const gravimetricPlan = readJson<PlanInput>('plans/lead-gravimetric-dilution.json');

const withSettings = (plan: PlanInput, settings: Partial<PlanInput['settings']>): PlanInput => ({
  ...structuredClone(plan),
  settings: { ...plan.settings, ...settings },
});

/** 1000 mg/L certified solution, 10 mL class A pipette into a 100 mL class A flask: c = c₀·V_pipette/V_flask. */
const dilution: PlanInput = {
  formatVersion: 1,
  analyte: { formula: 'Pb' },
  settings: { labTemperatureC: 20, temperatureHalfRangeC: 4, solutionExpansionPerC: 2.1e-4, outputUnit: 'mg/L' },
  steps: [
    {
      kind: 'startFromCertifiedSolution',
      material: {
        kind: 'certifiedSolution',
        itemId: 'CRM-1',
        name: 'Lead 1000 mg/L',
        certifiedValue: 1000,
        certifiedUnit: 'mg/L',
        uncertainty: { shape: 'normal', expandedUncertainty: 2, coverageFactor: 2 },
      },
    },
    {
      kind: 'pipetteAliquot',
      pipette: {
        kind: 'glassPipette',
        itemId: 'GP-10',
        nominalMl: 10,
        toleranceClass: 'A',
        toleranceMl: 0.02,
        fillRepeatabilityMl: 0,
      },
      volumeMl: 10,
    },
    {
      kind: 'makeUpToVolume',
      flask: {
        kind: 'volumetricFlask',
        itemId: 'F-100',
        nominalMl: 100,
        toleranceClass: 'A',
        toleranceMl: 0.1,
        fillRepeatabilityMl: 0,
      },
    },
  ],
};

const temperatureRows = (plan: PlanInput) => evaluatePlan(plan).rows.filter((row) => row.category === 'temperature');

describe('reference temperature (EURACHEM/CITAC CG4 3rd ed. A1 liquid expansion; borosilicate 3.3 cubic 1×10⁻⁵ K⁻¹)', () => {
  it('a lab at 25 °C with glassware calibrated at 20 °C states c at 20 °C: V₂₀ = V·(1 + γ_glass·5)·(1 − γ_liquid·5)', () => {
    const result = evaluatePlan(withSettings(a1.plan, { labTemperatureC: 25 }));
    // Hand computation: 100 mL·(1 + 1e-5·5)·(1 − 2.1e-4·5) = 99.89999475 mL, so c = 1002.69972/0.9989999475 mg/L.
    expect(
      referenceVolumeFactor(
        { labTemperatureC: 25, referenceTemperatureC: 20, solutionExpansionPerC: 2.1e-4 },
        1e-5,
        20,
      ),
    ).toBeCloseTo(0.9989999475, 12);
    expect(result.value).toBeCloseTo(1003.70348, 4);
    expect(result.value / a1.exact.concentrationMgPerL - 1).toBeCloseTo(1 / 0.9989999475 - 1, 9);
    expect(result.statement).toMatch(/mg\/L at 20 °C, k = 2\.00/);
  });

  it('states the reference temperature the policy sets, and a mass fraction none', () => {
    expect(evaluatePlan(withSettings(a1.plan, { referenceTemperatureC: 25, labTemperatureC: 25 })).statement).toMatch(
      /at 25 °C/,
    );
    expect(evaluatePlan(gravimetricPlan).statement).not.toMatch(/°C/);
  });

  it('at 20 °C with glassware calibrated at 20 °C and t_ref 20 °C nothing changes (A1 exact path: u_c = 0.8352 mg/L)', () => {
    const result = evaluatePlan(a1.plan);
    expect(result.value).toBeCloseTo(a1.exact.concentrationMgPerL, 5);
    expect(result.standardUncertainty).toBeCloseTo(a1.exact.combinedStandardUncertaintyMgPerL, 4);
  });

  it("'perUse' written out equals today's numbers (the lead fixture's value and u_c before this change, to the last digit)", () => {
    // Printed by the engine before the reference-temperature change (npm run budget on the same fixture).
    const result = evaluatePlan(withSettings(leadPlan, { temperatureTreatment: 'perUse' }));
    expect(result.value).toBe(1000.0356116547131);
    expect(result.standardUncertainty).toBe(5.921572358998025);
  });

  it("'perUse': each volume carries its own term c·γ·a/√3 (EURACHEM/CITAC CG4 A1: 2.1e-4 K⁻¹, rectangular ±4 °C)", () => {
    const rows = temperatureRows(dilution);
    expect(rows.map((row) => row.sourceId)).toEqual(['step:1:temperature', 'step:2:temperature']);
    for (const row of rows) expect(row.contribution).toBeCloseTo((100 * 2.1e-4 * 4) / Math.sqrt(3), 9);
  });

  it("'sharedLab': the lab-temperature term of pipette and flask cancels in c₀·V_pipette/V_flask; the per-use ±0.5 °C stays", () => {
    const shared = withSettings(dilution, { temperatureTreatment: 'sharedLab', operationTemperatureHalfRangeC: 0.5 });
    const rows = temperatureRows(shared);
    const lab = rows.find((row) => row.sourceId === 'lab:temperature');
    expect(lab?.stepIndices).toEqual([1, 2]);
    // ∂c/∂δt = c·γ − c·γ = 0: the shared deviation has no effect on the ratio (exact arithmetic, 1e-12 mg/L).
    expect(lab?.contribution).toBeCloseTo(0, 12);
    const perUse = rows.filter((row) => row.sourceId !== 'lab:temperature');
    expect(perUse).toHaveLength(2);
    for (const row of perUse) expect(row.contribution).toBeCloseTo((100 * 2.1e-4 * 0.5) / Math.sqrt(3), 9);
    expect(evaluatePlan(shared).standardUncertainty).toBeLessThan(evaluatePlan(dilution).standardUncertainty);
  });

  it("'sharedLab': a stock made up in one flask keeps the lab term (nothing to cancel against): c·γ·a/√3", () => {
    const rows = temperatureRows(withSettings(a1.plan, { temperatureTreatment: 'sharedLab' }));
    const lab = rows.find((row) => row.sourceId === 'lab:temperature');
    expect(lab?.contribution).toBeCloseTo((a1.exact.concentrationMgPerL * 2.1e-4 * 4) / Math.sqrt(3), 9);
  });
});
