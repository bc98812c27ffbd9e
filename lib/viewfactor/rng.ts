/**
 * Seeded pseudo-random number generator for the Monte Carlo tracers.
 *
 * Generator: xoshiro128** 1.1 (D. Blackman, S. Vigna, "Scrambled linear
 * pseudorandom number generators", ACM TOMS 47(4), 2021 [G6]), 128-bit state,
 * period 2^128 − 1, 32-bit outputs. The 128-bit state is filled from the seed
 * with SplitMix64 (G. Steele, D. Lea, C. Flood, "Fast splittable pseudorandom
 * number generators", OOPSLA 2014 [G7]), the seeding the xoshiro authors
 * recommend. Same seed → same sequence, bit for bit, on every platform
 * (only 32-bit integer operations and exact conversions are used).
 */

const UINT32_TO_UNIT = 2.3283064365386963e-10; // 2^-32

const SPLITMIX64_GAMMA = 0x9e3779b97f4a7c15n;
const SPLITMIX64_MUL1 = 0xbf58476d1ce4e5b9n;
const SPLITMIX64_MUL2 = 0x94d049bb133111ebn;
const MASK64 = 0xffffffffffffffffn;

/**
 * One SplitMix64 step [G7]: advances `state` by the golden gamma and returns
 * the mixed 64-bit output. Used only for seeding (BigInt, not in hot loops).
 * @param state 64-bit unsigned state (0 ≤ state < 2^64)
 * @returns `[nextState, output]`, both 64-bit unsigned
 */
export function splitMix64(state: bigint): [bigint, bigint] {
  const next = (state + SPLITMIX64_GAMMA) & MASK64;
  let z = next;
  z = ((z ^ (z >> 30n)) * SPLITMIX64_MUL1) & MASK64;
  z = ((z ^ (z >> 27n)) * SPLITMIX64_MUL2) & MASK64;
  return [next, z ^ (z >> 31n)];
}

/**
 * xoshiro128** generator [G6]. Create with {@link createRng} (seeded through
 * SplitMix64) or {@link Xoshiro128StarStar.fromState} (raw state, for tests).
 */
export class Xoshiro128StarStar {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  private constructor(s0: number, s1: number, s2: number, s3: number) {
    this.s0 = s0 | 0;
    this.s1 = s1 | 0;
    this.s2 = s2 | 0;
    this.s3 = s3 | 0;
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) {
      throw new RangeError("xoshiro128**: the all-zero state is not allowed");
    }
  }

  /**
   * Generator with the given raw 128-bit state (four 32-bit words, as in the
   * reference C code's `s[0..3]`).
   * @param s0 state word 0 (integer, taken modulo 2^32)
   * @param s1 state word 1 (integer, taken modulo 2^32)
   * @param s2 state word 2 (integer, taken modulo 2^32)
   * @param s3 state word 3 (integer, taken modulo 2^32); not all four zero
   */
  static fromState(s0: number, s1: number, s2: number, s3: number): Xoshiro128StarStar {
    return new Xoshiro128StarStar(s0, s1, s2, s3);
  }

  /**
   * Generator seeded from a 64-bit seed via two SplitMix64 outputs [G7].
   * @param seed safe integer (negative values are taken modulo 2^64)
   */
  static fromSeed(seed: number): Xoshiro128StarStar {
    if (!Number.isSafeInteger(seed)) {
      throw new RangeError(`seed must be a safe integer, got ${seed}`);
    }
    const [state, a] = splitMix64(BigInt.asUintN(64, BigInt(seed)));
    const b = splitMix64(state)[1];
    return new Xoshiro128StarStar(
      Number(a & 0xffffffffn),
      Number(a >> 32n),
      Number(b & 0xffffffffn),
      Number(b >> 32n),
    );
  }

  /** Next 32-bit output as an unsigned integer in [0, 2^32). */
  nextUint32(): number {
    const s0 = this.s0;
    const s1 = this.s1;
    let s2 = this.s2;
    let s3 = this.s3;
    // result = rotl(s1 * 5, 7) * 9
    const m = Math.imul(s1, 5);
    const result = Math.imul((m << 7) | (m >>> 25), 9);
    const t = s1 << 9;
    s2 ^= s0;
    s3 ^= s1;
    this.s1 = s1 ^ s2;
    this.s0 = s0 ^ s3;
    this.s2 = s2 ^ t;
    this.s3 = (s3 << 11) | (s3 >>> 21);
    return result >>> 0;
  }

  /** Next uniform double in [0, 1) with 32-bit resolution. */
  next(): number {
    return this.nextUint32() * UINT32_TO_UNIT;
  }
}

/**
 * Seeded xoshiro128** generator [G6] (seeding by SplitMix64 [G7]).
 * @param seed safe integer; same seed → identical sequence
 */
export function createRng(seed: number): Xoshiro128StarStar {
  return Xoshiro128StarStar.fromSeed(seed);
}
