import { describe, expect, it } from 'vitest';
import { HYDROSTATIC_K_PER_M, US1976_EARTH_RADIUS_M } from '../../sim/constants.js';
import { hydrostaticPressure } from '../../sim/atmosphere/hydrostatic.js';
import { profileTemperature, standardTemperature } from '../../sim/atmosphere/temperature-profile.js';
import { US1976_HYDROSTATIC_K_PER_M, geopotentialHeight_m, us1976Pressure_Pa } from '../../sim/atmosphere/us1976.js';
import { expectClose } from '../support/close.js';

/**
 * Relative pressure tolerance against closed forms. The brief asks for 1e-9; Gauss–Legendre on
 * 2 km cells reaches rounding (≈ 1e-14), so 1e-12 leaves room for rounding yet fails on any real
 * quadrature or bookkeeping error.
 */
const PRESSURE_REL = 1e-12;

/**
 * ∫₀^z (a/(a+s))² / (T0 + L s) ds in closed form (partial fractions; derived here): with
 * D = T0 − L a, it is a²·[(L/D²)·(ln(T/T0) − ln((a+z)/a)) + z/(D·a·(a+z))].
 */
function linearProfileIntegral(T0: number, L: number, z: number, a = US1976_EARTH_RADIUS_M): number {
  const D = T0 - L * a;
  const T = T0 + L * z;
  return a * a * ((L / (D * D)) * (Math.log(T / T0) - Math.log1p(z / a)) + z / (D * a * (a + z)));
}

describe('hydrostatic pressure', () => {
  it('reproduces the US 1976 pressures for the standard atmosphere at 15 °C and 101 325 Pa', () => {
    // Against the standard's closed forms (US 1976 Eqs. 33a/33b, in us1976.ts), every 250 m to 86 km.
    const profile = standardTemperature(288.15);
    const pressure = hydrostaticPressure(profile, 101_325, { hydrostatic_K_per_m: US1976_HYDROSTATIC_K_PER_M });
    for (let z = 0; z <= 86_000; z += 250) expectClose(pressure.pressure_Pa(z), us1976Pressure_Pa(z), { rel: PRESSURE_REL });
  });

  it('matches the analytic integral for a temperature linear in geometric height (0.5 K/m inversion, then −6.5 K/km)', () => {
    const p0 = 101_000;
    const profile = profileTemperature([{ height_m: 0, temperature_K: 275 }, { height_m: 20, temperature_K: 285 }], { kind: 'lapse', lapse_K_per_m: -0.0065 });
    const pressure = hydrostaticPressure(profile, p0);
    const k = HYDROSTATIC_K_PER_M;
    const p20 = p0 * Math.exp(-k * linearProfileIntegral(275, 0.5, 20));
    for (const z of [0.001, 1, 7.5, 19.99, 20]) {
      expectClose(pressure.pressure_Pa(z), p0 * Math.exp(-k * linearProfileIntegral(275, 0.5, z)), { rel: PRESSURE_REL });
    }
    // Above the kink, from the node at 20 m: s = 20 + u turns (r0/(r0 + s))² into (r0/a′)²·(a′/(a′ + u))², a′ = r0 + 20 m.
    const aPrime = US1976_EARTH_RADIUS_M + 20;
    const scale = (US1976_EARTH_RADIUS_M / aPrime) ** 2;
    for (const z of [25, 1000, 12_000, 20_000]) {
      const integral = scale * linearProfileIntegral(285, -0.0065, z - 20, aPrime);
      expectClose(pressure.pressure_Pa(z), p20 * Math.exp(-k * integral), { rel: PRESSURE_REL });
    }
  });

  it('is exponential in geopotential height for an isothermal column', () => {
    const profile = profileTemperature([{ height_m: 0, temperature_K: 250 }], { kind: 'lapse', lapse_K_per_m: 0 });
    const pressure = hydrostaticPressure(profile, 100_000);
    for (const z of [-10, 0, 3, 999.5, 40_000, 86_000]) {
      expectClose(pressure.pressure_Pa(z), 100_000 * Math.exp((-HYDROSTATIC_K_PER_M * geopotentialHeight_m(z)) / 250), { rel: PRESSURE_REL });
    }
  });

  it('gives a gradient equal to a central difference of the pressure', () => {
    const profile = profileTemperature([{ height_m: 0, temperature_K: 275 }, { height_m: 20, temperature_K: 285 }], { kind: 'us1976' });
    const pressure = hydrostaticPressure(profile, 101_325);
    for (const z of [5, 19.5, 500, 15_000, 60_000]) {
      const h = 0.01;
      const numeric = (pressure.pressure_Pa(z + h) - pressure.pressure_Pa(z - h)) / (2 * h);
      // Central difference: truncation (h²/6)·p‴ ≈ 1e-13 relative, rounding ≈ 1e-16·p/h ≈ 1e-12 relative.
      expectClose(pressure.pressureGradient_Pa_per_m(z), numeric, { rel: 1e-8 });
    }
  });

  it('uses fine cells where a refinement asks for them without changing the result', () => {
    const profile = standardTemperature(280);
    const coarse = hydrostaticPressure(profile, 100_000);
    const fine = hydrostaticPressure(profile, 100_000, { refinements: [{ from_m: 0, to_m: 1, spacing_m: 0.001 }] });
    for (const z of [0.0005, 0.5, 10, 30_000]) expectClose(fine.pressure_Pa(z), coarse.pressure_Pa(z), { rel: PRESSURE_REL });
  });

  it('gives each height the same pressure whatever was asked before it (the repeat of the last height is exact)', () => {
    // A fresh column per height is the reference: asking in any order, with repeats, changes no bit.
    const profile = profileTemperature([{ height_m: 0, temperature_K: 275 }, { height_m: 20, temperature_K: 285 }], { kind: 'us1976' });
    const shared = hydrostaticPressure(profile, 101_325);
    const heights = [5, 5, 19.5, 0, 0, 15_000, 5, 60_000, 60_000, 19.5, -0, 0];
    for (const z of heights) {
      const fresh = hydrostaticPressure(profile, 101_325);
      expect(shared.pressure_Pa(z)).toBe(fresh.pressure_Pa(z));
      expect(shared.pressureGradient_Pa_per_m(z)).toBe(fresh.pressureGradient_Pa_per_m(z));
    }
  });
});

