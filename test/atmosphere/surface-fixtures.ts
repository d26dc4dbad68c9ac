/**
 * Observation sets shared by the surface-layer tests, each with its source.
 */
import { CELSIUS_OFFSET_K, RAD_PER_DEG } from '../../sim/constants.js';
import type { BulkFluxInput } from '../../sim/atmosphere/surface-flux-input.js';

const K = CELSIUS_OFFSET_K;

/** Row 1 of NOAA-PSL COARE-algorithm Python/COARE3.5/test_35_data.txt (REFERENCES.md §7.4). */
export const COARE_ROW1: BulkFluxInput = {
  wind_speed_m_s: 4.7,
  wind_height_m: 16,
  air_temperature_K: 27.7 + K,
  air_temperature_height_m: 16,
  relative_humidity: 0.7521,
  surface_pressure_Pa: 100_800,
  sea_temperature_K: 29.15 + K,
  cool_skin: true,
  shortwave_down_W_per_m2: 0,
  longwave_down_W_per_m2: 428,
  latitude_rad: -1.73 * RAD_PER_DEG,
  boundary_layer_height_m: 600,
};

/** Row 58 of the same file: u = 3.1, ts = 29.12, Rs = 2, Rl = 406 (REFERENCES.md §7.4). */
export const COARE_ROW58: BulkFluxInput = {
  ...COARE_ROW1,
  wind_speed_m_s: 3.1,
  sea_temperature_K: 29.12 + K,
  shortwave_down_W_per_m2: 2,
  longwave_down_W_per_m2: 406,
};

/**
 * Common inputs of REFERENCES.md §7.5 (sensors at 10 m, air 15 °C, RH 80 %, 1013 mb, skin
 * temperature given, jcool = 0, Rl = 370, Rs = 0, lat 45°, zi = 600 m) with the sea temperature
 * and wind of a case.
 */
export function section75Case(sea_C: number, wind_m_s = 5): BulkFluxInput {
  return {
    wind_speed_m_s: wind_m_s,
    wind_height_m: 10,
    air_temperature_K: 15 + K,
    air_temperature_height_m: 10,
    relative_humidity: 0.8,
    surface_pressure_Pa: 101_300,
    sea_temperature_K: sea_C + K,
    cool_skin: false,
    shortwave_down_W_per_m2: 0,
    longwave_down_W_per_m2: 370,
    latitude_rad: 45 * RAD_PER_DEG,
    boundary_layer_height_m: 600,
  };
}
