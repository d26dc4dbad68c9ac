/**
 * Ciddor (1996) refractive index of moist air with CO2, for the visible and near infrared.
 *
 * P. E. Ciddor, "Refractive index of air: new equations for the visible and near infrared",
 * Applied Optics 35(9), 1566–1573 (1996), DOI 10.1364/AO.35.001566, Eqs. (1)–(5) and Appendix A.
 * Constants as read in REFERENCES.md §1.1 (transcriptions of NIST EMT Appendix A-III).
 */
import { CELSIUS_OFFSET_K } from '../constants.js';
import type { AirState, OpticalOptions, RefractivityFunction } from './types.js';
import { vapourMoleFraction } from './water-vapour.js';

// Eq. (1), dry standard air (15 °C, 101 325 Pa, 450 ppm CO2): (n_as − 1)×10⁸ = k1/(k0 − S) + k3/(k2 − S).
/** µm⁻². */
const K0 = 238.0185;
/** µm⁻². */
const K1 = 5_792_105;
/** µm⁻². */
const K2 = 57.362;
/** µm⁻². */
const K3 = 167_917;

// Eq. (3), standard water vapour (20 °C, 1333 Pa): (n_ws − 1)×10⁸ = 1.022 (w0 + w1 S + w2 S² + w3 S³).
/** Dimensionless. */
const W_SCALE = 1.022;
/** Dimensionless. */
const W0 = 295.235;
/** µm². */
const W1 = 2.6422;
/** µm⁴. */
const W2 = -0.03238;
/** µm⁶. */
const W3 = 0.004028;

/** Eq. (2): relative change of (n − 1) per ppm of CO2 above 450 ppm, ppm⁻¹. */
const CO2_REFRACTIVITY_PER_PPM = 0.534e-6;
/** Reference CO2 of Ciddor's standard air, ppm. */
const CO2_STANDARD_PPM = 450;

// Compressibility of moist air, BIPM-81/91 (Davis 1992), Ciddor Appendix A.
/** K Pa⁻¹. */
const Z_A0 = 1.58123e-6;
/** Pa⁻¹. */
const Z_A1 = -2.9331e-8;
/** K⁻¹ Pa⁻¹. */
const Z_A2 = 1.1043e-10;
/** K Pa⁻¹. */
const Z_B0 = 5.707e-6;
/** Pa⁻¹. */
const Z_B1 = -2.051e-8;
/** K Pa⁻¹. */
const Z_C0 = 1.9898e-4;
/** Pa⁻¹. */
const Z_C1 = -2.376e-6;
/** K² Pa⁻². */
const Z_D = 1.83e-11;
/** K² Pa⁻². */
const Z_E = -0.765e-8;

/** Pressure of standard dry air, Pa (Ciddor: 101 325 Pa). */
const DRY_STANDARD_PRESSURE_PA = 101_325;
/** Temperature of standard dry air, K (15 °C). */
const DRY_STANDARD_TEMPERATURE_K = 288.15;
/** Pressure of standard water vapour, Pa (Ciddor: 1333 Pa). */
const VAPOUR_STANDARD_PRESSURE_PA = 1333;
/** Temperature of standard water vapour, K (20 °C). */
const VAPOUR_STANDARD_TEMPERATURE_K = 293.15;

/**
 * Compressibility factor Z of moist air, BIPM-81/91 equation of state.
 *
 * Z = 1 − (p/T)[a0 + a1 t + a2 t² + (b0 + b1 t) x_w + (c0 + c1 t) x_w²] + (p/T)² (d + e x_w²).
 *
 * @param pressure_Pa total pressure, Pa.
 * @param temperature_K absolute temperature, K (t = T − 273.15 °C in the formula).
 * @param vapour_mole_fraction x_w, 0..1.
 * @returns Z, dimensionless (0.9995922115 for dry air at 101 325 Pa, 288.15 K; REFERENCES.md §1.1).
 * Reference: R. S. Davis, Metrologia 29, 67–70 (1992), as quoted in Ciddor 1996, Appendix A.
 */
export function compressibility(pressure_Pa: number, temperature_K: number, vapour_mole_fraction: number): number {
  const t = temperature_K - CELSIUS_OFFSET_K;
  const pt = pressure_Pa / temperature_K;
  const x = vapour_mole_fraction;
  return (
    1 -
    pt * (Z_A0 + Z_A1 * t + Z_A2 * t * t + (Z_B0 + Z_B1 * t) * x + (Z_C0 + Z_C1 * t) * x * x) +
    pt * pt * (Z_D + Z_E * x * x)
  );
}

/**
 * Refractivity of dry standard air (15 °C, 101 325 Pa, 450 ppm CO2), Ciddor Eq. (1).
 * @param wavelength_um vacuum wavelength, µm (0.3..1.7).
 * @returns n_as − 1, dimensionless (27653.021e-8 at 0.633 µm, REFERENCES.md §1.7 [computed]).
 */
export function ciddorStandardAirRefractivity(wavelength_um: number): number {
  const S = 1 / (wavelength_um * wavelength_um);
  return (K1 / (K0 - S) + K3 / (K2 - S)) * 1e-8;
}

/**
 * Refractivity of standard water vapour (20 °C, 1333 Pa), Ciddor Eq. (3).
 * @param wavelength_um vacuum wavelength, µm (0.3..1.7).
 * @returns n_ws − 1, dimensionless (308.327e-8 at 0.633 µm, REFERENCES.md §1.7 [computed]).
 */
export function ciddorStandardVapourRefractivity(wavelength_um: number): number {
  const S = 1 / (wavelength_um * wavelength_um);
  return W_SCALE * (W0 + S * (W1 + S * (W2 + S * W3))) * 1e-8;
}

/**
 * Builds the Ciddor (1996) refractivity function for one wavelength and CO2 content.
 *
 * Everything that depends only on the options (dispersion, CO2, reference densities) is computed
 * once here; each call then costs one compressibility and a few multiplications.
 *
 * The paper's Eq. (5), n − 1 = (ρ_a/ρ_axs)(n_axs − 1) + (ρ_w/ρ_ws)(n_ws − 1), with
 * ρ_a = p M_a (1 − x_w)/(Z R T), ρ_w = p M_w x_w/(Z R T), ρ_axs = p_R M_a/(Z_a R T_R) and
 * ρ_ws = 1333 M_w/(Z_w R 293.15), is evaluated in the algebraically equal form
 * n − 1 = p/(Z T) · [(1 − x_w) c_a + x_w c_w], where c_a = (n_axs − 1) Z_a T_R / p_R and
 * c_w = (n_ws − 1) Z_w 293.15 / 1333. The molar masses and R cancel exactly, so Ciddor's
 * R = 8.314510 and NIST's 8.314472 give the same result.
 *
 * @param optics wavelength_um (vacuum, 0.3..1.7 µm) and co2_ppm (0..2000 ppm).
 * @returns a function of AirState (temperature_K, pressure_Pa, vapour_pressure_Pa) giving n − 1.
 * Accuracy: reproduces the NIST EMT Ciddor table (REFERENCES.md §1.3) within 2e-9 with NIST's
 *   saturation vapour pressure; Ciddor states an uncertainty of a few parts in 10⁸ over his range
 *   (from memory).
 * Validity (Ciddor 1996, as transcribed in REFERENCES.md §1.1): λ 0.3–1.69 µm, −40..100 °C,
 *   80–120 kPa, x_c 0–2000 ppm. Lower pressures reduce to the ideal-gas limit (Z → 1).
 */
export function ciddorModel(optics: OpticalOptions): RefractivityFunction {
  // Eq. (2): CO2 correction of the dry-air refractivity.
  const nAxsM1 =
    ciddorStandardAirRefractivity(optics.wavelength_um) *
    (1 + CO2_REFRACTIVITY_PER_PPM * (optics.co2_ppm - CO2_STANDARD_PPM));
  const nWsM1 = ciddorStandardVapourRefractivity(optics.wavelength_um);
  const zDry = compressibility(DRY_STANDARD_PRESSURE_PA, DRY_STANDARD_TEMPERATURE_K, 0);
  const zVapour = compressibility(VAPOUR_STANDARD_PRESSURE_PA, VAPOUR_STANDARD_TEMPERATURE_K, 1);
  const cDry = (nAxsM1 * zDry * DRY_STANDARD_TEMPERATURE_K) / DRY_STANDARD_PRESSURE_PA;
  const cVapour = (nWsM1 * zVapour * VAPOUR_STANDARD_TEMPERATURE_K) / VAPOUR_STANDARD_PRESSURE_PA;
  return (state: AirState): number => {
    const p = state.pressure_Pa;
    const T = state.temperature_K;
    const xw = state.vapour_pressure_Pa > 0 ? vapourMoleFraction(state) : 0;
    const Z = compressibility(p, T, xw);
    return (p / (Z * T)) * ((1 - xw) * cDry + xw * cVapour);
  };
}

/**
 * Ciddor (1996) refractivity n − 1 of moist air, one-off form of ciddorModel.
 * For repeated calls with the same options build the function once with ciddorModel.
 * @param state temperature_K, pressure_Pa, vapour_pressure_Pa (see AirState).
 * @param optics wavelength_um (0.3..1.7 µm vacuum) and co2_ppm.
 * @returns n − 1, dimensionless.
 * Reference: Ciddor 1996, Applied Optics 35, 1566, Eqs. (1)–(5).
 */
export function ciddorRefractivity(state: AirState, optics: OpticalOptions): number {
  return ciddorModel(optics)(state);
}
