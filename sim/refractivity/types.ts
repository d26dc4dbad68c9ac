/** Shared types of the refractive-index layer. */

/** Thermodynamic state of moist air at one point. SI units. */
export interface AirState {
  /** Absolute temperature, K (valid 180..340 K for the optical models). */
  temperature_K: number;
  /** Total pressure, Pa. */
  pressure_Pa: number;
  /** Partial pressure of water vapour, Pa (0 for dry air). */
  vapour_pressure_Pa: number;
}

/** Names of the refractive-index models a scenario can choose (DESIGN.md §4). */
export type IndexModelName = 'ciddor' | 'edlen' | 'birch-downs' | 'radio' | 'none';

/** Options shared by the optical models. */
export interface OpticalOptions {
  /** Vacuum wavelength, µm. */
  wavelength_um: number;
  /** CO2 mole fraction, µmol/mol (ppm). */
  co2_ppm: number;
}

/**
 * A refractivity function: returns n − 1 (dimensionless) for the given air state.
 * Returning n − 1 rather than n keeps full precision (n − 1 ≈ 3e-4).
 */
export type RefractivityFunction = (state: AirState) => number;
