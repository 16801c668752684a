import { describe, expect, it } from 'vitest';
import { studentTQuantile } from './coverage-factor';
import type { Distribution } from './distributions';
import { propagate } from './gum-budget';
import { ModelBuilder } from './model-builder';
import { runMonteCarlo } from './monte-carlo';

/** Y = X₁ + … with every Xᵢ of estimate 10 in step 1. */
function sumModel(distributions: Distribution[]) {
  const builder = new ModelBuilder();
  const terms = distributions.map((distribution, index) =>
    builder.source({
      id: `x${index + 1}`,
      label: `Certificate value ${index + 1}`,
      category: 'userDefined',
      estimate: 10,
      unit: 'mg/L',
      distribution,
      sharing: 'use',
      stepIndex: 0,
      path: [],
    }),
  );
  return builder.build(builder.sum(terms), 'mg/L', 'Y');
}

describe('a certificate input with finite degrees of freedom', () => {
  // A certificate stating U = 0.5 mg/L with k = 2.57 (t at 95 % for ν = 5, JCGM 100:2008 Table G.2) and ν = 5.
  const certificate: Distribution = {
    shape: 'normal',
    expandedUncertainty: 0.5,
    coverageFactor: 2.57,
    degreesOfFreedom: 5,
  };
  const scale = 0.5 / 2.57;
  const trials = 1_000_000;
  const model = sumModel([certificate]);
  const monteCarlo = runMonteCarlo(model, { trials, seed: 12, coverageProbability: 0.95 });

  // JCGM 101:2008 6.4.9.7 (from memory): a scaled and shifted t_ν with scale U/k, whose variance is (U/k)²·ν/(ν − 2).
  // Tolerance: the sample variance of t₅ (excess kurtosis 6/(ν − 4) = 6) has relative standard error √(8/M) ≈ 0.28 %;
  // 4 of them. A normal draw (variance (U/k)², 40 % lower) is far outside it.
  it('is drawn by Monte Carlo as a t with ν degrees of freedom and scale U/k (variance (U/k)²·ν/(ν − 2))', () => {
    const expectedVariance = scale ** 2 * (5 / 3);
    expect(Math.abs(monteCarlo.standardDeviation ** 2 / expectedVariance - 1)).toBeLessThanOrEqual(
      4 * Math.sqrt(8 / trials),
    );
    expect(Math.abs(monteCarlo.mean - 10)).toBeLessThanOrEqual((4 * scale * Math.sqrt(5 / 3)) / Math.sqrt(trials));
  });

  // The 97.5 % quantile of t₅ is 2.57 (JCGM 100:2008 Table G.2, 95 %, ν = 5), so the 95 % interval is 10 ± 2.57·U/k = 10 ± 0.5.
  // Quantile standard error √(p(1 − p)/M)/f(t) with f(2.5706) ≈ 0.0218 for t₅: ≈ 0.0072·scale ≈ 0.0014 mg/L; 4 of them.
  it('gives the certificate’s own 95 % interval back', () => {
    const halfWidth = studentTQuantile(0.975, 5) * scale;
    expect(Math.abs(monteCarlo.symmetricInterval.high - (10 + halfWidth))).toBeLessThanOrEqual(0.006);
    expect(Math.abs(monteCarlo.symmetricInterval.low - (10 - halfWidth))).toBeLessThanOrEqual(0.006);
  });

  // JCGM 100:2008 G.4: the GUM side is unchanged, u = U/k and ν = 5 (Welch–Satterthwaite of one source).
  it('leaves the GUM side as it was: u = U/k, ν_eff = ν, k = t₉₅(5) = 2.57', () => {
    const budget = propagate(model, { probability: 0.95 });
    expect(budget.standardUncertainty).toBe(scale);
    expect(budget.effectiveDegreesOfFreedom).toBeCloseTo(5, 12);
    expect(budget.coverageFactor.toFixed(2)).toBe('2.57');
  });

  it('without ν stays normal (variance (U/k)², JCGM 101:2008 6.4.7)', () => {
    const normal = runMonteCarlo(sumModel([{ shape: 'normal', expandedUncertainty: 0.5, coverageFactor: 2.57 }]), {
      trials,
      seed: 12,
      coverageProbability: 0.95,
    });
    // Sample variance of a normal: relative standard error √(2/M); 4 of them.
    expect(Math.abs(normal.standardDeviation ** 2 / scale ** 2 - 1)).toBeLessThanOrEqual(4 * Math.sqrt(2 / trials));
  });
});

describe('Student t inputs with 2 or fewer degrees of freedom', () => {
  // JCGM 101:2008 6.4.9 (from memory): the variance ν/(ν − 2)·s² of a t input exists only for ν > 2, i.e. n > 3 readings.
  // The engine keeps such inputs (their quantiles, hence the coverage interval, exist) and warns.
  const typeA = (observations: number): Distribution => ({
    shape: 'studentT',
    standardDeviation: 0.02,
    observations,
    meanOfReadings: false,
  });

  it('warns once per step, naming the sources, when a Type A input rests on 3 readings (ν = 2)', () => {
    const model = sumModel([typeA(3), typeA(2), typeA(10)]);
    expect(model.warnings).toHaveLength(1);
    const [warning] = model.warnings;
    expect(warning).toEqual({
      code: 'infiniteMonteCarloVariance',
      stepIndex: 0,
      params: { sourceLabels: ['Certificate value 1', 'Certificate value 2'], degreesOfFreedom: 1 },
    });
  });

  it('warns for a certificate that states ν = 2, and not for 4 readings (ν = 3) or ν = 2.5', () => {
    const certificate = (degreesOfFreedom: number): Distribution => ({
      shape: 'normal',
      standardUncertainty: 1,
      degreesOfFreedom,
    });
    expect(sumModel([certificate(2)]).warnings.map((warning) => warning.code)).toEqual(['infiniteMonteCarloVariance']);
    expect(sumModel([typeA(4), certificate(2.5)]).warnings).toEqual([]);
  });

  it('still gives a coverage interval: t₂ has finite quantiles (95 %: ±4.30·s, JCGM 100:2008 Table G.2)', () => {
    const result = runMonteCarlo(sumModel([typeA(3)]), { trials: 1_000_000, seed: 14, coverageProbability: 0.95 });
    // t₂ quantile standard error √(p(1 − p)/M)/f(4.303) with f ≈ 0.0190: ≈ 0.0082·s; 4 of them ≈ 0.00066.
    expect(Math.abs(result.symmetricInterval.high - (10 + 4.303 * 0.02))).toBeLessThanOrEqual(0.0007);
  });
});
