import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { evaluateAt } from './evaluate-duals';
import { evaluateDuals } from './evaluate-duals';
import { evaluatePlan } from './evaluate-plan';
import { compilePlan } from './plan-compiler';
import { PlanError } from './plan-error';
import type { PlanInput } from './plan-schema';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;
const examplePlans = readdirSync(new URL('plans/', fixtures)).filter((name) => name.endsWith('.json'));
const a1 = readJson<{ plan: PlanInput; guide: Record<string, number>; exact: Record<string, number> }>(
  'engine/eurachem-cg4-a1.json',
);
const leadPlan = readJson<PlanInput>('plans/lead-standard-from-nitrate.json');
const seleniumPlan = readJson<PlanInput>('plans/selenium-working-standard.json');

function expectPlanError(plan: unknown, path: (string | number)[], message: RegExp) {
  try {
    evaluatePlan(plan as PlanInput);
  } catch (error) {
    expect(error).toBeInstanceOf(PlanError);
    expect((error as PlanError).path).toEqual(path);
    expect((error as PlanError).message).toMatch(message);
    return;
  }
  throw new Error('expected a PlanError');
}

const clone = <T>(value: T): T => structuredClone(value);

describe('EURACHEM/CITAC CG4 3rd ed. Appendix A, Example A1 as a plan document', () => {
  it('gives c = 1002.7 mg/L and u_c = 0.8352 mg/L (exact path; the guide rounds u(V) to 0.07 and prints 0.9)', () => {
    const result = evaluatePlan(a1.plan);
    // Value: the model is exact arithmetic, so 1e-9 relative.
    expect(result.value).toBeCloseTo(a1.exact.concentrationMgPerL, 5);
    expect(Number(result.value.toFixed(1))).toBe(a1.guide.concentrationMgPerL);
    // u_c to 4 significant digits of the exact path; 0.8352 → guide's one-digit 0.8 (0.9 only after its rounding of u(V)).
    expect(result.standardUncertainty).toBeCloseTo(a1.exact.combinedStandardUncertaintyMgPerL, 4);
    expect(result.coverageFactor).toBe(2);
    // The Cd → Cd stoichiometric factor is exactly 1 and its atomic weight has no effect (analytic).
    expect(result.rows.find((row) => row.sourceId === 'atomic-weight:Cd')?.sensitivityCoefficient).toBe(0);
    const volumeRows = result.rows.filter((row) => row.stepIndices[0] === 1);
    const volumeVariance = volumeRows.reduce(
      (sum, row) => sum + (row.contribution / row.sensitivityCoefficient) ** 2,
      0,
    );
    expect(Math.sqrt(volumeVariance)).toBeCloseTo(a1.exact.volumeStandardUncertaintyMl, 5);
  });
});

describe('example plans', () => {
  it('reads the four example plans (so the checks below are not vacuous)', () => {
    expect(examplePlans).toHaveLength(4);
  });
  it.each(examplePlans)('%s evaluates, and its contributions sum to 100 %%', (name) => {
    const result = evaluatePlan(readJson<PlanInput>(`plans/${name}`));
    expect(result.standardUncertainty).toBeGreaterThan(0);
    expect(result.rows.reduce((sum, row) => sum + row.indexPercent, 0)).toBeCloseTo(100, 9);
    expect(result.byStep.reduce((sum, group) => sum + group.indexPercent, 0)).toBeCloseTo(100, 9);
    expect(result.byCategory.reduce((sum, group) => sum + group.indexPercent, 0)).toBeCloseTo(100, 9);
  });

  // Sensitivities from automatic differentiation against central differences on the compiled model:
  // h = 1e-4·max(|x|, u(x)); the O(h²) truncation error is below 1e-6 relative for these rational models,
  // and the rounding error is at most a few ε·|y|/h.
  it.each(examplePlans)('%s: sensitivity coefficients match central differences', (name) => {
    const model = compilePlan(readJson<PlanInput>(`plans/${name}`));
    const output = evaluateDuals(model)[model.outputNode];
    expect(model.sources.length).toBeGreaterThan(0);
    const estimates = model.sources.map((source) => source.estimate);
    model.sources.forEach((source, index) => {
      const h = 1e-4 * Math.max(Math.abs(source.estimate), source.standardUncertainty);
      const plus = [...estimates];
      const minus = [...estimates];
      plus[index] += h;
      minus[index] -= h;
      const central = (evaluateAt(model, plus) - evaluateAt(model, minus)) / (2 * h);
      const analytic = output.sensitivity(source.id);
      expect(Math.abs(analytic - central)).toBeLessThanOrEqual(
        1e-6 * Math.abs(central) + (8 * Number.EPSILON * Math.abs(output.value)) / h,
      );
    });
  });

  it('the demo glassware carries the ISO 1042:1998 / ISO 648:2008 class A tolerances', () => {
    const iso = readJson<{
      flaskClassAToleranceMl: Record<string, number>;
      pipetteClassAToleranceMl: Record<string, number>;
    }>('engine/iso-glassware-tolerances.json');
    const plan = leadPlan as unknown as {
      steps: Record<string, { kind: string; nominalMl: number; toleranceMl: number; toleranceClass: string }>[];
    };
    const classA = plan.steps
      .flatMap((step) => [step.flask, step.pipette])
      .filter((item) => item !== undefined && item.toleranceClass === 'A');
    expect(classA.length).toBeGreaterThan(0);
    for (const item of classA) {
      const table = item.kind === 'volumetricFlask' ? iso.flaskClassAToleranceMl : iso.pipetteClassAToleranceMl;
      expect(item.toleranceMl).toBe(table[String(item.nominalMl)]);
    }
  });
});

describe('correlations through shared items', () => {
  it('the same piston pipette used twice gives a larger u than two pipettes of the same class', () => {
    const same = evaluatePlan(seleniumPlan);
    const different = clone(seleniumPlan) as { steps: { pipette?: { itemId: string } }[] };
    const second = different.steps[3].pipette;
    if (second === undefined) throw new Error('fixture changed');
    second.itemId = 'PP-08';
    const independent = evaluatePlan(different as PlanInput);
    expect(same.standardUncertainty).toBeGreaterThan(independent.standardUncertainty);
    // Systematic part ±8 µL rectangular on each 1 mL aliquot, relative u_s = 0.008/√3:
    // shared → contributions add linearly (2·u_s), independent → in quadrature (√2·u_s). Analytic.
    const systematic = 0.008 / Math.sqrt(3);
    const variance = (result: typeof same) => result.standardUncertainty ** 2 / result.value ** 2;
    expect(variance(same) - variance(independent)).toBeCloseTo((4 - 2) * systematic ** 2, 8);
  });

  it('one balance for aliquot and final mass: its sensitivity cancels in the gravimetric ratio', () => {
    const result = evaluatePlan(readJson<PlanInput>('plans/lead-gravimetric-dilution.json'));
    const sensitivity = result.rows.find((row) => row.category === 'balanceSensitivity');
    expect(sensitivity?.contribution).toBeLessThan(1e-15);
  });
});

describe('invalid plans are refused with a path and a chemist-readable message', () => {
  it('negative volume', () => {
    const plan = clone(seleniumPlan) as { steps: { volumeMl?: number }[] };
    plan.steps[1].volumeMl = -1;
    expectPlanError(plan, ['steps', 1, 'volumeMl'], /greater than zero/);
  });
  it('zero flask volume', () => {
    const plan = clone(seleniumPlan) as { steps: { flask?: { nominalMl: number } }[] };
    const flask = plan.steps[2].flask;
    if (flask) flask.nominalMl = 0;
    expectPlanError(plan, ['steps', 2, 'flask', 'nominalMl'], /greater than zero/);
  });
  it('aliquot larger than its flask', () => {
    const plan = clone(leadPlan) as { steps: { pipette?: { nominalMl: number }; volumeMl?: number }[] };
    plan.steps[2].volumeMl = 200;
    const pipette = plan.steps[2].pipette;
    if (pipette) pipette.nominalMl = 200;
    expectPlanError(plan, ['steps', 2, 'volumeMl'], /not smaller than the solution/);
  });
  it('aliquot larger than the flask it is made up in (a 25 mL aliquot into a 10 mL flask)', () => {
    // Common practice: a flask cannot be made up to a mark below the liquid already in it.
    const plan = clone(leadPlan) as {
      steps: { pipette?: { nominalMl: number }; flask?: { nominalMl: number }; volumeMl?: number }[];
    };
    plan.steps[2].volumeMl = 25;
    const pipette = plan.steps[2].pipette;
    if (pipette) pipette.nominalMl = 25;
    const flask = plan.steps[3].flask;
    if (flask) flask.nominalMl = 10;
    expectPlanError(plan, ['steps', 3, 'flask'], /aliquot \(25 mL\) does not fit in the 10 mL flask/);
  });
  it('a net mass below the scale interval of its balance (1e-7 g)', () => {
    // Common practice: a balance cannot read a mass smaller than one scale interval d.
    const plan = clone(leadPlan) as { steps: { netMassG?: number }[] };
    plan.steps[0].netMassG = 1e-7;
    expectPlanError(plan, ['steps', 0, 'netMassG'], /less than .* can read/);
  });
  it('purity above 1', () => {
    const plan = clone(leadPlan) as { steps: { material?: { purity: { massFraction: number } } }[] };
    const material = plan.steps[0].material;
    if (material) material.purity.massFraction = 1.2;
    expectPlanError(plan, ['steps', 0, 'material', 'purity', 'massFraction'], /cannot exceed 1/);
  });
  it('k ≤ 0', () => {
    const plan = clone(a1.plan) as { settings: { coverage: { k: number } } };
    plan.settings.coverage.k = 0;
    expectPlanError(plan, ['settings', 'coverage', 'k'], /coverage factor k must be greater than zero/);
  });
  it('unknown element', () => {
    const plan = clone(leadPlan) as { steps: { material?: { formula: string } }[] };
    const material = plan.steps[0].material;
    if (material) material.formula = 'Pb(NoO3)2';
    expectPlanError(plan, ['steps', 0, 'material', 'formula'], /"No" is not an element with a standard atomic weight/);
  });
  it('unknown unit', () => {
    const plan = clone(leadPlan) as { settings: { outputUnit: string } };
    plan.settings.outputUnit = 'ppb';
    expectPlanError(plan, ['settings', 'outputUnit'], /Unknown unit/);
  });
  it('mismatched unit (a molality asked for in mg/L)', () => {
    const plan = clone(readJson<{ settings: { outputUnit: string } }>('plans/sodium-chloride-molality.json'));
    plan.settings.outputUnit = 'mg/L';
    expectPlanError(plan, ['settings', 'outputUnit'], /molality/);
  });
  it('a dilution before anything is weighed', () => {
    const plan = clone(seleniumPlan) as { steps: unknown[] };
    plan.steps.shift();
    expectPlanError(plan, ['steps', 0, 'kind'], /takes an aliquot of a solution/);
  });
  it('an unknown step kind', () => {
    const plan = clone(seleniumPlan) as { steps: { kind: string }[] };
    plan.steps[1].kind = 'centrifuge';
    expectPlanError(plan, ['steps', 1, 'kind'], /kind is not known/);
  });
});

describe('warnings', () => {
  it('a net mass below the USP <41> minimum weight is a warning, not an error', () => {
    const plan = clone(leadPlan) as { steps: { netMassG?: number }[] };
    plan.steps[0].netMassG = 0.05;
    const result = evaluatePlan(plan as PlanInput);
    expect(result.warnings).toHaveLength(1);
    const [warning] = result.warnings;
    expect(warning).toMatchObject({
      code: 'belowMinimumWeight',
      stepIndex: 0,
      params: { balanceItemId: 'B-01', netMassG: 0.05 },
    });
    // B-01 in the fixture: s = 0.00005 g ≥ 0.41·d, so m_min = 2000·s = 0.100 g (USP <41>).
    if (warning.code !== 'belowMinimumWeight') throw new Error('expected the minimum-weight warning');
    expect(warning.params.minimumWeightG).toBeCloseTo(0.1, 12);
  });

  it('a net mass at or above the minimum weight raises none', () => {
    expect(evaluatePlan(leadPlan as PlanInput).warnings).toEqual([]);
  });
});
