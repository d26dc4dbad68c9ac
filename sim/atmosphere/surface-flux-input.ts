/**
 * Inputs of the bulk flux iteration (routine marine observations, SI), their defaults in one
 * place, and the validation done once at the public entry (STYLE.md §6, §7).
 */
import { CELSIUS_OFFSET_K, RAD_PER_DEG } from '../constants.js';
import { InputRangeError } from '../errors.js';

/** Routine marine observations for the COARE-style bulk iteration. SI units. */
export interface BulkFluxInput {
  /** Sea temperature, K: the bulk temperature (a few metres down) when cool_skin is true, the
   * skin temperature when false. −2.5..40 °C. */
  sea_temperature_K: number;
  /** Air temperature at air_temperature_height_m, K. −40..45 °C. */
  air_temperature_K: number;
  /** Height of the air temperature (and, by default, humidity) sensor above the sea, m. 0.5..100. */
  air_temperature_height_m: number;
  /** Height of the humidity sensor, m (0.5..100). Default: air_temperature_height_m. */
  humidity_height_m?: number;
  /** Wind speed relative to the sea surface at wind_height_m, m/s. 0..40. */
  wind_speed_m_s: number;
  /** Height of the wind sensor above the sea, m. 0.5..100. */
  wind_height_m: number;
  /** Relative humidity over water at the humidity height, 0..1. */
  relative_humidity: number;
  /** Surface air pressure, Pa. 50 000..110 000. */
  surface_pressure_Pa: number;
  /** Apply the cool-skin correction (sea_temperature_K is then the bulk temperature). */
  cool_skin: boolean;
  /** Downward short-wave radiation, W/m² (0..1500); only the cool skin uses it. Default 150. */
  shortwave_down_W_per_m2?: number;
  /** Downward long-wave radiation, W/m² (0..700); only the cool skin uses it. Default 370. */
  longwave_down_W_per_m2?: number;
  /** Latitude, rad (−π/2..π/2), for normal gravity. Default 45° (g = 9.8062 m/s²). */
  latitude_rad?: number;
  /** Height of the atmospheric boundary layer, m (100..5000), for convective gustiness. Default 600. */
  boundary_layer_height_m?: number;
}

/**
 * Defaults of the optional inputs and of the iteration. The radiation defaults are those of the
 * COARE 3.5 reference code (`coare35vn.py` signature: Rs = 150, Rl = 370 W/m², lat = 45°,
 * zi = 600 m); the cool skin is the only user of the radiation.
 */
export const BULK_FLUX_DEFAULTS = {
  shortwave_down_W_per_m2: 150,
  longwave_down_W_per_m2: 370,
  latitude_rad: 45 * RAD_PER_DEG,
  boundary_layer_height_m: 600,
  /** Largest number of passes of the iteration (COARE itself always makes 10). */
  max_iterations: 100,
  /** Relative change of u*, θ*, q* and z/L between passes that counts as converged. */
  tolerance: 1e-10,
} as const;

/** BulkFluxInput with every optional field filled in. */
export type ResolvedBulkFluxInput = Required<BulkFluxInput>;

/** Allowed ranges of the inputs, [min, max, unit]; temperatures in K (the °C range in the text). */
export const BULK_FLUX_LIMITS = {
  sea_temperature_K: [-2.5 + CELSIUS_OFFSET_K, 40 + CELSIUS_OFFSET_K, 'K (−2.5..40 °C)'],
  air_temperature_K: [-40 + CELSIUS_OFFSET_K, 45 + CELSIUS_OFFSET_K, 'K (−40..45 °C)'],
  height_m: [0.5, 100, 'm'],
  wind_speed_m_s: [0, 40, 'm/s'],
  relative_humidity: [0, 1, '(fraction)'],
  surface_pressure_Pa: [50_000, 110_000, 'Pa'],
  shortwave_down_W_per_m2: [0, 1500, 'W/m²'],
  longwave_down_W_per_m2: [0, 700, 'W/m²'],
  latitude_rad: [-Math.PI / 2, Math.PI / 2, 'rad'],
  boundary_layer_height_m: [100, 5000, 'm'],
} as const;

type LimitName = keyof typeof BULK_FLUX_LIMITS;

function check(prefix: string, field: string, value: number, limit: LimitName): number {
  const [min, max, unit] = BULK_FLUX_LIMITS[limit];
  if (typeof value !== 'number' || !Number.isFinite(value) || value < min || value > max) {
    const show = (x: number) => String(Number(x.toPrecision(6)));
    throw new InputRangeError(`${prefix}.${field}`, value, `${show(min)}..${show(max)} ${unit}`);
  }
  return value;
}

/**
 * Checks every field of the observations and fills in the defaults.
 * @param input the observations (SI).
 * @param prefix field path used in error messages, e.g. "atmosphere.bulk".
 * @returns the input with every optional field set.
 * @throws InputRangeError naming the field, the value and the allowed range (e.g.
 * "atmosphere.bulk.wind_speed_m_s = -1 is out of range: allowed 0..40 m/s"); non-finite values too.
 */
export function validateBulkFluxInput(input: BulkFluxInput, prefix = 'atmosphere.bulk'): ResolvedBulkFluxInput {
  const d = BULK_FLUX_DEFAULTS;
  const air_temperature_height_m = check(prefix, 'air_temperature_height_m', input.air_temperature_height_m, 'height_m');
  return {
    sea_temperature_K: check(prefix, 'sea_temperature_K', input.sea_temperature_K, 'sea_temperature_K'),
    air_temperature_K: check(prefix, 'air_temperature_K', input.air_temperature_K, 'air_temperature_K'),
    air_temperature_height_m,
    humidity_height_m: check(prefix, 'humidity_height_m', input.humidity_height_m ?? air_temperature_height_m, 'height_m'),
    wind_speed_m_s: check(prefix, 'wind_speed_m_s', input.wind_speed_m_s, 'wind_speed_m_s'),
    wind_height_m: check(prefix, 'wind_height_m', input.wind_height_m, 'height_m'),
    relative_humidity: check(prefix, 'relative_humidity', input.relative_humidity, 'relative_humidity'),
    surface_pressure_Pa: check(prefix, 'surface_pressure_Pa', input.surface_pressure_Pa, 'surface_pressure_Pa'),
    cool_skin: input.cool_skin === true,
    shortwave_down_W_per_m2: check(prefix, 'shortwave_down_W_per_m2', input.shortwave_down_W_per_m2 ?? d.shortwave_down_W_per_m2, 'shortwave_down_W_per_m2'),
    longwave_down_W_per_m2: check(prefix, 'longwave_down_W_per_m2', input.longwave_down_W_per_m2 ?? d.longwave_down_W_per_m2, 'longwave_down_W_per_m2'),
    latitude_rad: check(prefix, 'latitude_rad', input.latitude_rad ?? d.latitude_rad, 'latitude_rad'),
    boundary_layer_height_m: check(prefix, 'boundary_layer_height_m', input.boundary_layer_height_m ?? d.boundary_layer_height_m, 'boundary_layer_height_m'),
  };
}
