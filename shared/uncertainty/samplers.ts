import type { Distribution } from './distributions';
import { nextStandardNormal } from './normal-ziggurat';
import type { RandomGenerator } from './random-generator';

const twoPi = 2 * Math.PI;

/**
 * Fills `target[0..count)` with draws of `estimate + deviation` for one source (JCGM 101 §6.4):
 * normal by the ziggurat method (normal-ziggurat.ts); rectangular a(2r − 1); symmetric triangular
 * a(r₁ + r₂ − 1); arcsine a·sin(2πr); Student t (Type A, JCGM 101 6.4.9) as scale·t_ν with ν = n − 1,
 * scale s/√n for a mean of n readings or s for a single reading, t_ν by Bailey's polar method.
 */
export function fillSamples(target: Float64Array, count: number, estimate: number, distribution: Distribution, random: RandomGenerator): void {
  switch (distribution.shape) {
    case 'normal': {
      const u = 'standardUncertainty' in distribution ? distribution.standardUncertainty : distribution.expandedUncertainty / distribution.coverageFactor;
      for (let index = 0; index < count; index += 1) target[index] = estimate + u * nextStandardNormal(random);
      return;
    }
    case 'rectangular': {
      const width = 2 * distribution.halfWidth;
      const low = estimate - distribution.halfWidth;
      for (let index = 0; index < count; index += 1) target[index] = low + width * random.nextUniform();
      return;
    }
    case 'triangular': {
      const a = distribution.halfWidth;
      const low = estimate - a;
      for (let index = 0; index < count; index += 1) target[index] = low + a * (random.nextUniform() + random.nextUniform());
      return;
    }
    case 'arcsine': {
      const a = distribution.halfWidth;
      for (let index = 0; index < count; index += 1) target[index] = estimate + a * Math.sin(twoPi * random.nextUniform());
      return;
    }
    case 'studentT': {
      const nu = distribution.observations - 1;
      const scale = distribution.meanOfReadings ? distribution.standardDeviation / Math.sqrt(distribution.observations) : distribution.standardDeviation;
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
  }
}
