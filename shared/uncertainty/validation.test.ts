import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import type { Distribution } from './distributions';
import { propagate } from './gum-budget';
import { ModelBuilder } from './model-builder';
import { runMonteCarlo, type MonteCarloProgress } from './monte-carlo';
import { MAXIMUM_MONTE_CARLO_TRIALS } from './plan-limits';
import {
  checkGumByMonteCarlo,
  MINIMUM_VALIDATION_BATCHES,
  VALIDATION_SAFETY_FACTOR,
  validateAgainstGum,
} from './validation';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const additive = JSON.parse(readFileSync(new URL('engine/jcgm-101-additive-model.json', fixtures), 'utf8')) as {
  cases: { name: string; inputs: ('normal' | 'rectangular')[]; standardDeviations: number[] }[];
};

function sumModel(distributions: Distribution[]) {
  const builder = new ModelBuilder();
  const terms = distributions.map((distribution, index) =>
    builder.source({
      id: `x${index + 1}`,
      label: `X${index + 1}`,
      category: 'userDefined',
      estimate: 0,
      unit: '1',
      distribution,
      sharing: 'use',
      stepIndex: 0,
      path: [],
    }),
  );
  return builder.build(builder.sum(terms), '1', 'Y');
}

/** A JCGM 101:2008 §9.2 case of the fixture as a model (rectangular inputs given by their standard deviation). */
function additiveCase(name: RegExp) {
  const found = additive.cases.find((entry) => name.test(entry.name));
  if (!found) throw new Error(`No §9.2 case matches ${name}`);
  return sumModel(
    found.inputs.map((shape, index): Distribution => {
      const sigma = found.standardDeviations[index];
      return shape === 'normal'
        ? { shape: 'normal', standardUncertainty: sigma }
        : { shape: 'rectangular', halfWidth: sigma * Math.sqrt(3) };
    }),
  );
}

const seeds = Array.from({ length: 20 }, (_, index) => index + 1);

describe('the verdict from the adaptive procedure (JCGM 101:2008 7.9 run to the tolerance §8 needs)', () => {
  // JCGM 101:2008 §9.2 (from memory): Y = X₁ + X₂ + X₃ + X₄, all normal with σ = 1. GUM is exact for a linear model with
  // normal inputs, so the only difference between the intervals is Monte Carlo's own noise. u = 2.0, δ = 0.05.
  const normal = additiveCase(/four normal/);
  const normalBudget = propagate(normal, { probability: 0.95 });

  it('validates the all-normal §9.2 model for every one of 20 seeds', () => {
    const verdicts = seeds.map((seed) => checkGumByMonteCarlo(normal, normalBudget, { seed }));
    expect(verdicts).toHaveLength(20);
    for (const { monteCarlo, validation } of verdicts) {
      expect(validation.numericalTolerance).toBeCloseTo(0.05, 15);
      expect(validation).toMatchObject({ decided: true, passed: true });
      // Stopped by the rule: at least the minimum batches, ends known to δ/VALIDATION_SAFETY_FACTOR.
      expect(monteCarlo.adaptive?.batches).toBeGreaterThanOrEqual(MINIMUM_VALIDATION_BATCHES);
      expect(validation.intervalEndTolerance).toBeLessThanOrEqual(0.05 / VALIDATION_SAFETY_FACTOR);
    }
  });

  // The same model with σ = 1.75 per input: u = 3.5, δ = 0.05 still. The old verdict compared the GUM interval with one
  // fixed run of 200 000 trials, whose ends carry a standard error ≈ 2.67·u/√M ≈ 0.021 (from memory: √(p(1 − p)/M)/φ(1.96)),
  // under half of δ: with the same 20 seeds it said "not validated" for an exact GUM interval, by noise alone.
  it('validates an all-normal model with u = 3.5 for every one of 20 seeds, where one fixed run of 200 000 trials did not', () => {
    const wider = sumModel([1.75, 1.75, 1.75, 1.75].map((sigma) => ({ shape: 'normal', standardUncertainty: sigma })));
    const budget = propagate(wider, { probability: 0.95 });
    const verdicts = seeds.map((seed) => checkGumByMonteCarlo(wider, budget, { seed }).validation);
    expect(verdicts).toHaveLength(20);
    for (const validation of verdicts) expect(validation).toMatchObject({ decided: true, passed: true });
    const oldVerdicts = seeds.map((seed) =>
      validateAgainstGum(budget, runMonteCarlo(wider, { seed, trials: 200_000, coverageProbability: 0.95 })),
    );
    expect(oldVerdicts.filter((validation) => !validation.passed).length).toBeGreaterThan(0);
  });

  // JCGM 101:2008 §9.2 (from memory): X₄ rectangular with σ = 10, the others normal with σ = 1: GUM ±19.9, Monte Carlo
  // ±17.0, so the ends differ by ≈ 2.9 against δ = 0.5 (u = 10).
  it('does not validate the rectangular-dominated §9.2 model, for every one of 20 seeds', () => {
    const model = additiveCase(/one rectangular/);
    const budget = propagate(model, { probability: 0.95 });
    const verdicts = seeds.map((seed) => checkGumByMonteCarlo(model, budget, { seed }).validation);
    expect(verdicts).toHaveLength(20);
    for (const validation of verdicts) {
      expect(validation.numericalTolerance).toBeCloseTo(0.5, 15);
      expect(validation).toMatchObject({ decided: true, passed: false });
      expect(validation.lowEndDifference).toBeGreaterThan(2.5);
      expect(validation.highEndDifference).toBeGreaterThan(2.5);
    }
  });

  // One rectangular input with σ = 9 (half-width a = 9√3): GUM gives ±1.96·9 = ±17.6, Monte Carlo ±0.95·a = ±14.8
  // (JCGM 101:2008 §6.4.2, from memory: the p-quantiles of a rectangular are linear in p), ends 2.8 apart against
  // δ = 0.05. Ends known to δ/2 would take over 10⁶ trials; the verdict is clear after the minimum batches.
  it('stops after the minimum batches when an end is clearly outside δ, and says "not validated"', () => {
    const model = sumModel([{ shape: 'rectangular', halfWidth: 9 * Math.sqrt(3) }]);
    const budget = propagate(model, { probability: 0.95 });
    const { monteCarlo, validation } = checkGumByMonteCarlo(model, budget, { seed: 5 });
    expect(monteCarlo.trials).toBe(MINIMUM_VALIDATION_BATCHES * 10_000);
    expect(monteCarlo.adaptive?.converged).toBe(false);
    expect(validation).toMatchObject({ decided: true, passed: false });
    expect(validation.highEndDifference).toBeGreaterThan(2.5);
  });

  // Four normal inputs with σ = 4.5: u = 9.0, δ = 0.05 = u/180. The ends of a 95 % interval from M trials carry a standard
  // error ≈ 2.67·u/√M (from memory: √(p(1 − p)/M)/φ(1.96)), still ≈ δ/2 at 10⁶ trials: the rule cannot be met.
  it('says "not decided" when the trial limit comes before the ends are known to the tolerance', () => {
    const model = sumModel([4.5, 4.5, 4.5, 4.5].map((sigma) => ({ shape: 'normal', standardUncertainty: sigma })));
    const budget = propagate(model, { probability: 0.95 });
    const { monteCarlo, validation } = checkGumByMonteCarlo(model, budget, { seed: 7 });
    expect(monteCarlo.trials).toBe(MAXIMUM_MONTE_CARLO_TRIALS);
    expect(monteCarlo.adaptive?.converged).toBe(false);
    expect(validation).toMatchObject({ decided: false, passed: false });
    expect(validation.intervalEndTolerance).toBeGreaterThan(validation.numericalTolerance / VALIDATION_SAFETY_FACTOR);
  });

  it('gives the same verdict for the same seed, and reports its progress batch by batch', () => {
    const progress: MonteCarloProgress[] = [];
    const first = checkGumByMonteCarlo(normal, normalBudget, {
      seed: 3,
      onProgress: (step) => void progress.push(step),
    });
    expect(checkGumByMonteCarlo(normal, normalBudget, { seed: 3 })).toEqual(first);
    expect(progress.length).toBeGreaterThan(0);
    const last = progress[progress.length - 1];
    expect(last).toMatchObject({ finished: true, trialsDone: first.monteCarlo.trials });
    expect(last.batches).toEqual({
      done: first.monteCarlo.adaptive?.batches,
      minimum: MINIMUM_VALIDATION_BATCHES,
      maximum: MAXIMUM_MONTE_CARLO_TRIALS / 10_000,
    });
  });

  // A fixed k of 4 states p = 2Φ(4) − 1 = 99.9937 %: batches of ⌈100/(1 − p)⌉ ≈ 1.6·10⁶ trials (JCGM 101:2008 7.9.4),
  // more than the limit allows. The plan still computes; its verdict is not decided.
  it('is "not decided", not an error, when the coverage probability needs batches beyond the trial limit', () => {
    const budget = propagate(normal, { k: 4 });
    const { monteCarlo, validation } = checkGumByMonteCarlo(normal, budget, { seed: 1 });
    expect(monteCarlo.trials).toBe(MAXIMUM_MONTE_CARLO_TRIALS);
    expect(validation).toMatchObject({ decided: false, passed: false });
  });
});
