import { describe, expect, it } from 'vitest';
import { HUMIDITY_TOP_M, MAX_VAPOUR_MOLE_FRACTION, resolveAirColumn } from '../../sim/atmosphere/resolve.js';
import { US1976_HYDROSTATIC_K_PER_M, US1976_KINKS_M, geometricHeight_m, us1976Pressure_Pa } from '../../sim/atmosphere/us1976.js';
import { HYDROSTATIC_K_PER_M } from '../../sim/constants.js';
import { InputRangeError } from '../../sim/errors.js';
import { saturationVapourPressure_Pa } from '../../sim/refractivity/water-vapour.js';
import type { ProfileAtmosphere, StandardAtmosphere } from '../../sim/scenario.js';
import { loadFixture } from '../refractivity/fixture.js';
import { expectClose } from '../support/close.js';

/** Relative pressure tolerance at the layer bases: REFERENCES.md §0 row D suggests 1e-6 (7 significant digits). */
const BASE_PRESSURE_REL = 1e-6;
/** Relative tolerance of identities that only rounding and the ≈1e-14 quadrature can disturb. */
const IDENTITY_REL = 1e-12;

const standard: StandardAtmosphere = { kind: 'standard', surface_temperature_K: 288.15, surface_pressure_Pa: 101_325, relative_humidity: 0 };
const channel: ProfileAtmosphere = {
  kind: 'profile',
  surface_pressure_Pa: 101_325,
  relative_humidity: 0.7,
  nodes: [{ height_m: 0, temperature_K: 275.15 }, { height_m: 30, temperature_K: 285.15 }],
  above: { kind: 'us1976' },
};

describe('resolving the standard atmosphere', () => {
  it('reproduces the US 1976 base pressures at 15 °C and 101 325 Pa', () => {
    // U.S. Standard Atmosphere 1976 base values, REFERENCES.md §3 (read: PDAS program output).
    const column = resolveAirColumn(standard);
    const rows = loadFixture('us1976-layer-bases.csv', ['H_km', 'T_K', 'p_ratio', 'p_Pa'], 8);
    for (const row of rows) expectClose(column.pressure_Pa(geometricHeight_m(row.H_km * 1000)), row.p_Pa, { rel: BASE_PRESSURE_REL });
    expect(column.kinks_m).toEqual(US1976_KINKS_M);
    expect(column.top_m).toBe(86_000);
  });

  it('is dry when the relative humidity is 0', () => {
    const column = resolveAirColumn(standard);
    expect(column.vapour_pressure_Pa(100)).toBe(0);
    expect(column.vapourGradient_Pa_per_m(100, 1)).toBe(0);
  });
});

describe('resolving a layered profile', () => {
  it('integrates pressure with the CODATA gas constant: ln(p/p0) scales by k/k76 against the standard', () => {
    // Same temperatures as the standard; ln p is proportional to the hydrostatic constant (an identity).
    const column = resolveAirColumn({ ...channel, relative_humidity: 0, nodes: [{ height_m: 0, temperature_K: 288.15 }] });
    const ratio = HYDROSTATIC_K_PER_M / US1976_HYDROSTATIC_K_PER_M;
    for (const z of [10, 11_019.07, 50_000]) {
      expectClose(column.pressure_Pa(z), 101_325 * (us1976Pressure_Pa(z) / 101_325) ** ratio, { rel: IDENTITY_REL });
    }
  });

  it('holds the relative humidity constant: e = RH·svp(T)', () => {
    // Ciddor 1996, Appendix A: e = RH·svp with Ciddor's saturation vapour pressure (no enhancement factor in e).
    const column = resolveAirColumn(channel);
    for (const z of [0, 12, 30, 2000]) {
      expectClose(column.vapour_pressure_Pa(z), 0.7 * saturationVapourPressure_Pa(column.temperature_K(z)), { rel: 1e-15 });
    }
  });

  it('gives vapour gradients equal to a central difference of e, one-sided at the kink', () => {
    const column = resolveAirColumn(channel);
    const h = 1e-3;
    for (const z of [5, 500]) {
      const numeric = (column.vapour_pressure_Pa(z + h) - column.vapour_pressure_Pa(z - h)) / (2 * h);
      // Both central differences: truncation ≈ 1e-9 relative (svp‴/svp′ ≈ 0.005 K⁻²), rounding ≈ 1e-11.
      expectClose(column.vapourGradient_Pa_per_m(z, 1), numeric, { rel: 1e-7 });
    }
    const below = column.vapourGradient_Pa_per_m(30, -1);
    const above = column.vapourGradient_Pa_per_m(30, 1);
    expect(below).toBeGreaterThan(0);
    expect(above).toBeLessThan(0);
  });

  it('holds the vapour mole fraction above the tropopause, so e stays far below p at the warm stratopause', () => {
    const column = resolveAirColumn({ ...standard, relative_humidity: 1 });
    const zh = HUMIDITY_TOP_M;
    expect(column.kinks_m).toContain(zh);
    const fraction = column.vapour_pressure_Pa(zh) / column.pressure_Pa(zh);
    for (const z of [20_000, 47_500, 80_000]) {
      expectClose(column.vapour_pressure_Pa(z) / column.pressure_Pa(z), fraction, { rel: 1e-14 });
    }
    // Constant relative humidity would give e = svp(270.65 K) ≈ 509 Pa against p ≈ 111 Pa at 47 km′.
    expect(fraction).toBeLessThan(1e-3);
    // One-sided gradients at the humidity top: from svp(T) below, from p above.
    const below = column.vapourGradient_Pa_per_m(zh, -1);
    const above = column.vapourGradient_Pa_per_m(zh, 1);
    expectClose(above, fraction * column.pressureGradient_Pa_per_m(zh), { rel: 1e-14 });
    expect(Math.abs(below / above)).toBeGreaterThan(2);
  });

  it('lowers the humidity top where saturated air would exceed a vapour mole fraction of 0.2', () => {
    // 330 K saturated at the surface: svp ≈ 17 kPa; p falls faster than svp under a +0.005 K/m lapse.
    const hot = resolveAirColumn({ ...channel, relative_humidity: 1, nodes: [{ height_m: 0, temperature_K: 330 }], above: { kind: 'lapse', lapse_K_per_m: 0.005 } });
    expect(hot.kinks_m[0]).toBeLessThan(HUMIDITY_TOP_M);
    for (const z of [0, 1000, 5000, 10_000, 13_000]) {
      expect(hot.vapour_pressure_Pa(z) / hot.pressure_Pa(z)).toBeLessThanOrEqual(MAX_VAPOUR_MOLE_FRACTION);
    }
  });

  it('rejects a surface pressure or a relative humidity out of range, naming the field', () => {
    const fails = (f: () => unknown, field: string) => {
      expect(f).toThrow(InputRangeError);
      expect(f).toThrow(field);
    };
    fails(() => resolveAirColumn({ ...channel, surface_pressure_Pa: 0 }), 'atmosphere.surface_pressure_Pa');
    fails(() => resolveAirColumn({ ...channel, relative_humidity: 1.2 }), 'atmosphere.relative_humidity');
    fails(() => resolveAirColumn({ ...standard, surface_temperature_K: -3 }), 'atmosphere.surface_temperature_K');
  });
});
