/**
 * Resolves a scenario's layered or standard atmosphere to an AirColumn: temperature profile,
 * hydrostatic pressure and water vapour at constant relative humidity.
 */
import { requireInRange } from '../errors.js';
import { vapourPressureFromRelativeHumidity_Pa } from '../refractivity/water-vapour.js';
import type { ProfileAtmosphere, StandardAtmosphere } from '../scenario.js';
import type { AirColumn } from './column.js';
import type { Refinement } from './grid.js';
import { hydrostaticPressure } from './hydrostatic.js';
import { profileTemperature, standardTemperature, type TemperatureProfile } from './temperature-profile.js';
import { US1976_HYDROSTATIC_K_PER_M } from './us1976.js';

/** Allowed surface pressure of a resolved column, Pa (a loose physical bound; the scenario file allows 500..1100 hPa). */
export const SURFACE_PRESSURE_RANGE_PA = { min: 10_000, max: 200_000 } as const;

/** Temperature step of the central difference for d(svp)/dT, K (truncation error ≈ 1e-9 relative). */
const SVP_DERIVATIVE_STEP_K = 1e-3;

/** Options of airColumnFromProfile. */
export interface AirColumnOptions {
  /** g0·M/R for the hydrostatic integration, K/m. Default: hydrostaticPressure's (CODATA R). */
  hydrostatic_K_per_m?: number;
  /** Ranges wanting fine spacing, passed on to the hydrostatic grid and the index table. Default none. */
  refinements?: readonly Refinement[];
}

/**
 * Builds an AirColumn from a temperature profile: hydrostatic pressure from the surface pressure
 * and vapour pressure e = RH·svp(T) at a constant relative humidity (svp: Ciddor's saturation
 * vapour pressure, over liquid water also below 0 °C; at stratospheric temperatures e is below
 * 0.1 Pa and immaterial). de/dz = RH·(d svp/dT)·dT/dz with d svp/dT by central difference.
 * A kernel for other atmosphere sources (the marine surface layer builds on it): no checks.
 * @param temperature the profile (its kinks and top become the column's).
 * @param surface_pressure_Pa pressure at 0 m, Pa.
 * @param relative_humidity 0..1, constant with height.
 * @param options hydrostatic constant and refinements.
 * @returns the column. Pressure accuracy as hydrostaticPressure (≈ 1e-14 relative).
 * Reference: DESIGN.md §4–5; Ciddor 1996 (Applied Optics 35, 1566), Appendix A for svp.
 */
export function airColumnFromProfile(
  temperature: TemperatureProfile,
  surface_pressure_Pa: number,
  relative_humidity: number,
  options: AirColumnOptions = {},
): AirColumn {
  const refinements = options.refinements ?? [];
  const pressure = hydrostaticPressure(temperature, surface_pressure_Pa, {
    refinements,
    ...(options.hydrostatic_K_per_m !== undefined ? { hydrostatic_K_per_m: options.hydrostatic_K_per_m } : {}),
  });
  const rh = relative_humidity;
  const svpSlope = (T: number): number =>
    (vapourPressureFromRelativeHumidity_Pa(rh, T + SVP_DERIVATIVE_STEP_K) - vapourPressureFromRelativeHumidity_Pa(rh, T - SVP_DERIVATIVE_STEP_K)) /
    (2 * SVP_DERIVATIVE_STEP_K);
  return {
    temperature_K: (z_m) => temperature.temperature_K(z_m),
    temperatureGradient_K_per_m: (z_m, side) => temperature.temperatureGradient_K_per_m(z_m, side),
    pressure_Pa: pressure.pressure_Pa,
    pressureGradient_Pa_per_m: pressure.pressureGradient_Pa_per_m,
    vapour_pressure_Pa: (z_m) => (rh > 0 ? vapourPressureFromRelativeHumidity_Pa(rh, temperature.temperature_K(z_m)) : 0),
    vapourGradient_Pa_per_m: (z_m, side) =>
      rh > 0 ? svpSlope(temperature.temperature_K(z_m)) * temperature.temperatureGradient_K_per_m(z_m, side) : 0,
    kinks_m: temperature.kinks_m,
    refinements,
    top_m: temperature.top_m,
  };
}

/**
 * Resolves a layered-profile or standard atmosphere of a scenario to an AirColumn.
 *
 * - 'profile': nodes and `above` as profileTemperature; pressure integrated with the DESIGN.md §4
 *   constants (CODATA 2018 R).
 * - 'standard': the US 1976 profile shifted to the surface temperature; pressure integrated with
 *   the standard's own R* = 8.31432 J/(mol·K), so that at 288.15 K and 101 325 Pa the column
 *   reproduces the US 1976 pressures (to ≈ 1e-14). The two constants differ by 1.7e-5 relative,
 *   which changes p at 11 km by 2.6e-5 relative.
 * Top: 86 000 m (lower for a constant-lapse continuation that leaves 150..400 K).
 *
 * Validates: throws InputRangeError naming `atmosphere.surface_pressure_Pa` (10 000..200 000 Pa),
 * `atmosphere.relative_humidity` (0..1) and the profile fields (see profileTemperature).
 * @param spec the scenario's atmosphere (SI units).
 * @returns the resolved column.
 * Reference: DESIGN.md §4–5; US 1976 (NOAA/NASA/USAF 1976).
 */
export function resolveAirColumn(spec: ProfileAtmosphere | StandardAtmosphere): AirColumn {
  requireInRange('atmosphere.surface_pressure_Pa', spec.surface_pressure_Pa, SURFACE_PRESSURE_RANGE_PA.min, SURFACE_PRESSURE_RANGE_PA.max, 'Pa');
  requireInRange('atmosphere.relative_humidity', spec.relative_humidity, 0, 1);
  if (spec.kind === 'standard') {
    return airColumnFromProfile(standardTemperature(spec.surface_temperature_K), spec.surface_pressure_Pa, spec.relative_humidity, {
      hydrostatic_K_per_m: US1976_HYDROSTATIC_K_PER_M,
    });
  }
  return airColumnFromProfile(profileTemperature(spec.nodes, spec.above), spec.surface_pressure_Pa, spec.relative_humidity);
}
