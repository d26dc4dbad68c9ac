import { describe, expect, it } from 'vitest';
import { horizon } from '../../sim/analysis/dip.js';
import { InputRangeError } from '../../sim/errors.js';
import { evaluateIndex, type IndexTable } from '../../sim/refractivity/index-table.js';
import { quadratureRange } from '../../sim/trace/quadrature.js';
import { traceRay } from '../../sim/trace/ray.js';
import { expectClose } from '../support/close.js';
import { R_TEST_M, powerLawMedium, quadraticMedium, quadraticMediumMinimum_m } from './analytic-media.js';
import { layeredAtmosphere, standardAtmosphere, tableOf } from './media.js';
import { youngZigzag } from './young.js';

const ARCMIN = Math.PI / 180 / 60;
const FOOT_M = 0.3048; // international foot, exact
const NMI_M = 1852; // international nautical mile, exact

/** n·r at z straight from the table (evaluateIndex), m: an independent path to the invariant. */
function nr(table: IndexTable, z: number): number {
  const out = new Float64Array(2);
  evaluateIndex(table, z, out);
  return (1 + out[0]) * (R_TEST_M + z);
}

describe('the apparent horizon without an atmosphere (n ≡ 1)', () => {
  const vacuum = tableOf(standardAtmosphere(15), { index_model: 'none' });
  for (const h of [2, 10, 100, 1000]) {
    it(`has dip arccos(R/(R+h)) and distance R·arccos(R/(R+h)) at h = ${h} m (DESIGN.md §3 item 2)`, () => {
      const found = horizon(vacuum, h, R_TEST_M);
      const geometric = Math.acos(R_TEST_M / (R_TEST_M + h));
      // Math.acos near 1 is itself good to ~1e-13 rad here; the identity asks for 1e-12.
      expectClose(found.dip_rad, geometric, { abs: 1e-12 });
      expectClose(found.horizon_distance_m as number, R_TEST_M * geometric, { rel: 1e-9 });
      expect(found.false_horizon).toBe(false);
      expect(found.grazing_height_m).toBe(0);
      expect(found.trapped).toBeNull();
    });
  }
});

describe('the horizon distance in a medium with constant ray curvature', () => {
  it('is R·dip/(1 − k) exactly when n ∝ r^-k (the effective-Earth result; independent derivation)', () => {
    // n·r ∝ r^(1−k) gives θ = [arccos(c/f(r2)) − arccos(c/f(r1))]/(1 − k) (analytic-media.ts); the
    // limiting ray has c = f(R), so the distance is R·arccos(f(R)/f(R+h))/(1 − k) = R·dip/(1 − k).
    const k = 0.17;
    const table = powerLawMedium(1.0003, k, R_TEST_M, 5000, 25);
    for (const h of [2, 10, 100]) {
      const found = horizon(table, h, R_TEST_M);
      const exactDip = 2 * Math.asin(Math.sqrt(Math.expm1((1 - k) * Math.log1p(h / R_TEST_M)) / (2 * Math.pow(1 + h / R_TEST_M, 1 - k))));
      expectClose(found.dip_rad, exactDip, { rel: 1e-12 });
      expectClose(found.horizon_distance_m as number, (R_TEST_M * found.dip_rad) / (1 - k), { rel: 1e-12 });
    }
  });
});

describe('the dip of the sea horizon in a stratified atmosphere', () => {
  // REFERENCES.md §5.3 [computed] — independent computation: h = 10 m, 283.15 K at the sea,
  // 1010 hPa, 550 nm, dry, hydrostatic pressure, constant dT/dz.
  const cases: [number, number][] = [
    [-0.0065, 5.5314], // row I of REFERENCES.md §0: 5.531′
    [0, 5.3912],
    [0.05, 4.1604],
    [-0.1, 7.2597],
  ];
  /** REFERENCES.md §0 row I asks ±0.002′ (the table prints 4 decimals; CO2 and constants may differ slightly). */
  const DIP_TOLERANCE_ARCMIN = 0.002;
  for (const [lapse, want] of cases) {
    it(`is ${want}′ from 10 m with dT/dz = ${lapse} K/m (REFERENCES.md §5.3, independent computation)`, () => {
      const table = tableOf(layeredAtmosphere([[0, 10]], { kind: 'lapse', lapse_K_per_m: lapse }, 1010));
      const found = horizon(table, 10, R_TEST_M);
      expectClose(found.dip_rad / ARCMIN, want, { abs: DIP_TOLERANCE_ARCMIN });
      expect(found.horizon_elevation_rad).toBe(-found.dip_rad);
      // The same number straight from DESIGN.md §3.3: cos dip = n(0)·R / (n(h)·(R + h)).
      expectClose(found.dip_rad, Math.acos(nr(table, 0) / nr(table, 10)), { abs: 1e-10 });
    });
  }

  // Standard atmosphere at 15 °C, dry, 550 nm: surface k = 0.1699 (REFERENCES.md §5.1 [computed]).
  const standard = tableOf(standardAtmosphere(15));
  const K_HERE = 0.1699;

  it("agrees with the Nautical Almanac's 1.758′√h within what its k = 0.165 implies (REFERENCES.md §5.2)", () => {
    // Nautical Almanac 1998 "Methods and formulae for direct computation" (as transcribed, REFERENCES.md §5.2):
    // dip = 1.758′√h (h in m), i.e. k = 0.165. Dip ∝ √(1 − k): a k difference of 0.0049 shifts it by
    // ½·0.0049/0.835 = 0.29 %; the printed coefficient is good to 0.03 %; tolerance 0.4 %.
    const TOLERANCE_REL = 0.5 * ((K_HERE - 0.165) / (1 - K_HERE)) + 0.0003 + 0.0008; // 0.29 % + rounding + margin for k(z)
    for (const h of [2, 10, 30]) {
      expectClose(horizon(standard, h, R_TEST_M).dip_rad / ARCMIN, 1.758 * Math.sqrt(h), { rel: TOLERANCE_REL });
    }
  });

  it("agrees with Bowditch's horizon distance 1.17√(h ft) nmi within what its k = 0.172 implies (REFERENCES.md §5.2)", () => {
    // Bowditch (as transcribed, REFERENCES.md §5.2): D = 1.17√h_ft nmi, k = 0.172. D ∝ 1/√(1 − k): a k
    // difference of 0.0021 shifts it by 0.13 %; the printed 1.17 is good to ±0.005 (0.43 %); tolerance 0.6 %.
    const TOLERANCE_REL = 0.5 * ((0.172 - K_HERE) / (1 - K_HERE)) + 0.005 / 1.17 + 0.0004;
    for (const h of [2, 10, 30]) {
      const distance_nmi = (horizon(standard, h, R_TEST_M).horizon_distance_m as number) / NMI_M;
      expectClose(distance_nmi, 1.17 * Math.sqrt(h / FOOT_M), { rel: TOLERANCE_REL });
    }
  });
});

describe('false horizons and trapped rays', () => {
  it("keeps the sea's edge as the horizon above Young's elevated duct (its bottom is 45 m above the sea)", () => {
    // n·r at the duct top (60 m) is above its sea-level value, so the limiting ray still grazes the
    // sea (DESIGN.md §3.3): the duct bends the view of distant objects, not the horizon.
    const table = tableOf(youngZigzag());
    const found = horizon(table, 70, R_TEST_M);
    expect(found.false_horizon).toBe(false);
    expect(found.grazing_height_m).toBe(0);
    expectClose(found.dip_rad, Math.acos(nr(table, 0) / nr(table, 70)), { abs: 1e-10 });
    expect(found.trapped).toBeNull();
  });

  it('traps the rays within ±arccos(n·r at the duct top / n·r at the eye) for an observer inside the duct', () => {
    const table = tableOf(youngZigzag());
    const found = horizon(table, 55, R_TEST_M);
    const halfWidth = Math.acos(nr(table, 60) / nr(table, 55));
    expectClose(found.trapped as object, { from_elevation_rad: -halfWidth, to_elevation_rad: halfWidth }, { abs: 1e-10 });
    expect(found.false_horizon).toBe(false);
  });

  it('shows a false horizon raised above the sea’s edge for an observer above a duct that reaches the sea', () => {
    // A 10 K inversion over 50..60 m: n·r at 60 m is below its sea-level value, so the minimum of
    // n·r below a 70 m eye is at 60 m and the limiting ray grazes the top of the duct.
    const table = tableOf(youngZigzag(10));
    const found = horizon(table, 70, R_TEST_M);
    expect(found.false_horizon).toBe(true);
    expect(found.grazing_height_m).toBe(60);
    expect(found.duct).toMatchObject({ bottom_m: 0, top_m: 60, surface_based: true });
    expectClose(found.dip_rad, Math.acos(nr(table, 60) / nr(table, 70)), { abs: 1e-10 });
    expect(nr(table, 60)).toBeLessThan(nr(table, 0)); // why: the duct top, not the sea, holds the minimum
    expect(found.horizon_distance_m).toBeGreaterThan(0);
  });

  it('sees the sea above the horizontal from inside a duct that reaches the sea', () => {
    // Eye at 20 m under the same 10 K inversion: rays rising at less than arccos(f(60)/f(20)) turn
    // back below 60 m; those steeper than the trapped band come down to the sea.
    const table = tableOf(youngZigzag(10));
    const found = horizon(table, 20, R_TEST_M);
    expectClose(found.horizon_elevation_rad, Math.acos(nr(table, 60) / nr(table, 20)), { abs: 1e-10 });
    expect(found.horizon_elevation_rad).toBeGreaterThan(0);
    expectClose(found.invariant_dip_rad, Math.acos(nr(table, 0) / nr(table, 20)), { abs: 1e-10 });
    expectClose((found.trapped as { to_elevation_rad: number }).to_elevation_rad, found.invariant_dip_rad, { abs: 1e-15 });
  });

  it('reports no finite horizon distance when the limiting ray grazes a smooth minimum of n·r', () => {
    // n − 1 = 3e-4 − 3e-7 z + 3e-9 z²: n·r has a smooth minimum near 23.8 m (analytic-media.ts).
    const found = horizon(quadraticMedium(3e-4, 3e-7, 3e-9, 200, 50), 100, R_TEST_M);
    expect(found.false_horizon).toBe(true);
    expectClose(found.grazing_height_m, quadraticMediumMinimum_m(3e-4, 3e-7, 3e-9, R_TEST_M), { abs: 1e-9 });
    expect(found.horizon_distance_m).toBeNull();
    expect(found.warnings.length).toBe(1);
  });
});

describe('the horizon confirmed by the ray integrator (sim/trace)', () => {
  /** Offset of the confirming rays from the horizon, rad: they graze 1–2 mm from the limiting ray's grazing point. */
  const OFFSET_RAD = 1e-7;
  const cases: [string, IndexTable, number][] = [
    ['US 1976 at 15 °C, eye 10 m', tableOf(standardAtmosphere(15)), 10],
    ["Young's elevated duct, eye 70 m", tableOf(youngZigzag()), 70],
    ['a duct reaching the sea, eye 70 m (false horizon)', tableOf(youngZigzag(10)), 70],
    ['inside a duct reaching the sea, eye 20 m (sea above the horizontal)', tableOf(youngZigzag(10)), 20],
  ];
  for (const [name, table, h] of cases) {
    it(`sends the ray just below the horizon to the sea and the ray just above it past the grazing point: ${name}`, () => {
      const found = horizon(table, h, R_TEST_M);
      const below = traceRay(table, h, found.horizon_elevation_rad - OFFSET_RAD);
      const above = traceRay(table, h, found.horizon_elevation_rad + OFFSET_RAD);
      expect(below.fate).toBe('surface');
      expect(above.fate).not.toBe('surface');
      if (found.horizon_elevation_rad < 0) {
        // The ray just above turns a hair above the grazing height, near the horizon distance
        // (the check: distance to 0.1 %; the 1e-7 rad offset moves it by about 0.01 %).
        expectClose(above.minHeight_m, found.grazing_height_m, { abs: 0.005 });
        expectClose(above.minHeightRange_m, found.horizon_distance_m as number, { rel: 1e-3 });
      }
    });
  }

  it("agrees with the tracer's own invariant quadrature of the limiting ray's range (sim/trace/quadrature.ts)", () => {
    // An independent implementation of DESIGN.md §3 item 4 (different substitution anchor and
    // evaluation of n·r − c); 1e-6 relative leaves room for its start from the elevation angle.
    const table = tableOf(youngZigzag());
    const found = horizon(table, 70, R_TEST_M);
    const range = quadratureRange(table, 70, found.horizon_elevation_rad, 0, { earthRadius_m: R_TEST_M });
    expectClose(range as number, found.horizon_distance_m as number, { rel: 1e-6 });
  });
});

describe('input checks', () => {
  const table = tableOf(standardAtmosphere(15));
  it('rejects an observer below the sea or above the table, naming observerHeight_m', () => {
    expect(() => horizon(table, -1, R_TEST_M)).toThrow(InputRangeError);
    expect(() => horizon(table, 90_000, R_TEST_M)).toThrow(/observerHeight_m/);
  });
  it('rejects a non-finite Earth radius, naming earthRadius_m', () => {
    expect(() => horizon(table, 10, Number.NaN)).toThrow(/earthRadius_m/);
  });
});
