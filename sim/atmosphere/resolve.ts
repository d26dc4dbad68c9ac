/**
 * Resolves a scenario's layered or standard atmosphere to an AirColumn: temperature profile,
 * hydrostatic pressure and water vapour (constant relative humidity up to the tropopause).
 */
import { requireInRange } from '../errors.js';
import { vapourPressureFromRelativeHumidity_Pa } from '../refractivity/water-vapour.js';
import type { ProfileAtmosphere, StandardAtmosphere } from '../scenario.js';
import type { AirColumn } from './column.js';
import type { Refinement } from './grid.js';
import { hydrostaticPressure } from './hydrostatic.js';
import { profileTemperature, standardTemperature, type TemperatureProfile } from './temperature-profile.js';
import { US1976_HYDROSTATIC_K_PER_M, US1976_KINKS_M } from './us1976.js';

/** Allowed surface pressure of a resolved column, Pa (a loose physical bound; the scenario file allows 500..1100 hPa). */
export const SURFACE_PRESSURE_RANGE_PA = { min: 10_000, max: 200_000 } as const;

/** Temperature step of the central difference for d(svp)/dT, K (truncation error ≈ 1e-9 relative). */
const SVP_DERIVATIVE_STEP_K = 1e-3;

/**
 * Default top of the constant-relative-humidity air, m: the US 1976 tropopause (11 km′ = 11 019 m).
 * Above it the vapour mole fraction is held instead (e ∝ p): the stratosphere is dry, and a
 * constant relative humidity would give a vapour pressure above the total pressure near the warm
 * stratopause (svp(270.65 K) ≈ 509 Pa against p ≈ 111 Pa at 47 km′).
 */
export const HUMIDITY_TOP_M = US1976_KINKS_M[0];

/**
 * Largest vapour mole fraction e/p of the constant-humidity part, dimensionless. Where RH·svp(T)
 * would exceed it below HUMIDITY_TOP_M (only in implausibly hot columns), the constant-humidity
 * part ends lower. 0.2 is reached at the surface only by saturated air near 60 °C.
 */
export const MAX_VAPOUR_MOLE_FRACTION = 0.2;

/** Step of the search for the height where e/p would exceed MAX_VAPOUR_MOLE_FRACTION, m. */
const HUMIDITY_SCAN_STEP_M = 100;

/** Options of airColumnFromProfile. */
export interface AirColumnOptions {
  /** g0·M/R for the hydrostatic integration, K/m. Default: hydrostaticPressure's (CODATA R). */
  hydrostatic_K_per_m?: number;
  /** Ranges wanting fine spacing, passed on to the hydrostatic grid and the index table. Default none. */
  refinements?: readonly Refinement[];
  /** Top of the constant-relative-humidity air, m. Default HUMIDITY_TOP_M (11 019 m). */
  humidityTop_m?: number;
}

/**
 * Builds an AirColumn from a temperature profile: hydrostatic pressure from the surface pressure,
 * and water vapour e = RH·svp(T) at a constant relative humidity up to a humidity top z_h, then
 * e = e(z_h)·p/p(z_h) (constant mole fraction) above; z_h is a kink of de/dz. svp is Ciddor's
 * saturation vapour pressure (over liquid water also below 0 °C). de/dz = RH·(d svp/dT)·dT/dz
 * below z_h, with d svp/dT by central difference, and e·(dp/dz)/p above.
 * z_h = options.humidityTop_m (default 11 019 m), lowered (to a multiple of 100 m) to where
 * RH·svp(T) would exceed MAX_VAPOUR_MOLE_FRACTION·p.
 * A kernel for other atmosphere sources (the marine surface layer builds on it): no checks.
 * @param temperature the profile (its kinks and top become the column's).
 * @param surface_pressure_Pa pressure at 0 m, Pa.
 * @param relative_humidity 0..1, constant with height up to z_h.
 * @param options hydrostatic constant, refinements, humidity top.
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
  const base = {
    temperature_K: (z_m: number) => temperature.temperature_K(z_m),
    temperatureGradient_K_per_m: (z_m: number, side: -1 | 1) => temperature.temperatureGradient_K_per_m(z_m, side),
    pressure_Pa: pressure.pressure_Pa,
    pressureGradient_Pa_per_m: pressure.pressureGradient_Pa_per_m,
    refinements,
    top_m: temperature.top_m,
  };
  const rh = relative_humidity;
  if (!(rh > 0)) {
    return { ...base, vapour_pressure_Pa: () => 0, vapourGradient_Pa_per_m: () => 0, kinks_m: temperature.kinks_m };
  }
  const humid = (z: number): number => vapourPressureFromRelativeHumidity_Pa(rh, temperature.temperature_K(z));
  const zh = humidityTop(humid, pressure.pressure_Pa, Math.min(options.humidityTop_m ?? HUMIDITY_TOP_M, temperature.top_m));
  const eh = humid(zh);
  const ph = pressure.pressure_Pa(zh);
  const svpSlope = (T: number): number =>
    (vapourPressureFromRelativeHumidity_Pa(rh, T + SVP_DERIVATIVE_STEP_K) - vapourPressureFromRelativeHumidity_Pa(rh, T - SVP_DERIVATIVE_STEP_K)) /
    (2 * SVP_DERIVATIVE_STEP_K);
  const kinks = zh > 0 && zh < temperature.top_m ? [...new Set([...temperature.kinks_m, zh])].sort((a, b) => a - b) : temperature.kinks_m;
  return {
    ...base,
    vapour_pressure_Pa: (z_m) => (z_m <= zh ? humid(z_m) : (eh * pressure.pressure_Pa(z_m)) / ph),
    vapourGradient_Pa_per_m: (z_m, side) =>
      z_m < zh || (z_m === zh && side < 0)
        ? svpSlope(temperature.temperature_K(z_m)) * temperature.temperatureGradient_K_per_m(z_m, side)
        : (eh * pressure.pressureGradient_Pa_per_m(z_m)) / ph,
    kinks_m: kinks,
  };
}

/** The humidity top: `limit`, or lower where e/p would exceed MAX_VAPOUR_MOLE_FRACTION. */
function humidityTop(humid: (z: number) => number, pressure: (z: number) => number, limit: number): number {
  let previous = 0;
  for (let z = 0; z < limit + HUMIDITY_SCAN_STEP_M; z += HUMIDITY_SCAN_STEP_M) {
    const at = Math.min(z, limit);
    if (humid(at) > MAX_VAPOUR_MOLE_FRACTION * pressure(at)) return previous;
    previous = at;
  }
  return limit;
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
 * Relative humidity is constant up to 11 019 m (the US 1976 tropopause) or the last node if higher,
 * the vapour mole fraction above (see airColumnFromProfile).
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
  const lastNode_m = spec.nodes.length > 0 ? spec.nodes[spec.nodes.length - 1].height_m : 0;
  return airColumnFromProfile(profileTemperature(spec.nodes, spec.above), spec.surface_pressure_Pa, spec.relative_humidity, {
    humidityTop_m: Math.max(HUMIDITY_TOP_M, lastNode_m),
  });
}
