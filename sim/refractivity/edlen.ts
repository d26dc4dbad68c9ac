/**
 * Edlén (1966) refractive index of air, with its water-vapour correction.
 *
 * B. Edlén, "The refractive index of air", Metrologia 2(2), 71–80 (1966). Formulas as read in
 * REFERENCES.md §1.6 (several transcriptions; equation numbers there are from memory).
 */
import { CELSIUS_OFFSET_K } from '../constants.js';
import type { AirState, OpticalOptions, RefractivityFunction } from './types.js';

/** Pascal per torr, Pa/Torr: 101 325 / 760 = 133.322368… (definition of the torr). */
export const PA_PER_TORR = 101_325 / 760;

// Standard air (15 °C, 760 Torr, dry, 300 ppm CO2): (n_s − 1)×10⁸ = A + B/(130 − σ²) + C/(38.9 − σ²).
/** Dimensionless (×10⁻⁸). */
const EDLEN_A = 8342.13;
/** µm⁻² (×10⁻⁸). */
const EDLEN_B = 2_406_030;
/** µm⁻². */
const EDLEN_B_POLE = 130;
/** µm⁻² (×10⁻⁸). */
const EDLEN_C = 15_997;
/** µm⁻². */
const EDLEN_C_POLE = 38.9;
/** CO2 coefficient: (n − 1)_x = (n − 1)_s [1 + 0.540 (x − 0.0003)], x volume fraction. Dimensionless. */
const EDLEN_CO2_COEFF = 0.54;
/** CO2 volume fraction of Edlén's standard air (300 ppm). */
const EDLEN_CO2_STANDARD = 0.0003;

// Density factor p[1 + p(0.817 − 0.0133 t)×10⁻⁶] / [720.775 (1 + 0.003661 t)], p in Torr, t in °C.
/** Torr⁻¹ (×10⁻⁶). */
const DENSITY_P0 = 0.817;
/** Torr⁻¹ °C⁻¹ (×10⁻⁶). */
const DENSITY_PT = 0.0133;
/** Torr. Makes the factor 1 at 15 °C, 760 Torr only together with 0.003661 (REFERENCES.md §1.6 pitfall). */
const DENSITY_SCALE_TORR = 720.775;
/** °C⁻¹. Edlén's value; 0.003671 (a typo seen in one public port) is wrong by 1.4e-4 relative at 15 °C. */
const DENSITY_THERMAL = 0.003661;

// Water vapour: n_tpf − n_tp = −f (5.722 − 0.0457 σ²)×10⁻⁸, f partial pressure in Torr.
/** Torr⁻¹ (×10⁻⁸). */
const WATER_W0 = 5.722;
/** µm² Torr⁻¹ (×10⁻⁸). */
const WATER_W1 = 0.0457;

/**
 * Refractivity of Edlén's standard air (15 °C, 760 Torr, dry, 300 ppm CO2).
 * @param wavelength_um vacuum wavelength, µm (0.2..2 µm; σ² must stay below 38.9 µm⁻²).
 * @returns (n_s − 1), dimensionless (27651.743e-8 at 0.633 µm, REFERENCES.md §1.7 [computed]).
 * Reference: Edlén 1966, Metrologia 2, 71, dispersion formula for standard air.
 */
export function edlenStandardAirRefractivity(wavelength_um: number): number {
  const s2 = 1 / (wavelength_um * wavelength_um);
  return (EDLEN_A + EDLEN_B / (EDLEN_B_POLE - s2) + EDLEN_C / (EDLEN_C_POLE - s2)) * 1e-8;
}

/**
 * Builds the Edlén (1966) refractivity function for one wavelength and CO2 content.
 *
 * n − 1 = (n − 1)_s [1 + 0.540 (x − 0.0003)] · p[1 + p(0.817 − 0.0133 t)×10⁻⁶] / [720.775 (1 + 0.003661 t)]
 *         − f (5.722 − 0.0457 σ²)×10⁻⁸,
 * with p and f (vapour pressure) in Torr, t in °C, σ = 1/λ in µm⁻¹, x the CO2 volume fraction.
 *
 * @param optics wavelength_um (vacuum, µm) and co2_ppm.
 * @returns a function of AirState giving n − 1 (dimensionless).
 * Accuracy: Edlén quotes about 5×10⁻⁸ for ordinary laboratory conditions [from memory]; it departs
 *   from Ciddor by up to 1.6×10⁻⁷ at −40 °C (REFERENCES.md §1.3).
 * Validity: laboratory air near 15–20 °C and 1 atm; the density factor is a low-order expansion.
 * Reference: B. Edlén, "The refractive index of air", Metrologia 2, 71–80 (1966).
 */
export function edlenModel(optics: OpticalOptions): RefractivityFunction {
  const s2 = 1 / (optics.wavelength_um * optics.wavelength_um);
  const nxM1 =
    edlenStandardAirRefractivity(optics.wavelength_um) *
    (1 + EDLEN_CO2_COEFF * (optics.co2_ppm * 1e-6 - EDLEN_CO2_STANDARD));
  const dryScale = nxM1 / DENSITY_SCALE_TORR;
  const waterPerPa = ((WATER_W0 - WATER_W1 * s2) * 1e-8) / PA_PER_TORR;
  return (state: AirState): number => {
    const t = state.temperature_K - CELSIUS_OFFSET_K;
    const p = state.pressure_Pa / PA_PER_TORR;
    const density = (p * (1 + p * (DENSITY_P0 - DENSITY_PT * t) * 1e-6)) / (1 + DENSITY_THERMAL * t);
    return dryScale * density - waterPerPa * state.vapour_pressure_Pa;
  };
}
