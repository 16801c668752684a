import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { standardAtomicWeights } from './atomic-weights';
import { molarMass } from './chemical-formula';
import { evaluatePlan } from './evaluate-plan';
import { PlanError } from './plan-error';
import type { PlanInput } from './plan-schema';

type MutablePlan = {
  settings: { outputUnit: string };
  steps: { netMassG?: number; material?: Record<string, unknown> }[];
};
const leadPlan = JSON.parse(
  readFileSync(new URL('../../tests/fixtures/plans/lead-standard-from-nitrate.json', import.meta.url), 'utf8'),
) as MutablePlan;

/** The demo lead plan's stock: 0.1599 g of Pb(NO3)2 made up to 100 mL, stated in `outputUnit`. */
function leadStock(outputUnit = 'mg/L', material: Record<string, unknown> = {}): MutablePlan {
  const plan = structuredClone(leadPlan);
  plan.steps = plan.steps.slice(0, 2);
  plan.settings.outputUnit = outputUnit;
  plan.steps[0].material = { ...plan.steps[0].material, ...material };
  return plan;
}
const evaluate = (plan: MutablePlan) => evaluatePlan(plan as unknown as PlanInput);

// A lot's values as a certificate might state them (invented for the demo lot; the atomic weight lies inside the
// CIAAW 2021 interval for Pb, [206.14, 207.94]).
const lotAtomicWeight = {
  certificateAtomicWeight: {
    element: 'Pb',
    valueGPerMol: 207.21,
    uncertainty: { shape: 'normal', expandedUncertainty: 0.02, coverageFactor: 2 },
    source: 'certificate lot 2291, isotopic analysis',
  },
};
const lotMolarMass = {
  certificateMolarMass: {
    valueGPerMol: 331.22,
    uncertainty: { shape: 'normal', expandedUncertainty: 0.04, coverageFactor: 2 },
    source: 'certificate lot 2291',
  },
};

describe('atomic weights per lot (CIAAW 2021; Possolo et al., Pure Appl. Chem. 90 (2018) 395, from memory)', () => {
  // CIAAW 2021: Pb [206.14, 207.94] → midpoint 207.04, rectangular half-width 0.90, u = 0.90/√3 = 0.5196 g/mol.
  const pb = standardAtomicWeights.Pb;
  const standardM = molarMass('Pb(NO3)2').valueGPerMol;

  it('without lot values, the lead stock carries the CIAAW 2021 interval of Pb as one rectangular source', () => {
    const result = evaluate(leadStock());
    const row = result.rows.find((candidate) => candidate.sourceId === 'atomic-weight:Pb');
    expect(row?.distribution).toBe('rectangular');
    expect(row?.standardUncertainty).toBeCloseTo(0.5196, 4);
    expect(result.rows.some((candidate) => candidate.sourceId.startsWith('item:LOT-PBN-2291:atomic'))).toBe(false);
  });

  it("a lot's atomic weight of Pb replaces the standard one in M(analyte) and M(compound)", () => {
    const standard = evaluate(leadStock());
    const lot = evaluate(leadStock('mg/L', lotAtomicWeight));
    expect(lot.rows.some((row) => row.sourceId === 'atomic-weight:Pb')).toBe(false);
    const lotRow = lot.rows.find((row) => row.sourceId === 'item:LOT-PBN-2291:atomic-weight:Pb');
    expect(lotRow?.standardUncertainty).toBeCloseTo(0.01, 12);
    // c ∝ A(Pb)/M(Pb(NO3)2), M moving with A: exact arithmetic, so 1e-12 relative.
    const lotM = standardM - pb.value + 207.21;
    const expected = (standard.value * (207.21 / lotM)) / (pb.value / standardM);
    expect(Math.abs(lot.value / expected - 1)).toBeLessThan(1e-12);
    // The Pb term held 35 % of u_c²; with u = 0.01 g/mol it is negligible, so u_c falls by about a fifth.
    expect(lot.standardUncertainty).toBeLessThan(0.85 * standard.standardUncertainty);
  });

  it("a lot's molar mass is one source for M(compound), and M(Pb) follows from it: f = 1 − M(N2O6)/M", () => {
    const standard = evaluate(leadStock());
    const lot = evaluate(leadStock('mg/L', lotMolarMass));
    const rest = standardM - pb.value;
    const expected = (standard.value * (1 - rest / 331.22)) / (pb.value / standardM);
    expect(Math.abs(lot.value / expected - 1)).toBeLessThan(1e-12);
    expect(lot.rows.some((row) => row.sourceId === 'atomic-weight:Pb')).toBe(false);
    expect(lot.rows.find((row) => row.sourceId === 'item:LOT-PBN-2291:molar-mass')?.standardUncertainty).toBeCloseTo(
      0.02,
      12,
    );
  });

  it('an amount concentration uses the same lot values: n(Pb) = m·P/M(lot), whichever the certificate gives', () => {
    const standard = evaluate(leadStock('mmol/L'));
    const byAtomicWeight = evaluate(leadStock('mmol/L', lotAtomicWeight));
    const byMolarMass = evaluate(leadStock('mmol/L', lotMolarMass));
    const lotM = standardM - pb.value + 207.21;
    expect(Math.abs(byAtomicWeight.value / (standard.value * (standardM / lotM)) - 1)).toBeLessThan(1e-12);
    expect(Math.abs(byMolarMass.value / (standard.value * (standardM / 331.22)) - 1)).toBeLessThan(1e-12);
  });

  it('refuses a lot atomic weight of an element the formula does not hold, and both lot values at once', () => {
    const wrongElement = leadStock('mg/L', {
      certificateAtomicWeight: { ...lotAtomicWeight.certificateAtomicWeight, element: 'Cd' },
    });
    expect(() => evaluate(wrongElement)).toThrow(/Cd, which Pb\(NO3\)2 does not contain/);
    expect(() => evaluate(leadStock('mg/L', { ...lotAtomicWeight, ...lotMolarMass }))).toThrow(PlanError);
  });
});

describe('warning: one atomic weight holds more than half of u_c² (CIAAW 2021 Pb interval)', () => {
  it('fires on the lead stock stated in mmol/L, where u(A(Pb))/M = 0.16 % dominates', () => {
    const result = evaluate(leadStock('mmol/L'));
    const warnings = result.warnings.filter((warning) => warning.code === 'dominantAtomicWeight');
    expect(warnings).toEqual([
      {
        code: 'dominantAtomicWeight',
        stepIndex: 0,
        params: { element: 'Pb', itemId: null, indexPercent: expect.closeTo(59.85, 1) as number },
      },
    ]);
  });

  it('fires on a 10 g/L lead stock (1.599 g in 100 mL), where the balance no longer hides it', () => {
    const plan = leadStock();
    plan.steps[0].netMassG = 1.599;
    expect(evaluate(plan).warnings.map((warning) => warning.code)).toEqual(['dominantAtomicWeight']);
  });

  it('does not fire with the lot atomic weight, nor on the demo plan (PP-07 dominates it; Pb holds 2.5 %)', () => {
    expect(evaluate(leadStock('mmol/L', lotAtomicWeight)).warnings).toEqual([]);
    expect(evaluate(structuredClone(leadPlan)).warnings).toEqual([]);
  });
});
