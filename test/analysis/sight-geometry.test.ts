import { describe, expect, it } from 'vitest';
import { geometricElevation_rad, geometricHorizon, straightRayEnd } from '../../sim/analysis/sight-geometry.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { traceRay } from '../../sim/trace/ray.js';
import { expectClose } from '../support/close.js';

const R = 6_371_000;

describe('the straight-line elevation of a point', () => {
  it('is −arccos(R/(R+h)) for the point where the line from the eye grazes the sphere (DESIGN.md §3 item 2)', () => {
    for (const h of [2, 12, 100]) {
      const dip = Math.acos(R / (R + h));
      expectClose(geometricElevation_rad(h, R * dip, 0, R), -dip, { abs: 1e-12 });
    }
  });

  it('agrees with plain Cartesian coordinates of the eye and the point in the great-circle plane', () => {
    // Eye at (0, R + h), point at ((R + z) sin θ, (R + z) cos θ); the eye's horizontal is the x axis.
    // Differences of 6.4e6 m coordinates keep about 1e-9 m, hence the 1e-9 rad tolerance at ≥ 100 m.
    for (const [h, D, z] of [
      [2, 100, 12],
      [25, 20_000, 3],
      [1.6, 2500, 4],
    ]) {
      const theta = D / R;
      const dx = (R + z) * Math.sin(theta);
      const dy = (R + z) * Math.cos(theta) - (R + h);
      expectClose(geometricElevation_rad(h, D, z, R), Math.atan2(dy, dx), { abs: 1e-9 });
    }
  });

  it('keeps full precision for a point level with the eye: exactly −θ/2 with θ = D/R (isosceles triangle)', () => {
    // The chord between two points at the same radius makes the angle θ/2 with each local horizontal.
    expectClose(geometricElevation_rad(10, 10_000, 10, R), -10_000 / (2 * R), { rel: 1e-12 });
  });
});

describe('the closed-form end of a straight ray', () => {
  // Heights of ≤ 1e4 m at a 6.4e6 m radius keep about 1e-9 m in double precision; the tracer at
  // 1e-10 m per step in n ≡ 1 adds about as much (measured 1.2e-9 m over 3000 random rays).
  const HEIGHT_TOLERANCE_M = 1e-8;
  const TOP_M = 86_000;

  it('reaches the height it was aimed at: a round trip through geometricElevation_rad', () => {
    for (const [h, D, z] of [
      [2, 100, 12],
      [25, 20_000, 3],
      [6, 35_000, 120],
      [1.6, 2500, 0.5],
    ]) {
      const end = straightRayEnd(h, geometricElevation_rad(h, D, z, R), D, R, TOP_M);
      expect(end.fate).toBe('target');
      expectClose(end.endHeight_m, z, { abs: HEIGHT_TOLERANCE_M });
      expect(end.endRange_m).toBe(D);
    }
  });

  it('grazes the sphere at R·dip for the ray aimed at the dip, cos(dip) = R/(R+h) (DESIGN.md §3 item 2)', () => {
    const h = 12;
    const dip = Math.acos(R / (R + h));
    // δ = 1e-12 rad below the dip the ray meets the sphere short of the tangent point by about
    // R·√(2δ·tan(dip)) = 0.4 m (the chord's depth grows with the square of the distance); just
    // above, it passes.
    const delta = 1e-12;
    const SHORTFALL_TOLERANCE_M = 1;
    const below = straightRayEnd(h, -dip - delta, 100_000, R, TOP_M);
    expect(below.fate).toBe('surface');
    expectClose(below.endRange_m, R * dip, { abs: SHORTFALL_TOLERANCE_M });
    expect(below.endRange_m).toBeLessThan(R * dip);
    expect(straightRayEnd(h, -dip + delta, 100_000, R, TOP_M).fate).toBe('target');
  });

  it('agrees with the ray tracer in a medium without refraction (independent computation: sim/trace/ray.ts)', () => {
    const table = vacuumTable(TOP_M);
    let count = 0;
    for (const h of [0, 2, 30, 500]) {
      for (const D of [2000, 60_000, 400_000]) {
        for (let k = -20; k <= 20; k++) {
          const a = k * 0.002 - (h === 0 ? 0 : 0.0005);
          const traced = traceRay(table, h, a, { earthRadius_m: R, stopRange_m: D, maxRange_m: D, tolerance_m: 1e-10 });
          const end = straightRayEnd(h, a, D, R, TOP_M);
          expect(end.fate).toBe(traced.fate);
          expectClose(end.endHeight_m, traced.end.height_m, { abs: HEIGHT_TOLERANCE_M });
          expectClose(end.endRange_m, traced.end.range_m, { abs: HEIGHT_TOLERANCE_M });
          expectClose(end.endElevation_rad, traced.end.elevation_rad, { abs: 1e-12 });
          count++;
        }
      }
    }
    expect(count).toBe(4 * 3 * 41);
  });
});

describe('the straight-line sea horizon', () => {
  it('agrees with the tangent form tan(dip) = √((1 + x)² − 1), x = h/R, and distance R·dip', () => {
    // Right triangle centre–eye–tangent point (exact geometry). Tolerance 1e-9 relative: arccos near
    // 1 loses about 1e-16/dip² of relative precision (~2e-10 at 2 m).
    for (const h of [2, 10, 100]) {
      const x = h / R;
      const { dip_rad, horizon_distance_m } = geometricHorizon(h, R);
      expectClose(dip_rad, Math.atan(Math.sqrt(2 * x + x * x)), { rel: 1e-9 });
      expectClose(horizon_distance_m, R * dip_rad, { rel: 1e-15 });
    }
  });
});
