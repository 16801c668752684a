/**
 * xoshiro128** 1.1 (Blackman & Vigna, 2018): a 32-bit generator with 128 bits of state and period 2¹²⁸ − 1,
 * written with 32-bit integer arithmetic (Math.imul, >>>) so that every JavaScript engine gives the same
 * integers for the same seed. The 32-bit seed is expanded into the four state words by SplitMix32
 * (a Weyl sequence with step 0x9E3779B9 passed through the MurmurHash3 32-bit finaliser).
 */
export class RandomGenerator {
  /**
   * The four 32-bit state words s₀…s₃, kept in a typed array so they stay unboxed integers. Read and written
   * only by this class and by the ziggurat (normal-ziggurat.ts), which runs the same step inline in its loop.
   */
  readonly state = new Int32Array(4);

  constructor(seed: number) {
    let weyl = seed >>> 0;
    for (let index = 0; index < 4; index += 1) {
      weyl = (weyl + 0x9e3779b9) | 0;
      let mixed = weyl;
      mixed = Math.imul(mixed ^ (mixed >>> 16), 0x85ebca6b);
      mixed = Math.imul(mixed ^ (mixed >>> 13), 0xc2b2ae35);
      this.state[index] = mixed ^ (mixed >>> 16);
    }
    if ((this.state[0] | this.state[1] | this.state[2] | this.state[3]) === 0) this.state[0] = 1;
  }

  /** A generator whose four state words are given directly (for checking against the reference algorithm). */
  static fromState(words: [number, number, number, number]): RandomGenerator {
    const generator = new RandomGenerator(0);
    generator.state.set(words.map((word) => word | 0));
    return generator;
  }

  /** Next 32-bit unsigned integer: rotl(s₁·5, 7)·9, then the xoshiro state update. */
  nextUint32(): number {
    const state = this.state;
    const s1 = state[1];
    const product = Math.imul(s1, 5);
    const result = Math.imul((product << 7) | (product >>> 25), 9) >>> 0;
    const shifted = s1 << 9;
    state[2] ^= state[0];
    state[3] ^= s1;
    state[1] ^= state[2];
    state[0] ^= state[3];
    state[2] ^= shifted;
    const s3 = state[3];
    state[3] = (s3 << 11) | (s3 >>> 21);
    return result;
  }

  /**
   * Fills `target[0..count)` with the next `count` 32-bit words as signed integers (word | 0): the same
   * sequence as `count` calls of nextUint32, with the state held in locals for speed.
   */
  fillInt32(target: Int32Array, count: number): void {
    const state = this.state;
    let s0 = state[0];
    let s1 = state[1];
    let s2 = state[2];
    let s3 = state[3];
    for (let index = 0; index < count; index += 1) {
      const product = Math.imul(s1, 5);
      target[index] = Math.imul((product << 7) | (product >>> 25), 9);
      const shifted = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= shifted;
      s3 = (s3 << 11) | (s3 >>> 21);
    }
    state[0] = s0;
    state[1] = s1;
    state[2] = s2;
    state[3] = s3;
  }

  /**
   * Fills `target[0..count)` with offset + scale·kᵢ, kᵢ the next `count` words as signed integers: the same
   * numbers as fillInt32 followed by that multiply-add, in one loop (no buffer of words between them).
   * With scale = w·2⁻³² and offset = low + (2³¹ + ½)·scale this is low + w·rᵢ, rᵢ = (kᵢ + 2³¹ + ½)/2³² ∈ (0, 1).
   */
  fillAffine(target: Float64Array, count: number, offset: number, scale: number): void {
    const state = this.state;
    let s0 = state[0];
    let s1 = state[1];
    let s2 = state[2];
    let s3 = state[3];
    for (let index = 0; index < count; index += 1) {
      const product = Math.imul(s1, 5);
      const word = Math.imul((product << 7) | (product >>> 25), 9);
      const shifted = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= shifted;
      s3 = (s3 << 11) | (s3 >>> 21);
      target[index] = offset + scale * word;
    }
    state[0] = s0;
    state[1] = s1;
    state[2] = s2;
    state[3] = s3;
  }

  /**
   * Fills `target[0..count)` with offset + scale·(k₂ᵢ + k₂ᵢ₊₁), kⱼ the next 2·count words as signed integers (the
   * sum of two words is exact in a double): the numbers fillInt32 then that multiply-add would give, in one loop.
   */
  fillAffineOfPairSums(target: Float64Array, count: number, offset: number, scale: number): void {
    const state = this.state;
    let s0 = state[0];
    let s1 = state[1];
    let s2 = state[2];
    let s3 = state[3];
    for (let index = 0; index < count; index += 1) {
      let product = Math.imul(s1, 5);
      const first = Math.imul((product << 7) | (product >>> 25), 9);
      let shifted = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= shifted;
      s3 = (s3 << 11) | (s3 >>> 21);
      product = Math.imul(s1, 5);
      const second = Math.imul((product << 7) | (product >>> 25), 9);
      shifted = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= shifted;
      s3 = (s3 << 11) | (s3 >>> 21);
      target[index] = offset + scale * (first + second);
    }
    state[0] = s0;
    state[1] = s1;
    state[2] = s2;
    state[3] = s3;
  }

  /** Uniform on the open interval (0, 1): (k + ½)/2³², k the next 32-bit integer. */
  nextUniform(): number {
    return (this.nextUint32() + 0.5) * 2.3283064365386963e-10;
  }
}
