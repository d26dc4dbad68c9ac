/**
 * Radio refractivity (ITU-R P.453) and modified refractivity for duct analysis.
 *
 * Formulas as read in REFERENCES.md §2.1 (ITU-R P.453-7/-8 text) and §2.2.
 */
import type { AirState, RefractivityFunction } from './types.js';

/** Pa per hPa. */
const PA_PER_HPA = 100;
/** Dry-term coefficient, K/hPa. ITU-R P.453-7 (1999): N_dry = 77.6 P/T. */
const RADIO_DRY_K_PER_HPA = 77.6;
/**
 * Wet-term coefficient, K²/hPa. ITU-R P.453-7 (1999): N_wet = 3.732×10⁵ e/T² (the rounded form of
 * 77.6 × 4810 = 3.73256×10⁵ in N = (77.6/T)(P + 4810 e/T)). DESIGN.md §4 writes it 3.73e5.
 */
const RADIO_WET_K2_PER_HPA = 3.732e5;
/**
 * Modified-refractivity height coefficient, M-units per metre: 10⁶/a with a = 6371 km gives
 * 0.15696 /m, conventionally rounded to 0.157 /m (REFERENCES.md §2.2; ITU-R P.453, from memory).
 */
const M_UNITS_PER_M = 0.157;

/**
 * Radio refractivity N of moist air, ITU-R P.453: N = 77.6 p/T + 3.732×10⁵ e/T².
 *
 * @param state temperature_K (K, > 0), pressure_Pa (total pressure, Pa), vapour_pressure_Pa (Pa);
 *   pressures are converted to hPa inside.
 * @returns N in N-units, (n − 1)×10⁶ (272.87 at 15 °C, 1013.25 hPa, dry; REFERENCES.md §2.1).
 * Accuracy: "may be used for all radio frequencies; for frequencies up to 100 GHz, the error is
 *   less than 0.5 %" (ITU-R P.453-7). Later editions (P.453-10+) split the dry term into 77.6 P_d/T +
 *   72 e/T; the two forms differ by about 0.02 N-units at surface conditions (REFERENCES.md §2.1).
 * Reference: ITU-R Recommendation P.453-7 (1999), "The radio refractive index: its formula and
 *   refractivity data", Eqs. (1)–(2) (equation numbers from memory).
 */
export function radioRefractivity_N(state: AirState): number {
  const T = state.temperature_K;
  const p_hPa = state.pressure_Pa / PA_PER_HPA;
  const e_hPa = state.vapour_pressure_Pa / PA_PER_HPA;
  return (RADIO_DRY_K_PER_HPA * p_hPa) / T + (RADIO_WET_K2_PER_HPA * e_hPa) / (T * T);
}

/**
 * The radio refractivity as a RefractivityFunction: n − 1 = N × 10⁻⁶ (independent of wavelength).
 * @returns a function of AirState giving n − 1 (dimensionless).
 * Reference: ITU-R P.453-7 (1999); see radioRefractivity_N.
 */
export function radioModel(): RefractivityFunction {
  return (state: AirState): number => radioRefractivity_N(state) * 1e-6;
}

/**
 * Modified refractivity M = N + 0.157 h, which removes the Earth's curvature: a layer traps
 * (ducts) rays where dM/dh < 0, i.e. dN/dh < −157 N-units/km.
 *
 * @param N_units refractivity N at the height, N-units.
 * @param height_m height above the surface (or sea level), m.
 * @returns M in M-units.
 * Accuracy: 0.157 /m is 10⁶/6371 km = 0.15696 /m rounded (0.03 % high).
 * Reference: ITU-R P.453 modified refractivity (REFERENCES.md §2.2; formula from memory there,
 *   coefficient computed).
 */
export function modifiedRefractivity_M(N_units: number, height_m: number): number {
  return N_units + M_UNITS_PER_M * height_m;
}
