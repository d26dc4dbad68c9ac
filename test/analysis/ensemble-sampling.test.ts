import { describe, expect, it } from 'vitest';
import { distributionPointValue, distributionQuantile, sampleInputs, unitSampleMatrix, type InputDistribution } from '../../sim/analysis/ensemble-sampling.js';
import { expectClose } from '../support/close.js';

describe('unitSampleMatrix', () => {
  it('is reproducible for a seed and differs between seeds', () => {
    for (const method of ['monte-carlo', 'latin-hypercube'] as const) {
      expect(Array.from(unitSampleMatrix(20, 3, 99, method))).toEqual(Array.from(unitSampleMatrix(20, 3, 99, method)));
      expect(Array.from(unitSampleMatrix(20, 3, 99, method))).not.toEqual(Array.from(unitSampleMatrix(20, 3, 100, method)));
    }
  });

  it('keeps the first Monte Carlo members when more are asked for', () => {
    const small = unitSampleMatrix(10, 4, 5, 'monte-carlo');
    const large = unitSampleMatrix(25, 4, 5, 'monte-carlo');
    expect(Array.from(large.subarray(0, 40))).toEqual(Array.from(small));
  });

  it('puts exactly one Latin hypercube member in each stratum of every input', () => {
    const n = 37;
    const dims = 5;
    const u = unitSampleMatrix(n, dims, 2024, 'latin-hypercube');
    for (let j = 0; j < dims; j++) {
      const strata = Array.from({ length: n }, (_, i) => Math.floor(u[i * dims + j] * n)).sort((a, b) => a - b);
      expect(strata).toEqual(Array.from({ length: n }, (_, i) => i));
    }
  });
});

describe('distributionQuantile', () => {
  it('maps u to the uniform, choice and normal values', () => {
    expect(distributionQuantile({ kind: 'uniform', min: 13, max: 15 }, 0.25)).toBe(13.5);
    expect([0.01, 0.34, 0.5, 0.99].map((u) => distributionQuantile({ kind: 'choice', values: [2, 3, 5] }, u))).toEqual([2, 3, 3, 5]);
    // Φ⁻¹(0.975) = 1.959963984540054 (Abramowitz & Stegun Table 26.5, from memory): 10 + 2 × 1.96.
    expectClose(distributionQuantile({ kind: 'normal', mean: 10, sd: 2 }, 0.975), 10 + 2 * 1.959963984540054, { abs: 1e-12 });
  });

  it('keeps a truncated normal inside its bounds and leaves its median where the truncation is symmetric', () => {
    const d: InputDistribution = { kind: 'normal', mean: 1, sd: 3, min: 0, max: 2 };
    for (const u of [1e-12, 0.1, 0.5, 0.9, 1 - 1e-12]) {
      const x = distributionQuantile(d, u);
      expect(x).toBeGreaterThanOrEqual(0);
      expect(x).toBeLessThanOrEqual(2);
    }
    expectClose(distributionQuantile(d, 0.5), 1, { abs: 1e-12 });
  });

  it('gives the point value for zero spread whatever u is', () => {
    const zero: InputDistribution[] = [
      { kind: 'normal', mean: 4.5, sd: 0 },
      { kind: 'uniform', min: 7, max: 7 },
      { kind: 'choice', values: [3] },
    ];
    for (const d of zero) for (const u of [0.001, 0.5, 0.999]) expect(distributionQuantile(d, u)).toBe(distributionPointValue(d));
  });
});

describe('sampleInputs', () => {
  it('reproduces the mean and standard deviation of a normal input', () => {
    const n = 4000;
    const values = sampleInputs([{ kind: 'normal', mean: 6, sd: 0.5 }], n, 11, 'monte-carlo').map((row) => row[0]);
    const mean = values.reduce((a, b) => a + b, 0) / n;
    const sd = Math.sqrt(values.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1));
    // Standard errors: mean sd/√n ≈ 0.0079 m; sd about sd/√(2n) ≈ 0.0056 m. Five of each.
    expectClose(mean, 6, { abs: 5 * (0.5 / Math.sqrt(n)) });
    expectClose(sd, 0.5, { abs: 5 * (0.5 / Math.sqrt(2 * n)) });
  });
});
