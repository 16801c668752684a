import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { buoyancyFactor } from './air-buoyancy';
import { evaluatePlan } from './evaluate-plan';
import { PlanError } from './plan-error';
import type { PlanInput } from './plan-schema';
import { waterDensityKgPerM3 } from './water-density';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
const clone = <T>(value: T): T => structuredClone(value);

type LoosePlan = { settings: Record<string, unknown>; steps: Record<string, unknown>[] };
const molality = readJson<LoosePlan>('plans/sodium-chloride-molality.json');
const gravimetric = readJson<LoosePlan>('plans/lead-gravimetric-dilution.json');
const leadFromNitrate = readJson<LoosePlan>('plans/lead-standard-from-nitrate.json');
const evaluate = (plan: LoosePlan) => evaluatePlan(plan as unknown as PlanInput);
const withoutBuoyancy = (plan: LoosePlan): LoosePlan => {
  const copy = clone(plan);
  delete copy.settings.airBuoyancy;
  return copy;
};
const withBuoyancy = (plan: LoosePlan, setting: Record<string, unknown>): LoosePlan => {
  const copy = clone(plan);
  copy.settings.airBuoyancy = setting;
  return copy;
};
// OIML R 111-1 reference conditions (REFERENCES.md): air 1.2 kg/m³, weights 8000 kg/m³; the ± 0.05 kg/m³ range of
// the air density is common practice for a weighing room.
const CORRECT = { treatment: 'correct', airDensityKgPerM3: 1.2, airDensityHalfRangeKgPerM3: 0.05 };
const BOUND = { treatment: 'boundAsUncertainty', airDensityKgPerM3: 1.2, airDensityHalfRangeKgPerM3: 0.05 };
const WATER_20 = waterDensityKgPerM3(20); // 998.2067 kg/m³, Tanaka et al. 2001

describe('air buoyancy (OIML R 111-1 / OIML D 28)', () => {
  it('the factor for water at 20 °C, air 1.2 kg/m³ and 8000 kg/m³ weights is 1.0010534 (OIML R 111; REFERENCES.md)', () => {
    expect(buoyancyFactor(1.2, 8000, WATER_20)).toBeCloseTo(1.0010534, 7);
  });

  it('molality fixture: the corrected molality equals the hand computation, and moves by about 1.1 U from the uncorrected one', () => {
    const corrected = evaluate(molality);
    const uncorrected = evaluate(withoutBuoyancy(molality));
    // Hand computation: b = m_s·B_s·P/(M·m_w·B_w), B = (1 − ρ_a/ρ_w)/(1 − ρ_a/ρ). NaCl 2.165 g/cm³ (from memory),
    // water 998.2067 kg/m³ at 20 °C (Tanaka 2001), so B_s/B_w = (1 − 1.2/998.2067)/(1 − 1.2/2165).
    const ratio = (1 - 1.2 / 998.2067) / (1 - 1.2 / 2165);
    expect(corrected.value / uncorrected.value).toBeCloseTo(ratio, 7);
    // M(NaCl) = 22.98976928 + 35.4515 (CIAAW interval midpoint for Cl) g/mol; m_s = 5.8443 g, P = 0.9995, m_w = 1 kg.
    const hand = ((5.8443 * 0.9995) / ((22.98976928 + 35.4515) * 1)) * ratio;
    expect(corrected.value).toBeCloseTo(hand, 9);
    // The bias the correction removes: (1 − ratio)·b ≈ 6.5e-5 mol/kg, about 1.1 U (U ≈ 5.95e-5 mol/kg).
    const shiftInU = (uncorrected.value - corrected.value) / corrected.expandedUncertainty;
    expect(shiftInU).toBeGreaterThan(1.0);
    expect(shiftInU).toBeLessThan(1.2);
    // The shared air density is one row of the budget.
    const air = corrected.rows.filter((row) => row.category === 'airBuoyancy');
    expect(air.map((row) => row.sourceId)).toEqual(['plan:air-density']);
  });

  it('a weighed aliquot made up to volume: correcting raises the result by B − 1 ≈ 0.10 % of the solution weighed (OIML R 111 factor)', () => {
    const plan = clone(gravimetric);
    plan.settings.outputUnit = 'mg/L';
    plan.steps[2] = clone(leadFromNitrate.steps[1]);
    // The certificate gives no density: a plan with the lab's table names its matrix.
    const material = plan.steps[0].material as Record<string, unknown>;
    material.matrix = '2 % HNO3';
    plan.settings.certifiedSolutionDensity = {
      matrixDensities: [{ matrix: '2 % HNO3', densityGPerMl: 1.0098, standardUncertaintyGPerMl: 0.0005 }],
      otherwise: 'refuse',
    };
    const corrected = evaluate(withBuoyancy(plan, { ...CORRECT, airDensityHalfRangeKgPerM3: 0 }));
    const uncorrected = evaluate(plan);
    // The aliquot is the certified solution itself (1.0098 g/mL): B = (1 − 1.2/8000)/(1 − 1.2/1009.8).
    expect(corrected.value / uncorrected.value).toBeCloseTo(buoyancyFactor(1.2, 8000, 1009.8), 10);
    expect(corrected.value / uncorrected.value - 1).toBeCloseTo(1.0394e-3, 6);
  });

  describe('weighings of like substances share their buoyancy error, so a gravimetric ratio cancels it', () => {
    it('corrected: aliquot mass / final mass of one aqueous solution gives the uncorrected ratio, and the air density no variance', () => {
      const corrected = evaluate(withBuoyancy(gravimetric, CORRECT));
      const uncorrected = evaluate(gravimetric);
      expect(corrected.value / uncorrected.value).toBeCloseTo(1, 14);
      const air = corrected.rows.find((row) => row.sourceId === 'plan:air-density');
      expect(air).toBeDefined();
      expect(Math.abs(air?.contribution ?? 1)).toBeLessThan(1e-12 * corrected.standardUncertainty);
      expect(corrected.standardUncertainty).toBeCloseTo(uncorrected.standardUncertainty, 14);
    });

    it('bounded (OIML D 28): the rectangular terms of aliquot and final mass cancel in the ratio', () => {
      const bounded = evaluate(withBuoyancy(gravimetric, BOUND));
      const uncorrected = evaluate(gravimetric);
      const term = bounded.rows.find((row) => row.sourceId === 'plan:air-buoyancy-uncorrected');
      expect(term).toBeDefined();
      expect(Math.abs(term?.contribution ?? 1)).toBeLessThan(1e-12 * bounded.standardUncertainty);
      expect(bounded.value).toBe(uncorrected.value);
    });

    it('bounded, unlike substances (solid and water in a molality): the term is the difference of their biases, rectangular', () => {
      const bounded = evaluate(withBuoyancy(molality, BOUND));
      const term = bounded.rows.find((row) => row.sourceId === 'plan:air-buoyancy-uncorrected');
      // Relative half-width |B_s − B_w| with B − 1 per weighing (OIML D 28), rectangular: u = a/√3 (GUM 4.3.7).
      const halfWidth = Math.abs(buoyancyFactor(1.2, 8000, 2165) - buoyancyFactor(1.2, 8000, WATER_20));
      expect(Math.abs(term?.contribution ?? 0) / bounded.value).toBeCloseTo(halfWidth / Math.sqrt(3), 9);
      // Not corrected: the value is the uncorrected one.
      expect(bounded.value).toBe(evaluate(withoutBuoyancy(molality)).value);
    });

    it('bounded, one weighing alone: the term is |B − 1| of what is weighed, rectangular (OIML D 28)', () => {
      const plan = clone(leadFromNitrate);
      delete plan.steps[0].airBuoyancy;
      const bounded = evaluate(withBuoyancy(plan, BOUND));
      const term = bounded.rows.find((row) => row.sourceId === 'plan:air-buoyancy-uncorrected');
      // Pb(NO3)2 4.53 g/cm³ (from memory).
      const halfWidth = Math.abs(buoyancyFactor(1.2, 8000, 4530) - 1);
      expect(Math.abs(term?.contribution ?? 0) / bounded.value).toBeCloseTo(halfWidth / Math.sqrt(3), 10);
    });
  });

  describe('plans from before the setting', () => {
    it('a plan with no buoyancy setting is not corrected (EURACHEM A1 and the other checks stay exact)', () => {
      const plain = withoutBuoyancy(molality);
      const result = evaluate(plain);
      // m_s·P/(M·m_w), no buoyancy factor.
      expect(result.value).toBeCloseTo((5.8443 * 0.9995) / ((22.98976928 + 35.4515) * 1), 12);
      expect(result.rows.filter((row) => row.category === 'airBuoyancy')).toEqual([]);
    });

    it("a weighSolid step's own airBuoyancy now corrects every weighing of the plan with those densities", () => {
      const legacy = withoutBuoyancy(molality);
      legacy.steps[0].airBuoyancy = { airDensityKgPerM3: 1.2, weightDensityKgPerM3: 8000 };
      const asSetting = withBuoyancy(withoutBuoyancy(molality), { ...CORRECT, airDensityHalfRangeKgPerM3: 0 });
      expect(evaluate(legacy).value).toBe(evaluate(asSetting).value);
      expect(evaluate(legacy).value).toBeCloseTo(evaluate(molality).value, 12);
    });

    it('the lead fixture (step-level airBuoyancy, one weighing) keeps its numbers: B of Pb(NO3)2 on the solid only', () => {
      const result = evaluate(leadFromNitrate);
      const plain = clone(leadFromNitrate);
      delete plain.steps[0].airBuoyancy;
      expect(result.value / evaluate(plain).value).toBeCloseTo(buoyancyFactor(1.2, 8000, 4530), 14);
    });
  });

  it('a weighed solid without a density is refused at its step, in words a chemist reads', () => {
    const plan = clone(molality);
    delete (plan.steps[0].material as Record<string, unknown>).densityKgPerM3;
    expect(() => evaluate(plan)).toThrow(PlanError);
    try {
      evaluate(plan);
    } catch (error) {
      expect((error as PlanError).path).toEqual(['steps', 0, 'material', 'densityKgPerM3']);
      expect((error as PlanError).message).toMatch(
        /Enter the density of Sodium chloride, dried \(demo lot\) \(LOT-NACL-118\) in the library, from its safety data sheet/,
      );
    }
  });
});
