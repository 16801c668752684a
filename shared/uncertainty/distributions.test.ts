import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import { degreesOfFreedom, standardUncertainty } from './distributions';
import { PlanError } from './plan-error';
import { checkDistribution } from './distributions';

describe('standard uncertainty of each distribution', () => {
  // JCGM 100:2008 4.3.7: rectangular of half-width a has u = a/√3; checked against jstat's uniform variance.
  it('rectangular: a/√3', () => {
    expect(standardUncertainty({ shape: 'rectangular', halfWidth: 0.1 })).toBeCloseTo(0.1 / Math.sqrt(3), 15);
    expect(standardUncertainty({ shape: 'rectangular', halfWidth: 1 })).toBeCloseTo(
      Math.sqrt(jStat.uniform.variance(-1, 1)),
      14,
    );
  });
  // JCGM 100:2008 4.3.9: symmetric triangular of half-width a has u = a/√6; jstat triangular(a, b, c) as reference.
  it('triangular: a/√6', () => {
    expect(standardUncertainty({ shape: 'triangular', halfWidth: 0.1 })).toBeCloseTo(0.0408248290463863, 15);
    expect(standardUncertainty({ shape: 'triangular', halfWidth: 1 })).toBeCloseTo(
      Math.sqrt(jStat.triangular.variance(-1, 1, 0)),
      14,
    );
  });
  // JCGM 101:2008 6.4.6: arcsine (U-shaped) of half-width a has u = a/√2; jstat arcsine(a, b) as reference.
  it('arcsine: a/√2', () => {
    expect(standardUncertainty({ shape: 'arcsine', halfWidth: 1 })).toBeCloseTo(
      Math.sqrt(jStat.arcsine.variance(-1, 1)),
      14,
    );
  });
  // JCGM 100:2008 4.3.3: an expanded uncertainty U with coverage factor k gives u = U/k.
  it('normal from U and k', () => {
    expect(standardUncertainty({ shape: 'normal', expandedUncertainty: 0.2, coverageFactor: 2 })).toBe(0.1);
  });
  // JCGM 100:2008 4.2.3 and 4.2.6: the mean of n readings has u = s/√n with ν = n − 1.
  it('Type A: s/√n for a mean, s for a single reading, ν = n − 1', () => {
    const mean = { shape: 'studentT', standardDeviation: 0.02, observations: 4, meanOfReadings: true } as const;
    expect(standardUncertainty(mean)).toBeCloseTo(0.01, 15);
    expect(standardUncertainty({ ...mean, meanOfReadings: false })).toBe(0.02);
    expect(degreesOfFreedom(mean)).toBe(3);
    expect(degreesOfFreedom({ shape: 'rectangular', halfWidth: 1 })).toBe(Infinity);
  });
  it('rejects a non-positive coverage factor with a path', () => {
    expect(() =>
      checkDistribution({ shape: 'normal', expandedUncertainty: 1, coverageFactor: 0 }, ['steps', 0]),
    ).toThrow(PlanError);
    try {
      checkDistribution({ shape: 'normal', expandedUncertainty: 1, coverageFactor: -1 }, ['steps', 0]);
    } catch (error) {
      expect((error as PlanError).path).toEqual(['steps', 0, 'coverageFactor']);
    }
  });
});
