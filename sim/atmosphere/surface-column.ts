/**
 * The marine surface layer as an AirColumn: routine observations (DESIGN.md §5 `atmosphere.bulk`)
 * → COARE-style fluxes → Monin-Obukhov temperature and humidity up to a blending height → the
 * scenario's air above (nodes for an elevated inversion, then a constant lapse or the US 1976
 * lapse rates), with hydrostatic pressure through the whole column.
 */
import { InputRangeError } from '../errors.js';
import { saturationVapourPressure_Pa } from '../refractivity/water-vapour.js';
import type { BulkAtmosphere } from '../scenario.js';
import type { AirColumn } from './column.js';
import { hydrostaticPressure } from './hydrostatic.js';
import { airColumnFromProfile } from './resolve.js';
import { computeBulkFlux, type FluxResult } from './surface-flux.js';
import { BULK_FLUX_DEFAULTS } from './surface-flux-input.js';
import { blendingHeight_m, surfaceLayerProfile, surfaceLayerRefinements, type BlendingLimit } from './surface-profile.js';
import { MOLAR_MASS_RATIO } from './surface-thermo.js';
import { profileTemperature, type TemperatureProfile } from './temperature-profile.js';

/** Inputs that the scenario's bulk block does not carry; all optional (defaults: BULK_FLUX_DEFAULTS). */
export interface BulkColumnOptions {
  /** Downward short-wave radiation for the cool skin, W/m². Default 150 (COARE code default). */
  shortwave_down_W_per_m2?: number;
  /** Downward long-wave radiation for the cool skin, W/m². Default 370 (COARE code default). */
  longwave_down_W_per_m2?: number;
  /** Latitude for gravity in the flux iteration, rad. Default 45°. */
  latitude_rad?: number;
  /** Boundary-layer height, m: gustiness and the default blending height 0.1 z_i. Default 600. */
  boundary_layer_height_m?: number;
  /** Blending height chosen by the caller, m (replaces the rule of blendingHeight_m). */
  blending_height_m?: number;
}

/** A resolved bulk atmosphere. */
export interface BulkColumn {
  column: AirColumn;
  flux: FluxResult;
  /** Top of the Monin-Obukhov profile, m. */
  blending_height_m: number;
  /** What set the blending height. */
  blending_limited_by: BlendingLimit;
  /** Soft problems (non-convergence, very stable air, fog), plain sentences. */
  warnings: string[];
}

/** Heights per decade at which the surface layer is checked for supersaturation. */
const FOG_CHECKS_PER_DECADE = 10;

/**
 * Resolves a scenario's bulk (marine observations) atmosphere to an AirColumn.
 *
 * - Below the blending height z_b (blendingHeight_m): T(z) and q(z) of surfaceLayerProfile, which
 *   pass exactly through the observed air temperature and humidity at the sensor height; held
 *   constant below the roughness length z_ot.
 * - Above z_b: straight lines through spec.nodes (if any), then spec.above, starting from T(z_b)
 *   (profileTemperature), so T is continuous; water vapour at the relative humidity reached at z_b,
 *   held constant (as for layered profiles), so e is continuous too.
 * - Pressure: hydrostatic from the surface pressure through the whole column (hydrostatic.ts).
 * - Vapour pressure in the surface layer: e = q p/(ε + (1 − ε) q), p the hydrostatic pressure.
 * - Kinks: z_ot, z_b, the nodes and the continuation's layer bases; refinements: spacing z/20 from
 *   z_ot up to z_b (geometric growth), at most 1 mm in the lowest centimetre (surfaceLayerRefinements).
 *
 * Validates: the observations (InputRangeError naming `atmosphere.bulk.<field>`), the nodes
 * (`atmosphere.nodes[i].height_m`, first above the air temperature height) and `above`.
 * @param spec the scenario's bulk atmosphere, SI.
 * @param options radiation, latitude, boundary-layer and blending heights (BulkColumnOptions).
 * @returns the column, the flux result, the blending height and warnings.
 * Accuracy: the column reproduces the surface-layer formulas exactly (no tabulation here).
 * Reference: Fairall et al. (2003), J. Climate 16, 571–590; DESIGN.md §5; REFERENCES.md §7.
 */
export function resolveBulkColumn(spec: BulkAtmosphere, options: BulkColumnOptions = {}): BulkColumn {
  const { blending_height_m: givenBlend, ...fluxOptions } = options;
  const zi = options.boundary_layer_height_m ?? BULK_FLUX_DEFAULTS.boundary_layer_height_m;
  const flux = computeBulkFlux({
    sea_temperature_K: spec.sea_temperature_K,
    air_temperature_K: spec.air_temperature_K,
    air_temperature_height_m: spec.air_temperature_height_m,
    wind_speed_m_s: spec.wind_speed_m_s,
    wind_height_m: spec.wind_height_m,
    relative_humidity: spec.relative_humidity,
    surface_pressure_Pa: spec.surface_pressure_Pa,
    cool_skin: spec.cool_skin,
    ...fluxOptions,
    boundary_layer_height_m: zi,
  });
  const zMeas = spec.air_temperature_height_m;
  const nodes = spec.nodes ?? [];
  if (nodes.length > 0) {
    profileTemperature(nodes, spec.above); // validates the nodes with their own indices
    if (!(nodes[0].height_m > zMeas)) {
      throw new InputRangeError('atmosphere.nodes[0].height_m', nodes[0].height_m, `above the air temperature height (${zMeas} m)`);
    }
  }
  if (givenBlend !== undefined && !(givenBlend > 0 && givenBlend <= 1000)) {
    throw new InputRangeError('blending_height_m', givenBlend, '0..1000 m (exclusive of 0)');
  }
  const blend = blendingHeight_m(flux, zMeas, zi, nodes[0]?.height_m, givenBlend);
  const zb = blend.height_m;
  const surface = surfaceLayerProfile(flux);
  const upper = profileTemperature([{ height_m: zb, temperature_K: surface.temperature_K(zb) }, ...nodes], spec.above);
  const zot = surface.roughness_heat_m;
  const below = (z: number, side: -1 | 1): boolean => z < zb || (z === zb && side < 0);
  const temperature: TemperatureProfile = {
    temperature_K: (z) => (z <= zb ? surface.temperature_K(z) : upper.temperature_K(z)),
    temperatureGradient_K_per_m: (z, side) =>
      below(z, side) ? surface.temperatureGradient_K_per_m(z, side) : upper.temperatureGradient_K_per_m(z, side),
    kinks_m: [zot, ...upper.kinks_m.filter((z) => z >= zb)],
    top_m: upper.top_m,
  };
  const refinements = surfaceLayerRefinements(zot, zb);
  const pressure = hydrostaticPressure(temperature, spec.surface_pressure_Pa, { refinements });

  const eps = MOLAR_MASS_RATIO;
  const vapour = (z: number): number => {
    const q = surface.specific_humidity(z);
    return (q * pressure.pressure_Pa(z)) / (eps + (1 - eps) * q);
  };
  const vapourGradient = (z: number, side: -1 | 1): number => {
    const q = surface.specific_humidity(z);
    const d = eps + (1 - eps) * q;
    const p = pressure.pressure_Pa(z);
    return ((p * eps) / (d * d)) * surface.specificHumidityGradient_per_m(z, side) + (q / d) * pressure.pressureGradient_Pa_per_m(z);
  };
  const rhBlend = vapour(zb) / saturationVapourPressure_Pa(temperature.temperature_K(zb));
  const above = airColumnFromProfile(temperature, spec.surface_pressure_Pa, rhBlend, { refinements });

  const column: AirColumn = {
    ...above,
    vapour_pressure_Pa: (z) => (z <= zb ? vapour(z) : above.vapour_pressure_Pa(z)),
    vapourGradient_Pa_per_m: (z, side) => (below(z, side) ? vapourGradient(z, side) : above.vapourGradient_Pa_per_m(z, side)),
  };
  return { column, flux, blending_height_m: zb, blending_limited_by: blend.limited_by, warnings: bulkWarnings(flux, blend.limited_by, zb, column) };
}

function bulkWarnings(flux: FluxResult, limit: BlendingLimit, zb: number, column: AirColumn): string[] {
  const warnings: string[] = [];
  if (flux.very_stable) {
    warnings.push('very stable air (z/L > 50 at the wind sensor in the first guess): the first-pass COARE solution is used, as the reference code does');
  } else if (!flux.converged) {
    warnings.push(`the bulk flux iteration did not converge in ${flux.iterations} passes; the last pass is used`);
  }
  if (limit === 'stability') {
    warnings.push(`stable air: the surface-layer profile ends at ${zb.toPrecision(3)} m (z/L = 6.35), where its gradient stops weakening with height`);
  } else if (limit === 'node') {
    warnings.push(`the first profile node shortens the surface layer to ${zb.toPrecision(3)} m (half the node's height)`);
  }
  const z0 = Math.max(flux.roughness_heat_m, 1e-6);
  const steps = Math.ceil(Math.log10(zb / z0) * FOG_CHECKS_PER_DECADE);
  for (let i = 0; i <= steps; i++) {
    const z = z0 * Math.pow(zb / z0, i / steps);
    if (column.vapour_pressure_Pa(z) > saturationVapourPressure_Pa(column.temperature_K(z))) {
      warnings.push(`the surface layer is supersaturated from about ${z.toPrecision(3)} m (fog likely): vapour pressure above saturation is kept as computed`);
      break;
    }
  }
  return warnings;
}
