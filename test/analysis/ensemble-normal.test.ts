import { describe, it } from 'vitest';
import { normalCdf, normalQuantile } from '../../sim/analysis/ensemble-normal.js';
import { expectClose } from '../support/close.js';

/** Relative tolerance of the quantile: AS241's stated accuracy is about 1e-16; allow a few ulps. */
const QUANTILE_REL = 4e-16;
/** Absolute tolerance of the cumulative distribution, dimensionless (normalCdf's stated accuracy 1e-15). */
const CDF_ABS = 1e-15;

describe('normalQuantile', () => {
  it('gives the familiar percentage points', () => {
    // Independent computation: Python 3.11 statistics.NormalDist().inv_cdf (its own AS241 code);
    // 1.959963984540054 and 3.090232306167813 also appear in Abramowitz & Stegun Table 26.5 (from memory).
    const p = [1e-300, 1e-20, 1e-10, 0.001, 0.025, 0.1, 0.25, 0.4, 0.6, 0.9, 0.975, 0.999];
    const want = [
      -37.0470962993612, -9.262340089798405, -6.361340902404056, -3.090232306167813, -1.9599639845400538, -1.2815515655446008,
      -0.6744897501960817, -0.2533471031357998, 0.2533471031357998, 1.2815515655446008, 1.9599639845400536, 3.090232306167813,
    ];
    expectClose(p.map(normalQuantile), want, { rel: QUANTILE_REL });
  });

  it('is the inverse of normalCdf across the body of the distribution', () => {
    const p = Array.from({ length: 99 }, (_, i) => (i + 1) / 100);
    expectClose(p.map((v) => normalCdf(normalQuantile(v))), p, { abs: CDF_ABS });
  });
});

describe('normalCdf', () => {
  it('matches libm erfc at chosen points', () => {
    // Independent computation: Python 3.11 statistics.NormalDist().cdf (0.5·erfc(−x/√2) from libm).
    const x = [-7.5, -5, -3, -1.96, -1, -0.3, 0, 0.5, 1, 2, 4];
    const want = [
      3.191891195797325e-14, 2.8665157186802404e-7, 0.0013498980316301035, 0.024997895148220428, 0.15865525393145707, 0.3820885778110474, 0.5,
      0.6914624612740131, 0.8413447460685429, 0.9772498680518208, 0.9999683287581669,
    ];
    expectClose(x.map(normalCdf), want, { abs: CDF_ABS });
  });

  it('equals the integral of the normal density (composite Simpson rule)', () => {
    // Independent computation: Φ(x) = 1/2 + ∫0^x exp(−t²/2)/√(2π) dt by Simpson's rule with 4000 panels;
    // its error bound (b − a)·h⁴·max|f⁗|/180 is below 1e-14 for |x| ≤ 4, hence the tolerance.
    const SIMPSON_ABS = 1e-13;
    const density = (t: number) => Math.exp(-0.5 * t * t) / Math.sqrt(2 * Math.PI);
    const simpson = (b: number) => {
      const n = 4000;
      const h = b / n;
      let sum = density(0) + density(b);
      for (let i = 1; i < n; i++) sum += (i % 2 === 1 ? 4 : 2) * density(i * h);
      return (sum * h) / 3;
    };
    const x = [-4, -2.5, -0.7, 0.2, 1.3, 3.3];
    expectClose(x.map(normalCdf), x.map((v) => 0.5 + simpson(v)), { abs: SIMPSON_ABS });
  });
});
