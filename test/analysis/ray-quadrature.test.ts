import { describe, expect, it } from 'vitest';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { integrateRaySegment } from '../../sim/analysis/ray-quadrature.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { expectClose } from '../support/close.js';
import { R_TEST_M, powerLawMedium } from './analytic-media.js';
import { standardAtmosphere, tableOf } from './media.js';

/** Quadrature accuracy claimed by ray-quadrature.ts, relative (measured: 1.4e-13 worst, at 1e-5 rad below the horizontal). */
const QUADRATURE_REL = 1e-12;

describe('the invariant quadrature of range and bending', () => {
  it('gives the straight-line central angle arccos(R/(R+h)) for the ray tangent to the sea when n ≡ 1', () => {
    // DESIGN.md §3 item 2: no atmosphere, straight rays.
    const profile = new InvariantProfile(vacuumTable(10_000), R_TEST_M);
    for (const h of [1, 10, 1000, 9000]) {
      const { centralAngle_rad, bending_rad } = integrateRaySegment(profile, 0, 0, h, 0, 0);
      // arccos(R/(R+h)) written as 2 asin √(h/(2(R+h))): Math.acos near 1 would lose 1e-10 relative.
      expectClose(centralAngle_rad, 2 * Math.asin(Math.sqrt(h / (2 * (R_TEST_M + h)))), { rel: QUADRATURE_REL });
      expect(bending_rad).toBe(0);
    }
  });

  it('matches the closed form for a power-law medium n ∝ r^-k, through a turning point (independent derivation)', () => {
    // n = n0 (R/r)^k: θ = [arccos(c/f(r2)) − arccos(c/f(r1))]/(1 − k), τ = kθ (analytic-media.ts).
    const n0 = 1.0003;
    const k = 0.17;
    const profile = new InvariantProfile(powerLawMedium(n0, k, R_TEST_M, 5000, 25), R_TEST_M);
    const f = (z: number): number => n0 * Math.pow(R_TEST_M, k) * Math.pow(R_TEST_M + z, 1 - k);
    const h = 100;
    for (const alpha of [-1e-3, -1e-4, -1e-5, 0, 1e-4, 0.02]) {
      // c − R in a form that keeps its digits: f(h) − R = R·expm1(ln n0 + (1 − k)·ln(1 + h/R)).
      const gapAtEye = 2 * f(h) * Math.sin(alpha / 2) ** 2;
      const offset = R_TEST_M * Math.expm1(Math.log(n0) + (1 - k) * Math.log1p(h / R_TEST_M)) - gapAtEye;
      let theta: number;
      let tau: number;
      if (alpha < 0) {
        const turn = profile.crossingBelow(offset, h) as number;
        const down = integrateRaySegment(profile, offset, turn, h, turn, 0);
        const up = integrateRaySegment(profile, offset, turn, 5000, turn, 0);
        theta = down.centralAngle_rad + up.centralAngle_rad;
        tau = down.bending_rad + up.bending_rad;
      } else {
        const slope = (1 - k) * f(h) / (R_TEST_M + h);
        const leg = integrateRaySegment(profile, offset, h, 5000, h - gapAtEye / slope, gapAtEye);
        theta = leg.centralAngle_rad;
        tau = leg.bending_rad;
      }
      // Elevation at 5 km, arccos(c/f) = 2 asin √((f − c)/(2f)), with f(5 km) − f(h) from expm1/log1p (no cancellation).
      const rise = f(h) * Math.expm1((1 - k) * Math.log1p((5000 - h) / (R_TEST_M + h)));
      const atTop = 2 * Math.asin(Math.sqrt((rise + gapAtEye) / (2 * f(5000))));
      const want = (alpha < 0 ? atTop + Math.abs(alpha) : atTop - alpha) / (1 - k);
      expectClose(theta, want, { rel: QUADRATURE_REL });
      expectClose(tau, k * want, { rel: QUADRATURE_REL });
    }
  });

  it('keeps the identity θ − τ = change of the local elevation in the US 1976 atmosphere (DESIGN.md §3)', () => {
    const table = tableOf(standardAtmosphere(15));
    const profile = new InvariantProfile(table, R_TEST_M);
    const h = 10;
    const gEye = profile.offset_m(h);
    for (const alpha of [0.001, 0.05, 1.2]) {
      const gap = 2 * (R_TEST_M + gEye) * Math.sin(alpha / 2) ** 2;
      const offset = gEye - gap;
      const top = 30_000;
      const slope = profile.slope(h, 1);
      const { centralAngle_rad, bending_rad } = integrateRaySegment(profile, offset, h, top, h - gap / slope, gap);
      const elevationAtTop = Math.acos((R_TEST_M + offset) / (R_TEST_M + profile.offset_m(top)));
      // Both sides are O(0.1..1) rad; the identity holds to the quadrature's accuracy.
      expectClose(centralAngle_rad - bending_rad, elevationAtTop - alpha, { abs: 1e-11 });
    }
  });
});
