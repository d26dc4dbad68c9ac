import { describe, expect, it } from 'vitest';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { evaluateIndex } from '../../sim/refractivity/index-table.js';
import { expectClose } from '../support/close.js';
import { R_TEST_M, quadraticMedium, quadraticMediumMinimum_m } from './analytic-media.js';
import { layeredAtmosphere, tableOf } from './media.js';

// A smooth surface duct: n − 1 = 3e-4 − 3e-7 z + 3e-9 z² (n·r falls with height up to ≈ 23.8 m).
const A = 3e-4;
const B = 3e-7;
const Q = 3e-9;
const ductTable = quadraticMedium(A, B, Q, 200, 50);
const exactMinimum_m = quadraticMediumMinimum_m(A, B, Q, R_TEST_M);
const exactOffset = (z: number): number => z + (A - B * z + Q * z * z) * (R_TEST_M + z);

/** Rounding of n·r − R evaluated near 1.9 km: a few ulps, m. */
const OFFSET_ROUNDING_M = 1e-11;
/** A root of g′ located by bisection: g′ has slope ~0.05 per m there, so 1e-9 m is ~1e-10 of g′ — far above rounding. */
const EXTREMUM_HEIGHT_TOLERANCE_M = 1e-9;

describe('the invariant profile n·r − R of a table', () => {
  it('evaluates n·r − R exactly as the table n(z) gives it', () => {
    const profile = new InvariantProfile(ductTable, R_TEST_M);
    for (const z of [0, 3.7, 23.8, 50, 77.7, 199.9]) expectClose(profile.offset_m(z), exactOffset(z), { abs: OFFSET_ROUNDING_M });
  });

  it('finds a smooth minimum inside a cell at the analytic root of d(n r)/dz (independent computation)', () => {
    const profile = new InvariantProfile(ductTable, R_TEST_M);
    const minimum = profile.minimum(0, 200);
    expectClose(minimum.height_m, exactMinimum_m, { abs: EXTREMUM_HEIGHT_TOLERANCE_M });
    expectClose(minimum.offset_m, exactOffset(exactMinimum_m), { abs: OFFSET_ROUNDING_M });
    expect(profile.extrema(0, 200)).toEqual([{ height_m: minimum.height_m, kind: 'min' }]);
  });

  it('never reports a minimum above a dense sampling of the table (Young-type inversion, real chain)', () => {
    // +2 K over 50..60 m on a 15 °C standard lapse (REFERENCES.md §6.1): the minimum over 50..90 m is the kink at 60 m.
    const table = tableOf(layeredAtmosphere([[0, 15], [50, 14.675], [60, 16.61]], { kind: 'lapse', lapse_K_per_m: -0.0065 }));
    const profile = new InvariantProfile(table, R_TEST_M);
    const minimum = profile.minimum(50, 90);
    expect(minimum.height_m).toBe(60);
    const out = new Float64Array(2);
    let sampled = Infinity;
    for (let z = 50; z <= 90; z += 0.001) {
      evaluateIndex(table, z, out);
      sampled = Math.min(sampled, z + out[0] * (R_TEST_M + z));
    }
    expect(minimum.offset_m).toBeLessThanOrEqual(sampled + OFFSET_ROUNDING_M);
  });

  it('finds the turning points below and above a height where n·r falls to a given value', () => {
    const profile = new InvariantProfile(ductTable, R_TEST_M);
    const level = exactOffset(10); // n·r at 10 m equals it again above the minimum
    const below = profile.crossingBelow(level, 100);
    expect(below).not.toBeNull();
    expectClose(exactOffset(below as number), level, { abs: OFFSET_ROUNDING_M });
    expect(below as number).toBeGreaterThan(exactMinimum_m);
    expectClose(profile.crossingAbove(level, 0) as number, 10, { abs: 1e-9 });
    expect(profile.crossingBelow(exactOffset(exactMinimum_m) - 1e-6, 200)).toBeNull();
  });

  it('measures the rise of n·r over a picometre with full relative precision', () => {
    const profile = new InvariantProfile(ductTable, R_TEST_M);
    const z = 5;
    const slope = 1 + A - B * z + Q * z * z + (-B + 2 * Q * z) * (R_TEST_M + z); // analytic d(n r)/dz
    expectClose(profile.cellRise(profile.cellOf(z), z, 1e-12) / 1e-12, slope, { rel: 1e-12 });
    expectClose(profile.cellRise(profile.cellOf(z), z, 30), exactOffset(35) - exactOffset(5), { abs: OFFSET_ROUNDING_M });
  });
});
