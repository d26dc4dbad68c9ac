/**
 * Thermodynamic helpers of the COARE 3.5 bulk algorithm, in SI: saturation vapour pressure
 * (Buck 1981, as COARE uses it), specific humidity and its inverse, the kinematic viscosity of
 * air and normal gravity at a latitude.
 *
 * Numerical kernels (STYLE.md §6): no argument checks; computeBulkFlux validates its inputs.
 * Reference code: NOAA-PSL COARE-algorithm `Python/COARE3.5/meteo.py` and `coare35vn.py`
 * (REFERENCES.md §7.3).
 */
import { CELSIUS_OFFSET_K, M_DRY_AIR_KG_PER_MOL, M_WATER_KG_PER_MOL } from '../constants.js';

/**
 * Ratio of the molar masses of water and dry air, dimensionless: 0.018015 / 0.0289644 = 0.621970.
 * COARE's `qair` uses 621.97 g/kg, its `qsea` 622 (relative difference 5e-5).
 */
export const MOLAR_MASS_RATIO = M_WATER_KG_PER_MOL / M_DRY_AIR_KG_PER_MOL;

/**
 * Saturation vapour pressure reduction over sea water (salinity about 34 psu), dimensionless: 0.98.
 * Fairall et al. (2003) / COARE `qsea` (REFERENCES.md §7.3).
 */
export const SEA_WATER_VAPOUR_FACTOR = 0.98;

/**
 * Saturation vapour pressure over water in moist air, Buck (1981) with his enhancement factor:
 * e_s = 611.21 exp(17.502 t/(240.97 + t)) · (1.0007 + 3.46e-6 p_hPa) Pa, t in °C.
 * @param temperature_K air or water temperature, K (Buck's fit: −40..50 °C).
 * @param pressure_Pa total pressure, Pa.
 * @returns saturation vapour pressure, Pa.
 * Accuracy: Buck quotes about 0.05 % over −40..50 °C; reproduces COARE `qsat(25, 1015)` =
 * 31.8037 mb.
 * Reference: A. L. Buck (1981), "New equations for computing vapor pressure and enhancement
 * factor", J. Appl. Meteor. 20, 1527–1532; COARE `meteo.py` `qsat` (REFERENCES.md §7.3).
 */
export function saturationVapourPressureBuck_Pa(temperature_K: number, pressure_Pa: number): number {
  const t = temperature_K - CELSIUS_OFFSET_K;
  return 611.21 * Math.exp((17.502 * t) / (240.97 + t)) * (1.0007 + 3.46e-8 * pressure_Pa);
}

/**
 * Specific humidity from vapour pressure: q = ε e/(p − (1 − ε) e), ε = MOLAR_MASS_RATIO.
 * @param vapour_pressure_Pa water-vapour partial pressure, Pa (0 ≤ e < p).
 * @param pressure_Pa total pressure, Pa.
 * @returns specific humidity, kg/kg.
 * Accuracy: exact for an ideal mixture. Reference: COARE `meteo.py` `qair` (REFERENCES.md §7.3).
 */
export function specificHumidity(vapour_pressure_Pa: number, pressure_Pa: number): number {
  const eps = MOLAR_MASS_RATIO;
  return (eps * vapour_pressure_Pa) / (pressure_Pa - (1 - eps) * vapour_pressure_Pa);
}

/**
 * Vapour pressure from specific humidity, the inverse of {@link specificHumidity}:
 * e = q p/(ε + (1 − ε) q).
 * @param specific_humidity kg/kg (0..0.1).
 * @param pressure_Pa total pressure, Pa.
 * @returns water-vapour partial pressure, Pa.
 * Accuracy: exact inverse. Reference: COARE `meteo.py` `rhcalc` (REFERENCES.md §7.3).
 */
export function vapourPressureFromSpecificHumidity_Pa(specific_humidity: number, pressure_Pa: number): number {
  const eps = MOLAR_MASS_RATIO;
  return (specific_humidity * pressure_Pa) / (eps + (1 - eps) * specific_humidity);
}

/**
 * Saturation specific humidity at the sea surface, 0.98 × Buck saturation (salinity reduction).
 * @param sea_temperature_K water (skin or bulk) temperature, K.
 * @param pressure_Pa surface pressure, Pa.
 * @returns specific humidity, kg/kg (COARE `qsea(18 °C, 1013 mb)` = 12.5615 g/kg with ε = 0.622).
 * Reference: COARE `meteo.py` `qsea`; Fairall et al. (2003) (REFERENCES.md §7.3).
 */
export function seaSurfaceSpecificHumidity(sea_temperature_K: number, pressure_Pa: number): number {
  const e = SEA_WATER_VAPOUR_FACTOR * saturationVapourPressureBuck_Pa(sea_temperature_K, pressure_Pa);
  return specificHumidity(e, pressure_Pa);
}

/**
 * Kinematic viscosity of air, ν = 1.326e-5 (1 + 6.542e-3 t + 8.301e-6 t² − 4.84e-9 t³) m²/s, t in °C.
 * @param temperature_K air temperature, K (fit for about −40..50 °C).
 * @returns kinematic viscosity, m²/s (1.326e-5 at 0 °C).
 * Reference: COARE 3.5 `coare35vn.py` (`visa`), REFERENCES.md §7.3.
 */
export function kinematicViscosityAir_m2_per_s(temperature_K: number): number {
  const t = temperature_K - CELSIUS_OFFSET_K;
  return 1.326e-5 * (1 + 6.542e-3 * t + 8.301e-6 * t * t - 4.84e-9 * t * t * t);
}

/**
 * Normal gravity at sea level at a geodetic latitude, series in sin²φ:
 * g = 9.7803267715 (1 + 0.0052790414 s² + 0.0000232718 s⁴ + 0.0000001262 s⁶ + 0.0000000007 s⁸).
 * @param latitude_rad geodetic latitude, rad (−π/2..π/2).
 * @returns gravity, m/s² (9.7803 at the equator, 9.8062 at 45°, 9.8322 at the poles).
 * Accuracy: the series truncation is below 1e-9 m/s².
 * Reference: coefficients read in COARE `meteo.py` `grv` (grv(45°) = 9.8062, REFERENCES.md §7.3);
 * they are the GRS 80 normal-gravity series (Moritz, "Geodetic Reference System 1980"; from memory).
 */
export function normalGravity_m_per_s2(latitude_rad: number): number {
  const s2 = Math.sin(latitude_rad) ** 2;
  return 9.7803267715 * (1 + s2 * (0.0052790414 + s2 * (0.0000232718 + s2 * (0.0000001262 + s2 * 0.0000000007))));
}
