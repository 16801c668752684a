import { describe, expect, it } from 'vitest';
import { coverageFactor, twoSigmaProbability } from './coverage-factor';
import { formatDegreesOfFreedom, truncateDegreesOfFreedom } from './effective-degrees';
import { propagate } from './gum-budget';
import { ModelBuilder } from './model-builder';

// JCGM 100:2008 (GUM) G.4.1 Note 1 and G.6.4: a non-integer ν_eff is truncated to the next lower integer.
describe('the one rule for ν_eff', () => {
  it('truncates to the next lower integer, never rounds (8.7 → 8), keeps ∞ and never goes below 1', () => {
    expect(truncateDegreesOfFreedom(8.7)).toBe(8);
    expect(truncateDegreesOfFreedom(8.01)).toBe(8);
    expect(truncateDegreesOfFreedom(9)).toBe(9);
    expect(truncateDegreesOfFreedom(Infinity)).toBe(Infinity);
    expect(truncateDegreesOfFreedom(0.6)).toBe(1);
  });

  it('prints the same whole number the coverage factor is read at, or ∞', () => {
    expect(formatDegreesOfFreedom(8.7)).toBe('8');
    expect(formatDegreesOfFreedom(41.9)).toBe('41');
    expect(formatDegreesOfFreedom(Infinity)).toBe('∞');
    // k at 8.7 is k at 8 (2.37 in JCGM 100:2008 Table G.2 for p = 95.45 %), not k at 9 (2.32); analytic, so exact equality.
    expect(coverageFactor(twoSigmaProbability, 8.7)).toBe(coverageFactor(twoSigmaProbability, 8));
    expect(coverageFactor(twoSigmaProbability, 8.7)).not.toBe(coverageFactor(twoSigmaProbability, 9));
    expect(coverageFactor(twoSigmaProbability, 8).toFixed(2)).toBe('2.37');
  });
});

describe('ν_eff a few ulps below a whole number', () => {
  // One Type A source: s = 0.007 from n = 5 readings, the mean used (u = s/√5, ν = 4). Welch–Satterthwaite
  // (JCGM 100:2008 G.4.1) gives exactly 4 in real arithmetic, but u⁴/(u⁴/4) rounds to 3.9999999999999996 here.
  const builder = new ModelBuilder();
  const reading = builder.source({
    id: 'readings',
    label: 'mean of 5 readings',
    category: 'userDefined',
    estimate: 1,
    unit: '1',
    distribution: { shape: 'studentT', standardDeviation: 0.007, observations: 5, meanOfReadings: true },
    sharing: 'use',
    stepIndex: 0,
    path: [],
  });
  const budget = propagate(builder.build(reading, '1', 'Y'), { probability: 0.95 });

  it('the inputs really give 3.9999999999999996 (so the check below is not vacuous)', () => {
    expect(budget.effectiveDegreesOfFreedom).toBe(3.9999999999999996);
  });

  // JCGM 100:2008 Table G.2, p = 95 %: ν = 4 → t = 2.78 (ν = 3 would give 3.18).
  it('reads k at ν = 4 (2.78), not at ν = 3 (3.18)', () => {
    expect(truncateDegreesOfFreedom(budget.effectiveDegreesOfFreedom)).toBe(4);
    expect(budget.coverageFactor.toFixed(2)).toBe('2.78');
    expect(formatDegreesOfFreedom(budget.effectiveDegreesOfFreedom)).toBe('4');
  });
});
