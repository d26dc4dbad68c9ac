import { describe, expect, it } from 'vitest';
import { averageRanks, pearson, percentileSorted, percentiles, proportion, spearman } from '../../sim/analysis/ensemble-stats.js';
import { expectClose } from '../support/close.js';

/** Exact arithmetic on small integers: only rounding of a few operations. */
const EXACT = 1e-12;

describe('percentileSorted', () => {
  it('interpolates between order statistics as Hyndman & Fan definition 7', () => {
    // Definition 7 on 1..10: h = 9p; p = 0.05 → 1.45, p = 0.5 → 5.5, p = 0.95 → 9.55
    // (the same as R's quantile(1:10, type = 7): Hyndman & Fan 1996, Table 1 formula).
    const sorted = Array.from({ length: 10 }, (_, i) => i + 1);
    expectClose([0.05, 0.5, 0.95, 0, 1].map((p) => percentileSorted(sorted, p)), [1.45, 5.5, 9.55, 1, 10], { abs: EXACT });
  });

  it('leaves nulls out and gives null for nothing', () => {
    expectClose(percentiles([3, null, 1, 2]), { p5: 1.1, p50: 2, p95: 2.9 }, { abs: EXACT });
    expect(percentiles([null])).toBeNull();
  });
});

describe('proportion', () => {
  it('gives the binomial standard error', () => {
    expectClose(proportion(30, 120), { probability: 0.25, standard_error: Math.sqrt((0.25 * 0.75) / 120) }, { abs: EXACT });
    expect(proportion(0, 50).standard_error).toBe(0);
  });
});

describe('ranks and correlations', () => {
  it('gives tied values the average of their ranks', () => {
    expect(Array.from(averageRanks([10, 20, 10, 30, 20, 20]))).toEqual([1.5, 4, 1.5, 6, 4, 4]);
  });

  it('gives Spearman ±1 for monotone relations that are not linear', () => {
    const x = [0.1, 0.5, 1, 2, 4, 8];
    expect(spearman(x, x.map((v) => Math.exp(v)))).toBe(1);
    expectClose(spearman(x, x.map((v) => -(v ** 3))), -1, { abs: EXACT });
    expect(pearson(x, x.map((v) => Math.exp(v)))).toBeLessThan(0.9);
  });

  it('matches a hand-computed Spearman coefficient without ties', () => {
    // 1 − 6Σd²/(n(n²−1)) (Spearman 1904) with ranks x: 1..5, y: 2,1,4,3,5 → Σd² = 4 → ρ = 1 − 24/120 = 0.8.
    expectClose(spearman([1, 2, 3, 4, 5], [20, 10, 40, 30, 50]), 0.8, { abs: EXACT });
  });

  it('is undefined for a constant sample', () => {
    expect(spearman([1, 2, 3], [4, 4, 4])).toBeNull();
  });
});
