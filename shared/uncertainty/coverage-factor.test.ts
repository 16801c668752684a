import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { coverageFactor, normalCumulative, studentTQuantile, twoSigmaProbability } from './coverage-factor';
import { logGamma } from './special-functions';

describe('coverage factors', () => {
  // JCGM 100:2008 Table G.2, printed to the digits shown there; tolerance half a unit of the last printed digit.
  const tableG2: [number, number, number][] = [
    [1, 13.97, 12.71],
    [2, 4.53, 4.3],
    [3, 3.31, 3.18],
    [4, 2.87, 2.78],
    [5, 2.65, 2.57],
    [10, 2.28, 2.23],
    [20, 2.13, 2.09],
    [50, 2.05, 2.01],
    [100, 2.025, 1.984],
    [Infinity, 2.0, 1.96],
  ];
  it.each(tableG2)('ν = %s: k(95.45 %%) = %s, k(95 %%) = %s (GUM, JCGM 100:2008 Table G.2)', (nu, k9545, k95) => {
    const digits = (value: number) => (String(value).split('.')[1] ?? '').length;
    const tolerance = (value: number) => 0.5 * 10 ** -Math.max(digits(value), 2) + 1e-12;
    expect(Math.abs(coverageFactor(twoSigmaProbability, nu) - k9545)).toBeLessThanOrEqual(tolerance(k9545));
    expect(Math.abs(coverageFactor(0.95, nu) - k95)).toBeLessThanOrEqual(tolerance(k95));
  });

  it('truncates a fractional ν_eff to the next lower integer (JCGM 100:2008 G.4.1, note)', () => {
    expect(coverageFactor(0.95, 10.9)).toBe(coverageFactor(0.95, 10));
  });

  // jstat 1.9.6 as an independent reference for t quantiles; its own inversion is good to about 1e-8.
  it.each([1, 2, 3, 7, 15, 30, 120])('t quantiles agree with jstat for ν = %s', (nu) => {
    for (const p of [0.6, 0.9, 0.975, 0.99, 0.999]) {
      expect(studentTQuantile(p, nu)).toBeCloseTo(jStat.studentt.inv(p, nu), 6);
    }
  });

  it('t quantile for ν = 1 equals tan(π(p − ½)) (Cauchy, analytic)', () => {
    expect(studentTQuantile(0.975, 1)).toBeCloseTo(Math.tan(Math.PI * 0.475), 11);
  });

  it('normal distribution function agrees with jstat and Φ(2) = 0.97724986805', () => {
    // Φ(2) to 11 digits: standard normal tables (e.g. Abramowitz & Stegun Table 26.1), from memory.
    expect(normalCumulative(2)).toBeCloseTo(0.97724986805, 10);
    for (const z of [-3, -1.2, 0, 0.5, 1.96, 4]) expect(normalCumulative(z)).toBeCloseTo(jStat.normal.cdf(z, 0, 1), 12);
  });

  it('log-gamma agrees with jstat and ln Γ(½) = ln √π', () => {
    expect(logGamma(0.5)).toBeCloseTo(Math.log(Math.sqrt(Math.PI)), 13);
    // Relative tolerance 1e-12: both are ~1e-15 approximations; large arguments magnify absolute differences.
    for (const x of [0.3, 1, 2.5, 10, 55.5])
      expect(Math.abs(logGamma(x) - jStat.gammaln(x))).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(logGamma(x))));
  });
});
