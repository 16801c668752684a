import { PlanError, type PlanPathSegment } from './plan-error';

/**
 * The probability distribution of one elementary source of uncertainty.
 * All widths are in the unit of the quantity the source perturbs.
 *
 * - `normal`: standard uncertainty `standardUncertainty`, or expanded `expandedUncertainty` with `coverageFactor`.
 * - `rectangular`, `triangular`, `arcsine`: half-width `halfWidth` (a) about the estimate.
 * - `studentT`: Type A from n observations with sample standard deviation s;
 *   `meanOfReadings` true when the estimate is the mean of the n readings, false for a single new reading.
 */
export type Distribution =
  | { shape: 'normal'; standardUncertainty: number; degreesOfFreedom?: number }
  | { shape: 'normal'; expandedUncertainty: number; coverageFactor: number; degreesOfFreedom?: number }
  | { shape: 'rectangular'; halfWidth: number }
  | { shape: 'triangular'; halfWidth: number }
  | { shape: 'arcsine'; halfWidth: number }
  | { shape: 'studentT'; standardDeviation: number; observations: number; meanOfReadings: boolean };

/** Every distribution shape, as `Distribution['shape']` lists them. */
export const DISTRIBUTION_SHAPES = [
  'normal',
  'rectangular',
  'triangular',
  'arcsine',
  'studentT',
] as const satisfies readonly Distribution['shape'][];

/**
 * Standard uncertainty of a distribution.
 *
 * normal: u (or U/k); rectangular: a/√3 (JCGM 100:2008 4.3.7); triangular: a/√6 (JCGM 100:2008 4.3.9);
 * arcsine: a/√2 (JCGM 101:2008 6.4.6); Student t (Type A, JCGM 100:2008 4.2): s/√n for a mean of n readings, s for a single reading.
 *
 * @example standardUncertainty({ shape: 'rectangular', halfWidth: 0.0001 }) // 5.7735e-5
 */
export function standardUncertainty(distribution: Distribution): number {
  switch (distribution.shape) {
    case 'normal':
      return 'standardUncertainty' in distribution
        ? distribution.standardUncertainty
        : distribution.expandedUncertainty / distribution.coverageFactor;
    case 'rectangular':
      return distribution.halfWidth / Math.sqrt(3);
    case 'triangular':
      return distribution.halfWidth / Math.sqrt(6);
    case 'arcsine':
      return distribution.halfWidth / Math.SQRT2;
    case 'studentT':
      return distribution.meanOfReadings
        ? distribution.standardDeviation / Math.sqrt(distribution.observations)
        : distribution.standardDeviation;
  }
}

/**
 * Degrees of freedom ν of a source's standard uncertainty: n − 1 for Type A (JCGM 100:2008 4.2.6),
 * the stated value for a normal source that gives one, otherwise infinite (Type B taken as exactly known).
 */
export function degreesOfFreedom(distribution: Distribution): number {
  if (distribution.shape === 'studentT') return distribution.observations - 1;
  if (distribution.shape === 'normal' && distribution.degreesOfFreedom !== undefined)
    return distribution.degreesOfFreedom;
  return Infinity;
}

/** 'A' for statistical evaluation of a series of observations, 'B' for everything else (JCGM 100:2008 4.2, 4.3). */
export function evaluationType(distribution: Distribution): 'A' | 'B' {
  return distribution.shape === 'studentT' ? 'A' : 'B';
}

/**
 * Throws a PlanError when the distribution's parameters are not usable: widths must be finite and ≥ 0,
 * coverage factors > 0, a Type A source needs at least 2 observations.
 * @throws PlanError
 */
export function checkDistribution(distribution: Distribution, path: PlanPathSegment[]): void {
  const width = (name: string, value: number) => {
    if (!Number.isFinite(value) || value < 0) {
      throw new PlanError(
        [...path, name],
        `The ${name} of a ${distribution.shape} distribution must be zero or positive (got ${value}).`,
      );
    }
  };
  switch (distribution.shape) {
    case 'normal':
      if ('standardUncertainty' in distribution) width('standardUncertainty', distribution.standardUncertainty);
      else {
        width('expandedUncertainty', distribution.expandedUncertainty);
        if (!(distribution.coverageFactor > 0)) {
          throw new PlanError(
            [...path, 'coverageFactor'],
            `The coverage factor k must be greater than zero (got ${distribution.coverageFactor}).`,
          );
        }
      }
      if (distribution.degreesOfFreedom !== undefined && !(distribution.degreesOfFreedom >= 1)) {
        throw new PlanError(
          [...path, 'degreesOfFreedom'],
          `Degrees of freedom must be at least 1 (got ${distribution.degreesOfFreedom}).`,
        );
      }
      return;
    case 'rectangular':
    case 'triangular':
    case 'arcsine':
      width('halfWidth', distribution.halfWidth);
      return;
    case 'studentT':
      width('standardDeviation', distribution.standardDeviation);
      if (!Number.isInteger(distribution.observations) || distribution.observations < 2) {
        throw new PlanError(
          [...path, 'observations'],
          `A Type A evaluation needs at least 2 observations (got ${distribution.observations}).`,
        );
      }
  }
}
