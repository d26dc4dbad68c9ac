import { describe, it } from 'vitest';
import { geometricElevation_rad } from '../../sim/analysis/sight-geometry.js';
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
