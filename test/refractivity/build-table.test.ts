import { describe, expect, it } from 'vitest';
import { resolveAirColumn } from '../../sim/atmosphere/resolve.js';
import { US1976_KINKS_M } from '../../sim/atmosphere/us1976.js';
import { EARTH_RADIUS_M } from '../../sim/constants.js';
import { InputRangeError } from '../../sim/errors.js';
import { buildIndexTable, indexAt } from '../../sim/refractivity/build-table.js';
import { evaluateIndex } from '../../sim/refractivity/index-table.js';
import { refractivityModel } from '../../sim/refractivity/models.js';
import type { ProfileAtmosphere } from '../../sim/scenario.js';
import { expectClose } from '../support/close.js';

/** Largest interpolation error of n − 1 the table may have anywhere (the brief's target). */
const TABLE_NM1_ABS = 1e-12;
/** Largest relative interpolation error of dn/dz the table may have anywhere (the brief's target). */
const TABLE_SLOPE_REL = 1e-3;

const ciddor550 = refractivityModel('ciddor', { wavelength_um: 0.55, co2_ppm: 450 });

/** A strong surface inversion, 0.5 K/m from 0 to 20 m, moist, US 1976 above. */
const inversion: ProfileAtmosphere = {
  kind: 'profile',
  surface_pressure_Pa: 101_325,
  relative_humidity: 0.7,
  nodes: [{ height_m: 0, temperature_K: 275.15 }, { height_m: 20, temperature_K: 285.15 }],
  above: { kind: 'us1976' },
};

describe('the index table of an air column', () => {
  const column = resolveAirColumn(inversion);
  const table = buildIndexTable(column, ciddor550);

  it('interpolates n within 1e-12 and dn/dz within 1e-3 relative of direct evaluation, in and above a 0.5 K/m inversion', () => {
    const out = new Float64Array(2);
    let worstNm1 = 0;
    let worstSlope = 0;
    const heights: number[] = [];
    for (let z = 0.0005; z < 100; z += 0.0173) heights.push(z); // dense through the inversion and its top
    for (let z = 100; z < 86_000; z += 9.7) heights.push(z); // the whole column
    let guess = 0;
    for (const z of heights) {
      guess = evaluateIndex(table, z, out, guess);
      const direct = indexAt(column, ciddor550, z);
      worstNm1 = Math.max(worstNm1, Math.abs(out[0] - direct.nm1));
      worstSlope = Math.max(worstSlope, Math.abs(out[1] - direct.dndzAbove) / Math.abs(direct.dndzAbove));
    }
    expect(heights.length).toBeGreaterThan(10_000);
    expect(worstNm1).toBeLessThan(TABLE_NM1_ABS);
    expect(worstSlope).toBeLessThan(TABLE_SLOPE_REL);
  });

  it('has every kink as a node: the inversion top, the US 1976 layer bases and the humidity top', () => {
    const nodes = Array.from(table.z_m);
    for (const z of [20, ...US1976_KINKS_M]) expect(nodes).toContain(z);
    expect(Array.from(table.kinks_m)).toEqual(column.kinks_m);
  });

  it('keeps the one-sided dn/dz of the column on each side of the inversion top', () => {
    const i = Array.from(table.z_m).indexOf(20);
    const direct = indexAt(column, ciddor550, 20);
    expectClose(table.dndz_top[i - 1], direct.dndzBelow, { rel: 1e-15 });
    expectClose(table.dndz_bottom[i], direct.dndzAbove, { rel: 1e-15 });
    // Inside the inversion n falls about 16 times faster than just above it (0.53 vs 0.034 K/m of hydrostatic-equivalent gradient).
    expect(direct.dndzBelow / direct.dndzAbove).toBeGreaterThan(10);
    const out = new Float64Array(2);
    evaluateIndex(table, 20 - 1e-9, out);
    const below = out[1];
    evaluateIndex(table, 20 + 1e-9, out);
    expectClose(below, direct.dndzBelow, { rel: 1e-6 });
    expectClose(out[1], direct.dndzAbove, { rel: 1e-6 });
  });

  it('gives dn/dz (chain rule on T, p, e) equal to a central difference of n(z)', () => {
    for (const z of [5, 500, 5000, 30_000]) {
      const h = 0.05;
      const numeric = (indexAt(column, ciddor550, z + h).nm1 - indexAt(column, ciddor550, z - h).nm1) / (2 * h);
      // Partials by central differences in the state are good to ≈ 1e-10; the difference in z to ≈ 1e-9.
      expectClose(indexAt(column, ciddor550, z).dndzAbove, numeric, { rel: 1e-7 });
    }
  });

  it('stops at a requested top below the column top and refuses one above it', () => {
    const low = buildIndexTable(column, ciddor550, { top_m: 1000 });
    expect(low.top_m).toBe(1000);
    expectClose(low.nm1[low.nm1.length - 1], indexAt(column, ciddor550, 1000).nm1, { rel: 1e-15 });
    expect(() => buildIndexTable(column, ciddor550, { top_m: 90_000 })).toThrow(InputRangeError);
    expect(() => buildIndexTable(column, ciddor550, { top_m: 90_000 })).toThrow('top_m');
  });
});

/**
 * The temperature gradient dT/dz at the surface for which dn/dz = −n/r (a horizontal ray follows
 * the Earth, DESIGN.md §3 item 5), derived from the table: dn/dz is affine in dT/dz for dry air
 * (the pressure term does not depend on it), so two tables give it exactly.
 */
function ductThreshold_K_per_m(temperature_K: number, pressure_Pa: number): number {
  const surfaceSlope = (gradient_K_per_m: number) => {
    const column = resolveAirColumn({
      kind: 'profile',
      surface_pressure_Pa: pressure_Pa,
      relative_humidity: 0,
      nodes: [{ height_m: 0, temperature_K: temperature_K }, { height_m: 100, temperature_K: temperature_K + 100 * gradient_K_per_m }],
      above: { kind: 'lapse', lapse_K_per_m: 0 },
    });
    const table = buildIndexTable(column, ciddor550, { top_m: 1000 });
    return { dndz: table.dndz_bottom[0], n: 1 + table.nm1[0] };
  };
  const g2 = 0.2;
  const a = surfaceSlope(0);
  const b = surfaceSlope(g2);
  const target = -a.n / EARTH_RADIUS_M;
  return ((target - a.dndz) * g2) / (b.dndz - a.dndz);
}

/**
 * K/m. REFERENCES.md §5.1 derives the threshold from the ideal-gas form
 * dn/dz = −[(n − 1)/T](g/R_d + dT/dz) and prints 4 decimals. The full Ciddor model carries the
 * compressibility Z(p, T) of BIPM-81/91, whose temperature dependence (Z − 1 ≈ −6e-4 with a
 * −2.9e-8 Pa⁻¹ per °C term) makes |∂n/∂T| about 0.36 % larger at 0 °C; that lowers the threshold by
 * about 4e-4 K/m. 1e-3 K/m (under 1 %) covers this and still fails on a missing or wrong
 * pressure term (0.034 K/m) or a wrong gravity or radius.
 */
const DUCT_THRESHOLD_TOL_K_PER_M = 1e-3;
/** K/m. "About 0.11 K/m" is given to two significant figures: ±0.005. */
const COMMON_PRACTICE_TOL_K_PER_M = 0.005;

describe('the ducting threshold from the index model (Ciddor, 550 nm, dry air)', () => {
  it('is about +0.11 K/m at 0 °C and 1013 hPa', () => {
    // DESIGN.md §3 item 5: common practice, no source.
    expectClose(ductThreshold_K_per_m(273.15, 101_325), 0.11, { abs: COMMON_PRACTICE_TOL_K_PER_M });
  });

  it('is +0.1121 K/m at 0 °C and 101 325 Pa', () => {
    // REFERENCES.md §5.1 table, duct-threshold column: independent computation.
    expectClose(ductThreshold_K_per_m(273.15, 101_325), 0.1121, { abs: DUCT_THRESHOLD_TOL_K_PER_M });
  });

  it('is +0.1286 K/m at 15 °C and 101 325 Pa', () => {
    // REFERENCES.md §5.1 table, duct-threshold column: independent computation.
    expectClose(ductThreshold_K_per_m(288.15, 101_325), 0.1286, { abs: DUCT_THRESHOLD_TOL_K_PER_M });
  });

  it('rises with temperature as in the reference table (−20, 10 and 30 °C)', () => {
    // REFERENCES.md §5.1 table: independent computation.
    expectClose(ductThreshold_K_per_m(253.15, 101_325), 0.0914, { abs: DUCT_THRESHOLD_TOL_K_PER_M });
    expectClose(ductThreshold_K_per_m(283.15, 101_000), 0.1235, { abs: DUCT_THRESHOLD_TOL_K_PER_M });
    expectClose(ductThreshold_K_per_m(303.15, 101_325), 0.146, { abs: DUCT_THRESHOLD_TOL_K_PER_M });
  });
});
