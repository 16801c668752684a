import { truncateDegreesOfFreedom } from './effective-degrees';
import { regularizedIncompleteBeta, regularizedLowerGamma } from './special-functions';

/** The coverage probability of ±2σ of a normal distribution, 2Φ(2) − 1, which the GUM writes as 95.45 %. */
export const twoSigmaProbability = 0.9544997361036416;

/**
 * Largest fixed coverage factor the engine accepts. Monte Carlo states its intervals at p = 2Φ(k) − 1, and
 * from k ≈ 8.3 on that rounds to exactly 1 in double precision, where no interval exists; 8 keeps a margin.
 * The lab policy's limit is this same constant.
 */
export const MAXIMUM_COVERAGE_FACTOR = 8;

/**
 * Standard normal distribution function Φ(z) = ½[1 + P(½, z²/2)·sign z].
 * @example normalCumulative(2) // 0.9772498680518208
 */
export function normalCumulative(z: number): number {
  const half = 0.5 * regularizedLowerGamma(0.5, (z * z) / 2);
  return z >= 0 ? 0.5 + half : 0.5 - half;
}

/**
 * Student-t distribution function with ν degrees of freedom:
 * F(t) = 1 − ½·I_{ν/(ν+t²)}(ν/2, ½) for t ≥ 0, and F(−t) = 1 − F(t).
 * ν = Infinity gives Φ(t).
 */
export function studentTCumulative(t: number, degreesOfFreedom: number): number {
  if (degreesOfFreedom === Infinity) return normalCumulative(t);
  const tail =
    0.5 * regularizedIncompleteBeta(degreesOfFreedom / (degreesOfFreedom + t * t), degreesOfFreedom / 2, 0.5);
  return t >= 0 ? 1 - tail : tail;
}

/**
 * Quantile t such that F(t) = probability, by bisection on the distribution function
 * (to a relative width of 1e-15). Valid for 0 < probability < 1, ν > 0 or Infinity.
 * @example studentTQuantile(0.975, 10) // 2.2281388519649
 */
export function studentTQuantile(probability: number, degreesOfFreedom: number): number {
  if (!(probability > 0 && probability < 1)) throw new RangeError(`probability must lie in (0, 1), got ${probability}`);
  if (probability < 0.5) return -studentTQuantile(1 - probability, degreesOfFreedom);
  let low = 0;
  let high = 1;
  while (studentTCumulative(high, degreesOfFreedom) < probability) high *= 2;
  for (let iteration = 0; iteration < 200 && high - low > 1e-15 * high; iteration += 1) {
    const middle = 0.5 * (low + high);
    if (studentTCumulative(middle, degreesOfFreedom) < probability) low = middle;
    else high = middle;
  }
  return 0.5 * (low + high);
}

/**
 * Coverage factor k = t_p(ν) for a two-sided coverage probability p (JCGM 100:2008 G.3, G.4):
 * the (1 + p)/2 quantile of Student's t with ν degrees of freedom, ν truncated to the next
 * lower integer (JCGM 100:2008 G.4.1, note; see truncateDegreesOfFreedom) and at least 1; ν = ∞ gives the normal quantile.
 * @example coverageFactor(twoSigmaProbability, 10) // 2.28 (JCGM 100:2008 Table G.2)
 */
export function coverageFactor(coverageProbability: number, effectiveDegreesOfFreedom: number): number {
  return studentTQuantile((1 + coverageProbability) / 2, truncateDegreesOfFreedom(effectiveDegreesOfFreedom));
}

/** Two-sided coverage probability of ±k for a normal distribution, 2Φ(k) − 1 (used when the plan fixes k). */
export function normalCoverageProbability(k: number): number {
  return 2 * normalCumulative(k) - 1;
}
