import { jStat } from 'jstat';
import { describe, expect, it } from 'vitest';
import type { Distribution } from './distributions';
import { RandomGenerator } from './random-generator';
import { standardNormalFrom } from './normal-ziggurat';
import { fillSamples } from './samplers';
import { meanAndStandardDeviation } from './coverage-interval';

/** xoshiro128** written again with BigInt arithmetic, straight from Blackman & Vigna's reference C code. */
function referenceXoshiro(state: bigint[], count: number): number[] {
  const mask = 0xffffffffn;
  const rotl = (x: bigint, k: bigint) => ((x << k) | (x >> (32n - k))) & mask;
  const s = [...state];
  const out: number[] = [];
  for (let index = 0; index < count; index += 1) {
    out.push(Number((rotl((s[1] * 5n) & mask, 7n) * 9n) & mask));
    const t = (s[1] << 9n) & mask;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11n);
  }
  return out;
}

describe('xoshiro128** generator', () => {
  it('from state (1, 2, 3, 4) gives 11520, 0, … (hand-computed from the algorithm) and matches a BigInt reference', () => {
    const generator = RandomGenerator.fromState([1, 2, 3, 4]);
    const ours = Array.from({ length: 1000 }, () => generator.nextUint32());
    expect(ours.slice(0, 2)).toEqual([11520, 0]);
    expect(ours).toEqual(referenceXoshiro([1n, 2n, 3n, 4n], 1000));
  });

  it('with large state words matches the reference (sign handling of 32-bit words)', () => {
    const words: [number, number, number, number] = [0xdeadbeef, 0x80000001, 0x7fffffff, 0xffffffff];
    const generator = RandomGenerator.fromState(words);
    const ours = Array.from({ length: 200 }, () => generator.nextUint32());
    expect(ours).toEqual(
      referenceXoshiro(
        words.map((word) => BigInt(word >>> 0)),
        200,
      ),
    );
  });

  it('is deterministic for a seed and differs between seeds', () => {
    const draw = (seed: number) => {
      const generator = new RandomGenerator(seed);
      return Array.from({ length: 5 }, () => generator.nextUint32());
    };
    expect(draw(42)).toEqual(draw(42));
    expect(draw(42)).not.toEqual(draw(43));
  });
});

describe('samplers reproduce the moments of their distributions', () => {
  const count = 400_000;
  const sample = (distribution: Distribution, seed = 5) => {
    const values = new Float64Array(count);
    fillSamples(values, count, 10, distribution, new RandomGenerator(seed));
    return meanAndStandardDeviation(values);
  };
  // Reference variances from jstat 1.9.6. Tolerance: 5 standard errors of a sample standard deviation,
  // se(s) ≈ σ·√((κ − 1)/(4M)) with κ ≤ 9 (t with ν = 5), i.e. 5·σ·√(2/M) ≈ 0.011σ for M = 4·10⁵.
  const cases: [string, Distribution, number][] = [
    ['normal', { shape: 'normal', standardUncertainty: 2 }, 2],
    ['rectangular', { shape: 'rectangular', halfWidth: 1 }, Math.sqrt(jStat.uniform.variance(-1, 1))],
    ['triangular', { shape: 'triangular', halfWidth: 1 }, Math.sqrt(jStat.triangular.variance(-1, 1, 0))],
    ['arcsine', { shape: 'arcsine', halfWidth: 1 }, Math.sqrt(jStat.arcsine.variance(-1, 1))],
    // JCGM 101:2008 §6.4.9 (from memory): scaled t with ν = n − 1 = 5 and scale s/√n has variance (s²/n)·ν/(ν − 2).
    [
      'Student t (ν = 5)',
      { shape: 'studentT', standardDeviation: 1, observations: 6, meanOfReadings: true },
      Math.sqrt((1 / 6) * (5 / 3)),
    ],
  ];
  it.each(cases)('%s', (_name, distribution, sigma) => {
    const { mean, standardDeviation } = sample(distribution);
    expect(Math.abs(mean - 10)).toBeLessThanOrEqual((5 * sigma) / Math.sqrt(count));
    expect(Math.abs(standardDeviation - sigma)).toBeLessThanOrEqual(5 * sigma * Math.sqrt(2 / count));
  });

  it('normal deviates fall in ±1σ, ±2σ bands with the normal probabilities (jstat reference, 5 binomial standard errors)', () => {
    const values = new Float64Array(count);
    fillSamples(values, count, 0, { shape: 'normal', standardUncertainty: 1 }, new RandomGenerator(11));
    for (const z of [-2, -1, 0, 1, 2.5, 3.5]) {
      const expected = jStat.normal.cdf(z, 0, 1);
      const observed = values.filter((value) => value <= z).length / count;
      expect(Math.abs(observed - expected)).toBeLessThanOrEqual(
        5 * Math.sqrt((expected * (1 - expected)) / count) + 1e-6,
      );
    }
  });
});

describe('samplers draw the stream as defined: per source, all its words in bulk, then any extra words', () => {
  // The definition (samplers.ts): for `count` trials a source takes the next `count` words (2·count for
  // triangular) as signed integers k, r = (k + 2³¹ + ½)/2³²; the ziggurat's rare slow path then draws further
  // words in trial order. The fused loops must give exactly these numbers (and leave the generator in the same state).
  const count = 50_000;
  const reference = (distribution: Distribution, random: RandomGenerator): Float64Array => {
    const words = new Int32Array(2 * count);
    const values = new Float64Array(count);
    const a = 'halfWidth' in distribution ? distribution.halfWidth : 0;
    if (distribution.shape === 'normal') {
      random.fillInt32(words, count);
      const u = 'standardUncertainty' in distribution ? distribution.standardUncertainty : 0;
      for (let index = 0; index < count; index += 1) values[index] = 10 + u * standardNormalFrom(words[index], random);
    } else if (distribution.shape === 'rectangular') {
      random.fillInt32(words, count);
      const width = 2 * a * 2 ** -32;
      for (let index = 0; index < count; index += 1)
        values[index] = 10 - a + (2 ** 31 + 0.5) * width + width * words[index];
    } else {
      random.fillInt32(words, 2 * count);
      const scale = a * 2 ** -32;
      for (let index = 0; index < count; index += 1)
        values[index] = 10 - a + (2 ** 32 + 1) * scale + scale * (words[2 * index] + words[2 * index + 1]);
    }
    return values;
  };
  it.each<[string, Distribution]>([
    ['normal', { shape: 'normal', standardUncertainty: 0.3 }],
    ['rectangular', { shape: 'rectangular', halfWidth: 0.2 }],
    ['triangular', { shape: 'triangular', halfWidth: 0.7 }],
  ])('%s', (_name, distribution) => {
    const fused = new RandomGenerator(31);
    const bulk = new RandomGenerator(31);
    const values = new Float64Array(count);
    fillSamples(values, count, 10, distribution, fused);
    expect(Array.from(values)).toEqual(Array.from(reference(distribution, bulk)));
    expect(fused.nextUint32()).toBe(bulk.nextUint32());
  });
});
