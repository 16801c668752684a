import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { numericalTolerance } from './coverage-interval';
import type { Distribution } from './distributions';
import { evaluatePlan } from './evaluate-plan';
import { propagate } from './gum-budget';
import { ModelBuilder } from './model-builder';
import { runMonteCarlo, startMonteCarlo } from './monte-carlo';
import type { PlanInput } from './plan-schema';
import { validateAgainstGum } from './validation';

const fixtures = new URL('../../tests/fixtures/', import.meta.url);
const readJson = <T>(relative: string): T => JSON.parse(readFileSync(new URL(relative, fixtures), 'utf8')) as T;

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

const rectangularWithStandardDeviation = (sigma: number): Distribution => ({
  shape: 'rectangular',
  halfWidth: sigma * Math.sqrt(3),
});

describe('Monte Carlo against JCGM 101:2008', () => {
  const additive = readJson<{
    cases: {
      name: string;
      inputs: ('normal' | 'rectangular')[];
      standardDeviations: number[];
      gumStandardUncertainty: number;
      gumHalfWidth: number;
      monteCarloHalfWidth: number;
    }[];
  }>('engine/jcgm-101-additive-model.json');

  // Tolerance: half a unit of the printed last digit plus 4 Monte Carlo standard errors of a 97.5 % quantile
  // with M = 10⁶ (≈ 0.005·σ_Y), i.e. 0.005 + 0.02·u for two-decimal values.
  it('reads the three §9.2 cases (so the checks below are not vacuous)', () => {
    expect(additive.cases).toHaveLength(3);
  });
  it.each(additive.cases)(
    '§9.2 additive model: $name',
    ({ inputs, standardDeviations, gumStandardUncertainty, gumHalfWidth, monteCarloHalfWidth }) => {
      const distributions = inputs.map((shape, index): Distribution =>
        shape === 'normal'
          ? { shape: 'normal', standardUncertainty: standardDeviations[index] }
          : rectangularWithStandardDeviation(standardDeviations[index]),
      );
      const model = sumModel(distributions);
      const gum = propagate(model, { probability: 0.95 });
      const printed = (value: number) => 0.5 * 10 ** -(String(value).split('.')[1] ?? '').length;
      expect(Math.abs(gum.standardUncertainty - gumStandardUncertainty)).toBeLessThanOrEqual(
        printed(gumStandardUncertainty) + 1e-12,
      );
      expect(Math.abs(gum.expandedUncertainty - gumHalfWidth)).toBeLessThanOrEqual(printed(gumHalfWidth) + 1e-12);
      const monteCarlo = runMonteCarlo(model, { trials: 1_000_000, seed: 101, coverageProbability: 0.95 });
      const halfWidth = (monteCarlo.symmetricInterval.high - monteCarlo.symmetricInterval.low) / 2;
      expect(Math.abs(halfWidth - monteCarloHalfWidth)).toBeLessThanOrEqual(
        printed(monteCarloHalfWidth) + 0.005 * gum.standardUncertainty * 4,
      );
    },
  );

  // Analytic: one rectangular input of half-width a has the 95 % interval ±0.95·a.
  it('a single rectangular input gives ±0.95·a', () => {
    const result = runMonteCarlo(sumModel([{ shape: 'rectangular', halfWidth: 2 }]), {
      trials: 1_000_000,
      seed: 3,
      coverageProbability: 0.95,
    });
    // Quantile standard error for a uniform: √(p(1 − p)/M)·2a ≈ 6e-4; tolerance 4 of them.
    expect(result.symmetricInterval.high).toBeCloseTo(1.9, 2);
    expect(Math.abs(result.symmetricInterval.low + 1.9)).toBeLessThanOrEqual(0.0025);
    expect(Math.abs(result.shortestInterval.high - result.shortestInterval.low - 3.8)).toBeLessThanOrEqual(0.005);
  });

  // Analytic: the sum of two equal rectangulars (half-width a) is triangular on ±2a, whose 95 % symmetric
  // interval is ±2a(1 − √0.05).
  it('the sum of two equal rectangulars is triangular', () => {
    const a = 1;
    const result = runMonteCarlo(
      sumModel([
        { shape: 'rectangular', halfWidth: a },
        { shape: 'rectangular', halfWidth: a },
      ]),
      {
        trials: 1_000_000,
        seed: 4,
        coverageProbability: 0.95,
      },
    );
    const expected = 2 * a * (1 - Math.sqrt(0.05));
    expect(Math.abs(result.symmetricInterval.high - expected)).toBeLessThanOrEqual(0.004);
    expect(Math.abs(result.symmetricInterval.low + expected)).toBeLessThanOrEqual(0.004);
    expect(Math.abs(result.standardDeviation - Math.sqrt(2 / 3))).toBeLessThanOrEqual(0.003);
  });

  it('x − x has zero spread', () => {
    const builder = new ModelBuilder();
    const x = builder.source({
      id: 'x',
      label: 'x',
      category: 'userDefined',
      estimate: 5,
      unit: '1',
      distribution: { shape: 'normal', standardUncertainty: 1 },
      sharing: 'use',
      stepIndex: 0,
      path: [],
    });
    const result = runMonteCarlo(builder.build(builder.subtract(x, x), '1', 'x − x'), { trials: 1000, seed: 1 });
    expect(result.standardDeviation).toBe(0);
  });

  // JCGM 101:2008 §7.9.2 (from memory): u = 0.835 written to two significant digits is 84 × 10⁻², so δ = ½ × 10⁻² = 0.005.
  it('numerical tolerance δ from significant digits', () => {
    expect(numericalTolerance(0.835, 2)).toBeCloseTo(0.005, 15);
    expect(numericalTolerance(12.3, 1)).toBeCloseTo(5, 12);
  });
});

describe('Monte Carlo on plans', () => {
  const a1 = readJson<{ plan: PlanInput }>('engine/eurachem-cg4-a1.json').plan;
  const selenium = readJson<PlanInput>('plans/selenium-working-standard.json');

  it('the same seed gives the same numbers, whether run at once or in small pieces', () => {
    const once = runMonteCarlo(selenium, { trials: 50_000, seed: 77 });
    const run = startMonteCarlo(selenium, { trials: 50_000, seed: 77 });
    let progress = run.advance(1000);
    while (!progress.finished) progress = run.advance(3000);
    expect(run.result()).toEqual(once);
    expect(runMonteCarlo(selenium, { trials: 50_000, seed: 78 }).mean).not.toBe(once.mean);
  });

  it('can be cancelled from the progress callback', () => {
    expect(() => runMonteCarlo(selenium, { trials: 1_000_000, seed: 1, onProgress: () => false })).toThrow(/cancelled/);
  });

  // Invariant: for a near-linear chain GUM and Monte Carlo agree. EURACHEM/CITAC CG4 3rd ed. Example A1 is near-linear (relative u 8e-4);
  // its MC standard deviation must match u_c within 4 standard errors (u·√(2/M) for M = 2·10⁵) and the mean y within 4·u/√M.
  it('GUM and Monte Carlo agree for EURACHEM/CITAC CG4 Example A1', () => {
    const gum = evaluatePlan(a1);
    const trials = 200_000;
    const monteCarlo = runMonteCarlo(a1, { trials, seed: 2012 });
    expect(Math.abs(monteCarlo.standardDeviation - gum.standardUncertainty)).toBeLessThanOrEqual(
      4 * gum.standardUncertainty * Math.sqrt(2 / trials),
    );
    expect(Math.abs(monteCarlo.mean - gum.value)).toBeLessThanOrEqual(
      (4 * gum.standardUncertainty) / Math.sqrt(trials),
    );
  });

  it('validation (JCGM 101:2008 §8) passes for an all-normal linear model and reports both end differences', () => {
    const model = sumModel([
      { shape: 'normal', standardUncertainty: 1 },
      { shape: 'normal', standardUncertainty: 2 },
    ]);
    const gum = propagate(model, { probability: 0.95 });
    const monteCarlo = runMonteCarlo(model, { trials: 1_000_000, seed: 9, coverageProbability: 0.95 });
    const validation = validateAgainstGum(gum, monteCarlo, 1);
    // u = √5 = 2.2 → one significant digit, δ = 0.5 (JCGM 101:2008 §7.9.2, from memory).
    expect(validation.numericalTolerance).toBe(0.5);
    expect(validation.passed).toBe(true);
    expect(validation.lowEndDifference).toBeLessThan(0.05);
  });

  it('validation fails where JCGM 101:2008 §9.2 says the GUM interval is too wide (dominant rectangular input)', () => {
    const model = sumModel([{ shape: 'normal', standardUncertainty: 1 }, rectangularWithStandardDeviation(10)]);
    const gum = propagate(model, { probability: 0.95 });
    const monteCarlo = runMonteCarlo(model, { trials: 200_000, seed: 10, coverageProbability: 0.95 });
    expect(validateAgainstGum(gum, monteCarlo).passed).toBe(false);
  });

  // JCGM 101:2008 §7.9.4 (from memory): the adaptive procedure stops when 2·s of the batch results ≤ δ; the final u must then lie
  // within δ of the analytic value (here u_c of A1 computed by GUM, exact for this near-linear model to < 1e-4 relative).
  it('the adaptive procedure converges to the stated tolerance', () => {
    const gum = evaluatePlan(a1);
    const result = runMonteCarlo(a1, { adaptive: { significantDigits: 2 }, seed: 5 });
    expect(result.adaptive?.converged).toBe(true);
    expect(result.adaptive?.batchSize).toBe(10_000);
    expect(result.trials % 10_000).toBe(0);
    expect(Math.abs(result.standardDeviation - gum.standardUncertainty)).toBeLessThanOrEqual(
      result.adaptive?.numericalTolerance ?? 0,
    );
  });

  it('returns its seed and trial count and a histogram of every trial', () => {
    const result = runMonteCarlo(selenium, { trials: 10_001, seed: 12, histogramBins: 20 });
    expect(result.seed).toBe(12);
    expect(result.trials).toBe(10_001);
    expect(result.histogram.counts.reduce((sum, count) => sum + count, 0)).toBe(10_001);
  });
});

describe('coverage intervals from partly ordered outputs', () => {
  it('orderTails gives the same intervals as a full sort', async () => {
    const { orderTails, shortestInterval, symmetricInterval } = await import('./coverage-interval');
    const { RandomGenerator } = await import('./random-generator');
    const random = new RandomGenerator(99);
    for (const size of [10, 101, 5000, 100_003]) {
      const values = Float64Array.from({ length: size }, () => random.nextUniform() ** 3);
      const sorted = values.slice().sort();
      for (const p of [0.95, 0.9545, 0.5, 0.99]) {
        const ordered = values.slice();
        orderTails(ordered, p);
        expect(symmetricInterval(ordered, p)).toEqual(symmetricInterval(sorted, p));
        expect(shortestInterval(ordered, p)).toEqual(shortestInterval(sorted, p));
        expect([ordered[0], ordered[size - 1]]).toEqual([sorted[0], sorted[size - 1]]);
      }
    }
  });

  // The postcondition itself (M − q smallest sorted in front, M − q largest sorted at the back), also for ties,
  // a constant output and a narrow spike on a wide range, where the counting cells are very uneven.
  it('orderTails leaves both tails exactly as a full sort would', async () => {
    const { coveredCount, orderTails } = await import('./coverage-interval');
    const { RandomGenerator } = await import('./random-generator');
    const random = new RandomGenerator(7);
    const cases = [
      Float64Array.from({ length: 20_000 }, () => Math.floor(random.nextUniform() * 5)),
      new Float64Array(1000).fill(2.5),
      Float64Array.from({ length: 30_001 }, (_, index) =>
        index % 1000 === 0 ? 1e6 * (random.nextUniform() - 0.5) : random.nextUniform(),
      ),
    ];
    for (const values of cases) {
      const sorted = values.slice().sort();
      for (const p of [0.95, 0.9545, 0.99]) {
        const ordered = values.slice();
        orderTails(ordered, p);
        const tail = values.length - coveredCount(values.length, p);
        expect(Array.from(ordered.subarray(0, tail))).toEqual(Array.from(sorted.subarray(0, tail)));
        expect(Array.from(ordered.subarray(values.length - tail))).toEqual(
          Array.from(sorted.subarray(values.length - tail)),
        );
        expect(ordered.slice().sort()).toEqual(sorted);
      }
    }
  });
});
