import { describe, expect, it } from 'vitest';
import { Xoshiro128, splitMix64 } from '../../sim/analysis/ensemble-random.js';

describe('splitMix64', () => {
  it('gives the published first outputs for seed 1234567', () => {
    // Test vector remembered from Vigna's splitmix64.c (from memory), confirmed by an independent
    // computation: the reference C code compiled with gcc.
    const next = splitMix64(1234567n);
    expect([next(), next(), next()]).toEqual([6457827717110365317n, 3203168211198807973n, 9817491932198370423n]);
  });
});

describe('Xoshiro128', () => {
  it('matches the reference C xoshiro128** seeded through SplitMix64', () => {
    // Independent computation: Blackman & Vigna's xoshiro128starstar.c next() and splitmix64.c,
    // compiled with gcc, state words = low/high halves of two SplitMix64 outputs.
    const a = new Xoshiro128(0);
    expect(Array.from({ length: 6 }, () => a.nextUint32())).toEqual([3737715805, 2584255861, 2876756834, 3286328325, 1553311962, 1625202774]);
    const b = new Xoshiro128(20310314);
    expect(Array.from({ length: 6 }, () => b.nextUint32())).toEqual([3862683982, 2273357280, 979435719, 403928226, 623639391, 909143737]);
  });

  it('gives the same stream for the same seed and a different one for the next seed', () => {
    const one = new Xoshiro128(7);
    const two = new Xoshiro128(7);
    const three = new Xoshiro128(8);
    const s1 = Array.from({ length: 100 }, () => one.nextOpen01());
    const s2 = Array.from({ length: 100 }, () => two.nextOpen01());
    const s3 = Array.from({ length: 100 }, () => three.nextOpen01());
    expect(s1).toEqual(s2);
    expect(s1.filter((v, i) => v === s3[i])).toEqual([]);
  });

  it('draws doubles strictly inside (0, 1) whose mean and variance are those of a uniform', () => {
    const rng = new Xoshiro128(12345);
    const n = 200_000;
    let sum = 0;
    let sumSq = 0;
    let min = 1;
    let max = 0;
    for (let i = 0; i < n; i++) {
      const u = rng.nextOpen01();
      sum += u;
      sumSq += u * u;
      min = Math.min(min, u);
      max = Math.max(max, u);
    }
    const mean = sum / n;
    const variance = sumSq / n - mean * mean;
    // Uniform(0,1): mean 1/2, variance 1/12. Standard error of the mean is sqrt(1/12/n) ≈ 6.5e-4;
    // five standard errors keep a false alarm below 1e-6.
    const MEAN_TOLERANCE = 5 * Math.sqrt(1 / 12 / n);
    // The variance estimate's standard error is sqrt((1/80 − 1/144)/n) ≈ 1.7e-4 (4th central moment 1/80).
    const VARIANCE_TOLERANCE = 5 * Math.sqrt((1 / 80 - 1 / 144) / n);
    expect(Math.abs(mean - 0.5)).toBeLessThan(MEAN_TOLERANCE);
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(VARIANCE_TOLERANCE);
    expect(min).toBeGreaterThan(0);
    expect(max).toBeLessThan(1);
  });
});
