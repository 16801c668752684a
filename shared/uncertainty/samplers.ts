import type { Distribution } from './distributions';
import { fillNormal } from './normal-ziggurat';
import type { RandomGenerator } from './random-generator';

const twoPi = 2 * Math.PI;
const wordToUniform = 2.3283064365386963e-10; // 2⁻³²
const signOffset = 2147483648; // 2³¹: a signed word k plus 2³¹ is the unsigned word

/**
 * Fills `target[0..count)` with draws of `estimate + deviation` for one source (JCGM 101:2008 §6.4):
 * normal by the ziggurat method (normal-ziggurat.ts); rectangular a(2r − 1); symmetric triangular
 * a(r₁ + r₂ − 1); arcsine a·sin(2πr); Student t (Type A, JCGM 101:2008 6.4.9) as scale·t_ν with ν = n − 1,
 * scale s/√n for a mean of n readings or s for a single reading, t_ν by Bailey's polar method. A normal source
 * with finite degrees of freedom ν (a certificate stating U, k and ν) is a scaled and shifted t_ν with scale
 * u = U/k (JCGM 101:2008 6.4.9.7, from memory), drawn the same way, so Monte Carlo uses the ν that GUM uses.
 * Uniforms r = (k + ½)/2³² come from the generator's 32-bit words k, in order: for each source `count` words
 * (2·count for triangular), then any extra words the ziggurat's rare slow path or the polar method needs.
 * `words` is scratch of length ≥ 2·count (bulk words, or the ziggurat's set-aside draws).
 */
export function fillSamples(
  target: Float64Array,
  count: number,
  estimate: number,
  distribution: Distribution,
  random: RandomGenerator,
  words: Int32Array = new Int32Array(2 * count),
): void {
  switch (distribution.shape) {
    case 'normal': {
      const u =
        'standardUncertainty' in distribution
          ? distribution.standardUncertainty
          : distribution.expandedUncertainty / distribution.coverageFactor;
      const nu = distribution.degreesOfFreedom ?? Infinity;
      if (Number.isFinite(nu)) fillStudentT(target, count, estimate, u, nu, random);
      else fillNormal(target, count, estimate, u, random, words);
      return;
    }
    case 'rectangular': {
      const width = 2 * distribution.halfWidth * wordToUniform;
      const low = estimate - distribution.halfWidth + (signOffset + 0.5) * width;
      random.fillAffine(target, count, low, width);
      return;
    }
    case 'triangular': {
      const a = distribution.halfWidth;
      const scale = a * wordToUniform;
      const low = estimate - a + (2 * signOffset + 1) * scale;
      random.fillAffineOfPairSums(target, count, low, scale);
      return;
    }
    case 'arcsine': {
      const a = distribution.halfWidth;
      random.fillInt32(words, count);
      for (let index = 0; index < count; index += 1)
        target[index] = estimate + a * Math.sin(twoPi * (words[index] + signOffset + 0.5) * wordToUniform);
      return;
    }
    case 'studentT': {
      const scale = distribution.meanOfReadings
        ? distribution.standardDeviation / Math.sqrt(distribution.observations)
        : distribution.standardDeviation;
      fillStudentT(target, count, estimate, scale, distribution.observations - 1, random);
    }
  }
}

/**
 * Fills `target[0..count)` with estimate + scale·t_ν, t_ν by Bailey's polar method (Bailey, Math. Comp. 62 (1994)
 * 779, from memory): (u, v) uniform in the unit disc, w = u² + v², t = u·√(ν(w^(−2/ν) − 1)/w). Valid for any real ν > 0.
 */
function fillStudentT(
  target: Float64Array,
  count: number,
  estimate: number,
  scale: number,
  nu: number,
  random: RandomGenerator,
): void {
  for (let index = 0; index < count; index += 1) {
    let u: number;
    let w: number;
    do {
      u = 2 * random.nextUniform() - 1;
      const v = 2 * random.nextUniform() - 1;
      w = u * u + v * v;
    } while (w >= 1);
    target[index] = estimate + scale * u * Math.sqrt((nu * (w ** (-2 / nu) - 1)) / w);
  }
}
