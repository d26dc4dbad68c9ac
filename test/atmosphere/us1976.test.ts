import { describe, expect, it } from 'vitest';
import {
  US1976_HYDROSTATIC_K_PER_M,
  US1976_KINKS_M,
  US1976_LAYERS,
  US1976_TOP_M,
  geometricHeight_m,
  geopotentialHeight_m,
  gravityRatio,
  us1976Pressure_Pa,
  us1976Temperature_K,
  us1976TemperatureGradient_K_per_m,
} from '../../sim/atmosphere/us1976.js';
import { loadFixture } from '../refractivity/fixture.js';
import { expectClose } from '../support/close.js';

/** Relative pressure tolerance at the layer bases: REFERENCES.md §0 row D suggests 1e-6 (the table has 7 significant digits). */
const BASE_PRESSURE_REL = 1e-6;
/** K. Base temperatures are exact decimal sums of the layer table; only rounding remains. */
const BASE_TEMPERATURE_ABS_K = 1e-9;
/** K. The computed table prints 3 decimals: half a unit of the last digit. */
const TABLE_TEMPERATURE_ABS_K = 5e-4;
/** Relative. The computed table prints 5 significant digits: half a unit of the 5th is at most 5e-5. */
const TABLE_PRESSURE_REL = 5e-5;
/** km′. The computed table prints geopotential heights to 1e-5 km′: half a unit. */
const TABLE_H_ABS_KM = 5e-6;
/** Relative. A round trip through Eq. 18 and its inverse loses only rounding. */
const ROUND_TRIP_REL = 1e-14;

const bases = () => loadFixture('us1976-layer-bases.csv', ['H_km', 'T_K', 'p_ratio', 'p_Pa'], 8);
const heights = () => loadFixture('us1976-geometric-heights.csv', ['Z_km', 'H_km', 'T_K', 'p_Pa'], 7);

describe('US Standard Atmosphere 1976 layer bases', () => {
  it('has the seven layers of Table 4 with bases at 0, 11, 20, 32, 47, 51 and 71 km′', () => {
    // U.S. Standard Atmosphere 1976, Table 4 (REFERENCES.md §3, read from PDAS atmosdef).
    expect(US1976_LAYERS.map((l) => l.base_geopotential_m)).toEqual([0, 11_000, 20_000, 32_000, 47_000, 51_000, 71_000]);
    expect(US1976_LAYERS.map((l) => l.lapse_K_per_m * 1000)).toEqual([-6.5, 0, 1, 2.8, 0, -2.8, -2]);
  });

  it('computes the published base temperatures and pressures from the layer table', () => {
    // U.S. Standard Atmosphere 1976 base values, REFERENCES.md §3 (read: PDAS program output).
    const rows = bases();
    for (const row of rows) {
      const z = geometricHeight_m(row.H_km * 1000);
      expectClose(us1976Temperature_K(z), row.T_K, { abs: BASE_TEMPERATURE_ABS_K });
      expectClose(us1976Pressure_Pa(z), row.p_Pa, { rel: BASE_PRESSURE_REL });
      expectClose(us1976Pressure_Pa(z) / 101_325, row.p_ratio, { rel: BASE_PRESSURE_REL });
    }
  });

  it('uses the hydrostatic constant g0·M0/R* = 34.163194736 K/km', () => {
    // REFERENCES.md §3 (read and computed): 9.80665 × 28.9644 / 8.31432.
    expectClose(US1976_HYDROSTATIC_K_PER_M * 1000, 34.163194736, { rel: 1e-10 });
  });
});

describe('US Standard Atmosphere 1976 at geometric heights', () => {
  it('matches the independently computed table at 0 to 20 km', () => {
    // REFERENCES.md §3, values at requested heights: independent computation.
    const rows = heights();
    for (const row of rows) {
      const z = row.Z_km * 1000;
      expectClose(geopotentialHeight_m(z) / 1000, row.H_km, { abs: TABLE_H_ABS_KM });
      expectClose(us1976Temperature_K(z), row.T_K, { abs: TABLE_TEMPERATURE_ABS_K });
      expectClose(us1976Pressure_Pa(z), row.p_Pa, { rel: TABLE_PRESSURE_REL });
    }
  });

  it('agrees with the standard SI table to its 4 significant figures', () => {
    // PDAS SI table of the U.S. Standard Atmosphere 1976, geometric altitude, as read in REFERENCES.md §3.
    const table = [
      { z_m: 0, T_K: 288.1, p_Pa: 1.013e5 },
      { z_m: 2000, T_K: 275.2, p_Pa: 7.95e4 },
      { z_m: 10_000, T_K: 223.3, p_Pa: 2.65e4 },
      { z_m: 20_000, T_K: 216.6, p_Pa: 5.529e3 },
    ];
    // 4 significant figures: temperatures within 0.1 K (the table truncates 288.15 to 288.1), pressures within half a unit (5e-4 relative).
    for (const row of table) {
      expectClose(us1976Temperature_K(row.z_m), row.T_K, { abs: 0.1 });
      expectClose(us1976Pressure_Pa(row.z_m), row.p_Pa, { rel: 5e-4 });
    }
  });

  it('puts the top of the lower atmosphere, 86 km geometric, at 84.852 km′', () => {
    // U.S. Standard Atmosphere 1976: 86 km geometric = 84.852 km′ geopotential (REFERENCES.md §3); the standard rounds to the metre.
    expectClose(geopotentialHeight_m(US1976_TOP_M), 84_852, { abs: 0.5 });
  });

  it('inverts the geopotential conversion', () => {
    for (const z of [-5000, 0, 1, 11_019.07, 50_000, 86_000]) {
      expectClose(geometricHeight_m(geopotentialHeight_m(z)), z, { rel: ROUND_TRIP_REL, abs: 1e-12 });
    }
  });

  it('weakens gravity by the inverse square of distance from the centre, r0 = 6 356 766 m', () => {
    // US 1976, Eq. 17 (equation number from memory): g/g0 = (r0/(r0 + z))²; at 10 km 0.99685 (arithmetic).
    expectClose(gravityRatio(10_000), (6_356_766 / 6_366_766) ** 2, { rel: 1e-15 });
    expectClose(gravityRatio(10_000), 0.996861, { abs: 1e-6 });
  });
});

describe('US Standard Atmosphere 1976 kinks', () => {
  it('lists the layer bases 11 to 71 km′ as geometric heights', () => {
    expect(US1976_KINKS_M.length).toBe(6);
    US1976_KINKS_M.forEach((z, i) => expectClose(geopotentialHeight_m(z), US1976_LAYERS[i + 1].base_geopotential_m, { abs: 1e-8 }));
  });

  it('is continuous in temperature and pressure across every kink', () => {
    for (const z of US1976_KINKS_M) {
      const dz = 1e-6;
      expectClose(us1976Temperature_K(z - dz), us1976Temperature_K(z + dz), { abs: 1e-7 });
      expectClose(us1976Pressure_Pa(z - dz), us1976Pressure_Pa(z + dz), { rel: 1e-9 });
    }
  });

  it('gives one-sided temperature gradients at the tropopause: −6.5 K/km′ below, 0 above', () => {
    const z = US1976_KINKS_M[0];
    const dHdz = gravityRatio(z);
    expectClose(us1976TemperatureGradient_K_per_m(z, -1), -0.0065 * dHdz, { rel: 1e-15 });
    expect(us1976TemperatureGradient_K_per_m(z, 1)).toBe(0);
    expect(us1976TemperatureGradient_K_per_m(z - 1, 1)).toBe(us1976TemperatureGradient_K_per_m(z - 1, -1));
  });

  it('has gradients that match a finite difference of the temperature', () => {
    for (const z of [500, 15_000, 25_000, 40_000, 49_000, 60_000, 80_000]) {
      const h = 0.5;
      const numeric = (us1976Temperature_K(z + h) - us1976Temperature_K(z - h)) / (2 * h);
      expectClose(us1976TemperatureGradient_K_per_m(z, 1), numeric, { abs: 1e-10 });
    }
  });
});
