/**
 * Modified Edlén equation: Birch & Downs (1993, corrected 1994) as given by NIST.
 *
 * K. P. Birch and M. J. Downs, "An updated Edlén equation for the refractive index of air",
 * Metrologia 30, 155–162 (1993); "Correction to the updated Edlén equation for the refractive index
 * of air", Metrologia 31, 315–316 (1994); with NIST's factor 292.75/T on the water term
 * (J. A. Stone and J. H. Zimmerman, NIST Engineering Metrology Toolbox, "Index of Refraction of
 * Air", Appendix A-IV). Constants as read in REFERENCES.md §1.5.
 */
import { CELSIUS_OFFSET_K } from '../constants.js';
import type { AirState, OpticalOptions, RefractivityFunction } from './types.js';

// Standard air (15 °C, 101 325 Pa, dry, 450 ppm CO2): (n_s − 1) = 10⁻⁸ [A + B/(130 − S) + C/(38.9 − S)].
/** Dimensionless (×10⁻⁸). */
const BD_A = 8342.54;
/** µm⁻² (×10⁻⁸). */
const BD_B = 2_406_147;
/** µm⁻². */
const BD_B_POLE = 130;
/** µm⁻² (×10⁻⁸). */
const BD_C = 15_998;
/** µm⁻². */
const BD_C_POLE = 38.9;
// Density: X = [1 + 10⁻⁸ (E − F t) p] / (1 + G t); n_tp − 1 = p (n_s − 1) X / D; p in Pa, t in °C.
/** Pa. */
const BD_D = 96_095.43;
/** Pa⁻¹ (×10⁻⁸). */
const BD_E = 0.601;
/** Pa⁻¹ °C⁻¹ (×10⁻⁸). */
const BD_F = 0.00972;
/** °C⁻¹. */
const BD_G = 0.003661;
// Water: n − n_tp = −10⁻¹⁰ (292.75/T)(3.7345 − 0.0401 S) p_v, p_v in Pa.
/** Pa⁻¹ (×10⁻¹⁰). */
const BD_W0 = 3.7345;
/** µm² Pa⁻¹ (×10⁻¹⁰). */
const BD_W1 = 0.0401;
/** K. NIST's temperature scaling of the water term (Appendix A-IV). */
const NIST_WATER_T_K = 292.75;
/**
 * Relative change of (n − 1) per ppm of CO2 away from 450 ppm, ppm⁻¹. Loomline extension: NIST's
 * A-IV has no CO2 term (its standard air holds 450 ppm); we apply Edlén's 1966 coefficient 0.540
 * (REFERENCES.md §1.6) re-centred on 450 ppm, so the NIST equation is unchanged at 450 ppm.
 */
const CO2_PER_PPM = 0.54e-6;
/** CO2 of Birch & Downs standard air, ppm. */
const CO2_STANDARD_PPM = 450;

/**
 * Refractivity of Birch & Downs standard air (15 °C, 101 325 Pa, dry, 450 ppm CO2).
 * @param wavelength_um vacuum wavelength, µm (0.3..1.7).
 * @returns n_s − 1, dimensionless (27653.099e-8 at 0.633 µm, REFERENCES.md §1.7 [computed]).
 * Reference: Birch & Downs 1993/1994, Metrologia 30, 155 and 31, 315 (NIST EMT A-IV).
 */
export function birchDownsStandardAirRefractivity(wavelength_um: number): number {
  const S = 1 / (wavelength_um * wavelength_um);
  return (BD_A + BD_B / (BD_B_POLE - S) + BD_C / (BD_C_POLE - S)) * 1e-8;
}

/**
 * Builds the modified-Edlén (Birch & Downs, NIST version) refractivity function.
 *
 * n − 1 = p (n_s − 1) X / D − 10⁻¹⁰ (292.75/T)(3.7345 − 0.0401 S) p_v,
 * X = [1 + 10⁻⁸ (0.601 − 0.00972 t) p] / (1 + 0.003661 t), D = 96 095.43 Pa, S = 1/λ² (µm⁻²),
 * p and p_v in Pa, t in °C, T in K. CO2 other than 450 ppm scales the dry term (see CO2_PER_PPM).
 *
 * @param optics wavelength_um (vacuum, 0.3..1.7 µm) and co2_ppm.
 * @returns a function of AirState giving n − 1 (dimensionless).
 * Accuracy: reproduces the NIST EMT modified-Edlén column (REFERENCES.md §1.3) within 2e-9 at
 *   450 ppm; NIST quotes about 1×10⁻⁸ (k = 2) near 20 °C and 1 atm, growing away from it [from memory].
 * Validity: NIST's calculator range is similar to Ciddor's; the equation was fitted to
 *   laboratory air, and departs from Ciddor by 1.6×10⁻⁷ at −40 °C (REFERENCES.md §1.3).
 */
export function birchDownsModel(optics: OpticalOptions): RefractivityFunction {
  const S = 1 / (optics.wavelength_um * optics.wavelength_um);
  const dryScale =
    (birchDownsStandardAirRefractivity(optics.wavelength_um) *
      (1 + CO2_PER_PPM * (optics.co2_ppm - CO2_STANDARD_PPM))) /
    BD_D;
  const water = (BD_W0 - BD_W1 * S) * 1e-10 * NIST_WATER_T_K;
  return (state: AirState): number => {
    const T = state.temperature_K;
    const t = T - CELSIUS_OFFSET_K;
    const p = state.pressure_Pa;
    const X = (1 + 1e-8 * (BD_E - BD_F * t) * p) / (1 + BD_G * t);
    return p * dryScale * X - (water / T) * state.vapour_pressure_Pa;
  };
}
