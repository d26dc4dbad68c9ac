/** Shared inputs of the outlook tests: an invented site (SI) and observations in file units. */
import type { OutlookObservation, OutlookSite } from '../../sim/analysis/outlook.js';
import { CELSIUS_OFFSET_K, RAD_PER_DEG } from '../../sim/constants.js';

/** An invented site: eye 5 m above the sea, sensors at 10 m, a 30 m landmark 20 km away, latitude 45°. */
export const TEST_SITE: OutlookSite = {
  observer_height_m: 5,
  air_temperature_height_m: 10,
  wind_height_m: 10,
  cool_skin: false,
  landmark_range_m: 20_000,
  landmark_height_m: 30,
  earth_radius_m: 6_371_000,
  latitude_rad: 45 * RAD_PER_DEG,
  optics: { wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 },
};

/** An observation from °C, m/s, a humidity fraction and hPa. */
export function observation(air_C: number, sea_C: number, wind_m_s: number, relative_humidity: number, pressure_hPa = 1013): OutlookObservation {
  return {
    air_temperature_K: air_C + CELSIUS_OFFSET_K,
    sea_temperature_K: sea_C + CELSIUS_OFFSET_K,
    wind_speed_m_s: wind_m_s,
    relative_humidity,
    surface_pressure_Pa: pressure_hPa * 100,
  };
}
