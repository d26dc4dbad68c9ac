/**
 * Water vapour in moist air: saturation vapour pressure, the enhancement factor, vapour pressure
 * from relative humidity, and the mole fraction of water vapour.
 *
 * These are numerical kernels (STYLE.md §6): no argument checks; the scenario loader validates.
 */
import { CELSIUS_OFFSET_K } from '../constants.js';
import type { AirState } from './types.js';

// Saturation vapour pressure over liquid water as Ciddor uses it (BIPM-81 form, Davis 1992 CIPM-81/91):
// svp = exp(A T² + B T + C + D/T) Pa. Ciddor 1996, Appendix A; read in REFERENCES.md §1.1 step 5.
/** K⁻². */
const SVP_A = 1.2378847e-5;
/** K⁻¹. */
const SVP_B = -1.9121316e-2;
/** Dimensionless. */
const SVP_C = 33.93711047;
/** K. */
const SVP_D = -6.3431645e3;

// Enhancement factor f = α + β p + γ t² (t in °C). Ciddor 1996, Appendix A; REFERENCES.md §1.1 step 6.
/** Dimensionless. */
const ENH_ALPHA = 1.00062;
/** Pa⁻¹. */
const ENH_BETA = 3.14e-8;
/** °C⁻². */
const ENH_GAMMA = 5.6e-7;

/**
 * Saturation vapour pressure over liquid water, Ciddor's form.
 *
 * svp = exp(A T² + B T + C + D/T), with A = 1.2378847e-5 K⁻², B = −1.9121316e-2 K⁻¹,
 * C = 33.93711047, D = −6.3431645e3 K.
 *
 * @param temperature_K absolute temperature, K. Intended range 273.15..373.15 K (liquid water up to
 *   100 °C, the top of Ciddor's range); below 273.15 K it gives the pressure over supercooled water,
 *   not over ice (use saturationVapourPressureIapws_Pa for ice). Total and finite for T > 0.
 * @returns saturation vapour pressure, Pa.
 * Accuracy: within 0.003 % of IAPWS-IF97 at 20 °C (2339.163 vs 2339.215 Pa, REFERENCES.md §1.2);
 *   the difference changes n − 1 by less than 1e-10.
 * Reference: P. E. Ciddor, "Refractive index of air: new equations for the visible and near
 *   infrared", Applied Optics 35(9), 1566–1573 (1996), Appendix A (BIPM-81/91 equation of state,
 *   R. S. Davis, Metrologia 29, 67–70 (1992)).
 */
export function saturationVapourPressure_Pa(temperature_K: number): number {
  const T = temperature_K;
  return Math.exp(SVP_A * T * T + SVP_B * T + SVP_C + SVP_D / T);
}

/**
 * Enhancement factor of water vapour in air, f = α + β p + γ t².
 *
 * @param pressure_Pa total pressure, Pa (Ciddor's range 80 000..120 000 Pa).
 * @param temperature_K absolute temperature, K; enters as t = T − 273.15 °C.
 * @returns f, dimensionless (≈ 1.004 at 20 °C, 101 325 Pa).
 * Constants: α = 1.00062, β = 3.14e-8 Pa⁻¹, γ = 5.6e-7 °C⁻² (γ multiplies t², not t).
 * Reference: Ciddor 1996 (Applied Optics 35, 1566), Appendix A; REFERENCES.md §1.1 step 6.
 */
export function enhancementFactor(pressure_Pa: number, temperature_K: number): number {
  const t_C = temperature_K - CELSIUS_OFFSET_K;
  return ENH_ALPHA + ENH_BETA * pressure_Pa + ENH_GAMMA * t_C * t_C;
}

/**
 * Partial pressure of water vapour from relative humidity: e = RH · svp(T).
 *
 * No enhancement factor here: it applies when e is turned into a mole fraction
 * (vapourMoleFraction).
 *
 * @param relative_humidity relative humidity as a fraction, 0..1.
 * @param temperature_K absolute temperature, K.
 * @param svp saturation vapour pressure function, Pa from K; default saturationVapourPressure_Pa
 *   (Ciddor's form). Pass saturationVapourPressureIapws_Pa to follow NIST (REFERENCES.md §1.2).
 * @returns water-vapour partial pressure, Pa.
 * Reference: Ciddor 1996, Appendix A (x_w = f · RH · svp / p).
 */
export function vapourPressureFromRelativeHumidity_Pa(
  relative_humidity: number,
  temperature_K: number,
  svp: (temperature_K: number) => number = saturationVapourPressure_Pa,
): number {
  return relative_humidity * svp(temperature_K);
}

/**
 * Mole fraction of water vapour, x_w = f · e / p.
 *
 * @param state air state (temperature_K, pressure_Pa > 0, vapour_pressure_Pa ≥ 0).
 * @returns x_w, dimensionless (0 for dry air; ≈ 0.023 at saturation at 20 °C, 101 325 Pa).
 * Reference: Ciddor 1996, Appendix A; REFERENCES.md §1.1 step 6.
 */
export function vapourMoleFraction(state: AirState): number {
  const p = state.pressure_Pa;
  return (enhancementFactor(p, state.temperature_K) * state.vapour_pressure_Pa) / p;
}

// IAPWS-IF97 saturation pressure of water (region 4), as NIST EMT Appendix A uses it.
// Constants n1..n10 (called K1..K10 by NIST); REFERENCES.md §1.2.
const IF97_K1 = 1.16705214528e3;
const IF97_K2 = -7.24213167032e5;
const IF97_K3 = -1.70738469401e1;
const IF97_K4 = 1.20208247025e4;
const IF97_K5 = -3.23255503223e6;
const IF97_K6 = 1.49151086135e1;
const IF97_K7 = -4.82326573616e3;
const IF97_K8 = 4.05113405421e5;
const IF97_K9 = -2.38555575678e-1;
const IF97_K10 = 6.50175348448e2;

/** Triple-point temperature of water, K (IAPWS, exact by the pre-2019 kelvin definition). */
const TRIPLE_POINT_K = 273.16;
/** Triple-point pressure used by NIST's ice formula, Pa (REFERENCES.md §1.2). */
const ICE_P_TRIPLE_PA = 611.657;
/** Ice sublimation-curve coefficients, dimensionless (REFERENCES.md §1.2). */
const ICE_A1 = -13.928169;
const ICE_A2 = 34.7078238;

/**
 * Saturation vapour pressure over liquid water, IAPWS-IF97 region-4 equation, as in NIST EMT.
 *
 * @param temperature_K absolute temperature, K; IF97 validity 273.15..647.096 K.
 * @returns saturation vapour pressure, Pa (2339.215 Pa at 20 °C, REFERENCES.md §1.2 [computed]).
 * Reference: IAPWS Industrial Formulation 1997 (IF97), saturation-pressure equation (equation
 *   number from memory: Eq. 30); as used in J. A. Stone and J. H. Zimmerman, "Index of Refraction
 *   of Air", NIST Engineering Metrology Toolbox, Appendix A.
 */
export function saturationVapourPressureOverWaterIapws_Pa(temperature_K: number): number {
  const omega = temperature_K + IF97_K9 / (temperature_K - IF97_K10);
  const A = omega * omega + IF97_K1 * omega + IF97_K2;
  const B = IF97_K3 * omega * omega + IF97_K4 * omega + IF97_K5;
  const C = IF97_K6 * omega * omega + IF97_K7 * omega + IF97_K8;
  const X = -B + Math.sqrt(B * B - 4 * A * C);
  const ratio = (2 * C) / X;
  return 1e6 * ratio * ratio * ratio * ratio;
}

/**
 * Saturation vapour pressure over ice (sublimation pressure), IAPWS 1993 form, as in NIST EMT.
 *
 * p = 611.657 · exp(A1 (1 − θ^−1.5) + A2 (1 − θ^−1.25)) Pa, θ = T / 273.16 K.
 *
 * @param temperature_K absolute temperature, K; intended for T < 273.16 K (down to 190 K).
 * @returns sublimation pressure, Pa (259.904 Pa at −10 °C, REFERENCES.md §1.2 [computed]).
 * Reference: W. Wagner, A. Saul and A. Pruss, J. Phys. Chem. Ref. Data 23, 515 (1994) (citation from
 *   memory); as used in NIST EMT "Index of Refraction of Air", Appendix A.
 */
export function saturationVapourPressureOverIceIapws_Pa(temperature_K: number): number {
  const theta = temperature_K / TRIPLE_POINT_K;
  const Y = ICE_A1 * (1 - Math.pow(theta, -1.5)) + ICE_A2 * (1 - Math.pow(theta, -1.25));
  return ICE_P_TRIPLE_PA * Math.exp(Y);
}

/**
 * Saturation vapour pressure as NIST EMT computes it: over water at t ≥ 0 °C, over ice below.
 *
 * @param temperature_K absolute temperature, K (190..373.15 K).
 * @returns saturation vapour pressure, Pa.
 * Reference: NIST EMT "Index of Refraction of Air", Appendix A (REFERENCES.md §1.2).
 */
export function saturationVapourPressureIapws_Pa(temperature_K: number): number {
  return temperature_K >= CELSIUS_OFFSET_K
    ? saturationVapourPressureOverWaterIapws_Pa(temperature_K)
    : saturationVapourPressureOverIceIapws_Pa(temperature_K);
}
