import { describe, expect, it } from 'vitest';
import { coverageFactor, twoSigmaProbability } from './coverage-factor';
import { formatDegreesOfFreedom, truncateDegreesOfFreedom } from './effective-degrees';

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
