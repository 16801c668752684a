import type { RandomGenerator } from './random-generator';

/**
 * Standard normal deviates by the ziggurat method (Marsaglia & Tsang, J. Stat. Softw. 5(8), 2000) with 128
 * layers, tables built at load time from the method's constants r = 3.442619855899 and v = 9.91256303526217e-3.
 * The layer index and the value come from disjoint bits of one 32-bit word (7 low bits for the layer, the
 * 25 high bits as a signed value), so they are not correlated (the flaw Doornik (2005) found when both use the
 * same bits). About 99 % of draws cost one 32-bit integer, a multiply and a compare.
 */
const layerCount = 128;
const tailStart = 3.442619855899;
const layerArea = 9.91256303526217e-3;
const scale = 16777216; // 2²⁴: the value is a signed 25-bit integer

/** ⌈bound⌉ of each layer's fast test |k| < bound: for an integer k the same test, done in integers. */
const acceptBound = new Int32Array(layerCount);
const widthFactor = new Float64Array(layerCount);
const density = new Float64Array(layerCount);
{
  let edge = tailStart;
  let previous = edge;
  const q = layerArea / Math.exp(-0.5 * edge * edge);
  acceptBound[0] = Math.ceil((edge / q) * scale);
  acceptBound[1] = 0;
  widthFactor[0] = q / scale;
  widthFactor[layerCount - 1] = edge / scale;
  density[0] = 1;
  density[layerCount - 1] = Math.exp(-0.5 * edge * edge);
  for (let layer = layerCount - 2; layer >= 1; layer -= 1) {
    edge = Math.sqrt(-2 * Math.log(layerArea / edge + Math.exp(-0.5 * edge * edge)));
    acceptBound[layer + 1] = Math.ceil((edge / previous) * scale);
    previous = edge;
    density[layer] = Math.exp(-0.5 * edge * edge);
    widthFactor[layer] = edge / scale;
  }
}

/**
 * Fills `target[0..count)` with estimate + u·z, z standard normal, one deviate per 32-bit word of `random`.
 * The xoshiro128** step (random-generator.ts) runs inline with the fast path, so about 99 % of deviates cost one
 * step, a table look-up, a compare and a multiply-add. A word that fails the fast test is set aside in `scratch`
 * (index and word, so length ≥ 2·count) and finished after the loop by standardNormalFrom, in index order: the
 * extra words those draw come after the chunk's `count` words, exactly as if the words had been made in bulk first.
 */
export function fillNormal(
  target: Float64Array,
  count: number,
  estimate: number,
  u: number,
  random: RandomGenerator,
  scratch: Int32Array,
): void {
  const state = random.state;
  let s0 = state[0];
  let s1 = state[1];
  let s2 = state[2];
  let s3 = state[3];
  let setAside = 0;
  for (let index = 0; index < count; index += 1) {
    const product = Math.imul(s1, 5);
    const bits = Math.imul((product << 7) | (product >>> 25), 9);
    const shifted = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    s1 ^= s2;
    s0 ^= s3;
    s2 ^= shifted;
    s3 = (s3 << 11) | (s3 >>> 21);
    const layer = bits & (layerCount - 1);
    const word = bits >> 7;
    if (Math.abs(word) < acceptBound[layer]) {
      target[index] = estimate + u * (word * widthFactor[layer]);
    } else {
      scratch[2 * setAside] = index;
      scratch[2 * setAside + 1] = bits;
      setAside += 1;
    }
  }
  state[0] = s0;
  state[1] = s1;
  state[2] = s2;
  state[3] = s3;
  for (let entry = 0; entry < setAside; entry += 1) {
    target[scratch[2 * entry]] = estimate + u * standardNormalFrom(scratch[2 * entry + 1], random);
  }
}

/**
 * One standard normal deviate, starting from the 32-bit word `firstBits` (already drawn by the caller, so
 * that words can be generated in bulk); any further words needed are drawn from `random`.
 */
export function standardNormalFrom(firstBits: number, random: RandomGenerator): number {
  let bits = firstBits;
  for (;;) {
    const layer = bits & (layerCount - 1);
    const word = (bits | 0) >> 7;
    const x = word * widthFactor[layer];
    if (Math.abs(word) < acceptBound[layer]) return x;
    if (layer === 0) {
      // Tail beyond r (Marsaglia 1964): x = −ln(U₁)/r, accept when −2 ln U₂ > x².
      let tail: number;
      let test: number;
      do {
        tail = -Math.log(random.nextUniform()) / tailStart;
        test = -Math.log(random.nextUniform());
      } while (test + test < tail * tail);
      return word > 0 ? tailStart + tail : -tailStart - tail;
    }
    if (density[layer] + random.nextUniform() * (density[layer - 1] - density[layer]) < Math.exp(-0.5 * x * x))
      return x;
    bits = random.nextUint32();
  }
}
