import { describe, expect, it } from 'vitest';
import { EARTH_RADIUS_M } from '../../sim/constants.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { integrateAdaptive } from '../../sim/trace/gauss-kronrod.js';
import { quadratureRange } from '../../sim/trace/quadrature.js';
import { expectClose } from '../support/close.js';
import { perfectDuct } from './media.js';

const R = EARTH_RADIUS_M;

/** Relative accuracy of the quadrature on smooth media: rounding of D = n r − c (≈1e-12 m in 1e0..1e3 m) dominates. */
const QUADRATURE_REL = 1e-11;

/**
 * Exact central angle of a straight line (n ≡ 1) from height h0 at elevation α0 to height z:
 * the line r = p / cos(θ + α0), p = (R + h0) cos α0 (plane geometry). With D = r − p computed
 * without cancellation, θ + α0 = ±atan(sqrt(D (D + 2p)) / p); the first arrival is the smallest
 * positive θ.
 */
function straightLineAngle(h0: number, alpha0: number, z: number, afterTurn: boolean): number {
  const p = (R + h0) * Math.cos(alpha0);
  const D = z - h0 + 2 * (R + h0) * Math.sin(alpha0 / 2) ** 2;
  const phi = Math.atan2(Math.sqrt(D * (D + 2 * p)), p);
  return afterTurn || alpha0 >= 0 ? phi - alpha0 : -alpha0 - phi;
}

describe('integrateAdaptive (QUADPACK QK15)', () => {
  it('integrates polynomials up to degree 22 exactly in one panel', () => {
    // A 15-point Kronrod rule is exact for degree 3·7 + 1 = 22 (Piessens et al. 1983, §2.2).
    for (const degree of [0, 5, 13, 22]) {
      const got = integrateAdaptive((x) => x ** degree, 0, 1, Infinity);
      expectClose(got, 1 / (degree + 1), { rel: 1e-14 });
    }
  });

  it('handles an inverse square-root endpoint singularity by subdivision', () => {
    // ∫_0^1 x^(-1/2) dx = 2.
    expectClose(integrateAdaptive((x) => 1 / Math.sqrt(x), 0, 1, 1e-10), 2, { rel: 1e-8 });
  });
});

describe('quadratureRange (DESIGN.md §3 item 4)', () => {
  const vacuum = vacuumTable(20000);

  it.each([
    ['an ascending ray', 10, 0.001, 100, false],
    ['a horizontal ray', 10, 0, 1000, false],
    ['a nearly horizontal ray', 10, 1e-7, 100, false],
    ['a descending ray on its way down', 10, -0.001, 7, false],
    ['a descending ray after its lowest point', 10, -0.001, 100, true],
    ['a ray down to the surface', 10, -0.01, 0, false],
  ] as const)('matches the exact straight line in vacuum for %s', (_name, h0, alpha0, z, afterTurn) => {
    // n ≡ 1: rays are straight lines (DESIGN.md §3 check 2), exact plane geometry.
    const want = R * straightLineAngle(h0, alpha0, z, afterTurn);
    expectClose(quadratureRange(vacuum, h0, alpha0, z), want, { rel: QUADRATURE_REL });
  });

  it('follows the logarithmic spiral of a perfect duct', () => {
    // n = C/r: n r = C, so c = C cos α0 and θ = cot α0 · ln(r/r0) (REFERENCES.md §5.4 item 2, derived).
    const table = perfectDuct(1.0003, R, 5000, 100);
    const alpha0 = 0.002;
    for (const z of [20, 150, 1234.5]) {
      const want = (R / Math.tan(alpha0)) * Math.log((R + z) / (R + 10));
      expectClose(quadratureRange(table, 10, alpha0, z), want, { rel: 1e-9 });
    }
  });

  it('returns null for heights the ray never reaches', () => {
    // Straight line from 10 m at −0.001 rad: lowest point 10 − R(1 − cos 0.001) ≈ 6.81 m.
    expect(quadratureRange(vacuum, 10, -0.001, 5)).toBeNull();
    // Steeply down: the surface comes first.
    expect(quadratureRange(vacuum, 10, -0.01, 50)).toBeNull();
  });
});
