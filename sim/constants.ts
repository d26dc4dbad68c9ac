/**
 * Physical constants used across Loomline, each with unit and source.
 * SI throughout. Derived constants show their arithmetic.
 */

/** Standard acceleration of gravity, m/s². CGPM 1901 (3rd CGPM), exact; US Standard Atmosphere 1976 Table 2. */
export const G0_M_PER_S2 = 9.80665;

/** Molar gas constant, J/(mol·K). CODATA 2018 (exact since the 2019 SI redefinition). */
export const R_GAS_J_PER_MOL_K = 8.314462618;

/** Molar mass of dry air, kg/mol. US Standard Atmosphere 1976, Table 3 (M0 = 28.9644 kg/kmol). */
export const M_DRY_AIR_KG_PER_MOL = 0.0289644;

/** Molar mass of water, kg/mol. Ciddor 1996, Appendix A (Mw = 0.018015 kg/mol). */
export const M_WATER_KG_PER_MOL = 0.018015;

/** Kelvin offset of the Celsius scale, K. SI Brochure, 9th ed. (2019), exact. */
export const CELSIUS_OFFSET_K = 273.15;

/** Mean Earth radius, m. IUGG mean radius R1 rounded as in DESIGN.md §2 (6 371 000 m). */
export const EARTH_RADIUS_M = 6_371_000;

/** Effective Earth radius r0 used by the US Standard Atmosphere 1976 for geopotential height, m (Table 2). */
export const US1976_EARTH_RADIUS_M = 6_356_766;

/** Standard sea-level pressure, Pa. US Standard Atmosphere 1976, Table 2. */
export const STANDARD_PRESSURE_PA = 101_325;

/** Standard sea-level temperature, K. US Standard Atmosphere 1976, Table 2. */
export const STANDARD_TEMPERATURE_K = 288.15;

/** Hydrostatic constant g0·M/R, K/m: the lapse rate scale in p ∝ T^(−g0·M/(R·L)). 9.80665 × 0.0289644 / 8.314462618 ≈ 0.034163 K/m. */
export const HYDROSTATIC_K_PER_M = (G0_M_PER_S2 * M_DRY_AIR_KG_PER_MOL) / R_GAS_J_PER_MOL_K;

/** Radians per degree. */
export const RAD_PER_DEG = Math.PI / 180;

/** Radians per arcminute. */
export const RAD_PER_ARCMIN = Math.PI / 180 / 60;

/** Radians per arcsecond. */
export const RAD_PER_ARCSEC = Math.PI / 180 / 3600;
