/**
 * A seeded pseudo-random generator for ensembles: the same seed gives the same numbers on every
 * machine (32-bit integer arithmetic only, no platform floating-point in the state update).
 *
 * Generator: xoshiro128** 1.0 (Blackman & Vigna 2018/2021, "Scrambled linear pseudorandom number
 * generators", ACM TOMS 47(4), §4 and Fig. 6): 128 bits of state, period 2^128 − 1, passes BigCrush.
 * Seeding: the 64-bit seed is expanded into the four 32-bit state words with SplitMix64 (Steele,
 * Lea & Flood 2014, "Fast splittable pseudorandom number generators", OOPSLA; the seeding the
 * xoshiro authors recommend), so nearby seeds give unrelated streams and the state is never all zero.
 */

/** Largest seed accepted: seeds are integers 0..2^53 − 1 (exact in a double). */
export const MAX_SEED = Number.MAX_SAFE_INTEGER;

const MASK64 = (1n << 64n) - 1n;
/** SplitMix64 increment, the golden-ratio constant 0x9E3779B97F4A7C15 (Steele et al. 2014). */
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/**
 * SplitMix64: a 64-bit generator used here only to expand a seed.
 * @param seed any integer; taken modulo 2^64.
 * @returns a function giving the next 64-bit output as a BigInt in 0..2^64 − 1.
 * Reference: Steele, Lea & Flood 2014, mix function "mix64variant13" (Stafford's variant 13).
 */
export function splitMix64(seed: bigint): () => bigint {
  let state = BigInt.asUintN(64, seed);
  return () => {
    state = (state + GOLDEN_GAMMA) & MASK64;
    let z = state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    return z ^ (z >> 31n);
  };
}

const rotl = (x: number, k: number): number => (x << k) | (x >>> (32 - k));

/** 2^-53, the spacing of the doubles the generator returns. */
const TWO_POW_MINUS_53 = 1 / 9007199254740992;

/**
 * xoshiro128**: 32-bit outputs, and doubles strictly inside (0, 1) built from two outputs.
 * Not for cryptography.
 */
export class Xoshiro128 {
  private s0: number;
  private s1: number;
  private s2: number;
  private s3: number;

  /**
   * @param seed integer 0..MAX_SEED; the four state words are the low and high halves of two
   *   SplitMix64 outputs from that seed. Not checked here (kernel): public entry points validate.
   */
  constructor(seed: number) {
    const next = splitMix64(BigInt(seed));
    const a = next();
    const b = next();
    this.s0 = Number(a & 0xffffffffn) | 0;
    this.s1 = Number(a >> 32n) | 0;
    this.s2 = Number(b & 0xffffffffn) | 0;
    this.s3 = Number(b >> 32n) | 0;
  }

  /** Next output, an unsigned 32-bit integer (Blackman & Vigna, xoshiro128starstar.c, next()). */
  nextUint32(): number {
    const result = Math.imul(rotl(Math.imul(this.s1, 5), 7), 9) >>> 0;
    const t = this.s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = rotl(this.s3, 11);
    return result;
  }

  /**
   * Next double, uniform on the open interval (0, 1): (k + 0.5)·2^-53 with k a 53-bit integer made of
   * the top 27 bits of one output and the top 26 of the next. Never 0 or 1, so it can feed an inverse
   * cumulative distribution directly.
   */
  nextOpen01(): number {
    const hi = this.nextUint32() >>> 5;
    const lo = this.nextUint32() >>> 6;
    return (hi * 67108864 + lo + 0.5) * TWO_POW_MINUS_53;
  }
}
