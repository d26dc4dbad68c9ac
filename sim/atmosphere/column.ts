/**
 * The resolved air column: what every atmosphere source (layered profile, standard atmosphere,
 * marine surface layer) produces and what the index table is built from. SI units, heights in m
 * above the surface.
 */
export interface AirColumn {
  /** Temperature at height z, K. */
  temperature_K(z_m: number): number;
  /** dT/dz at z from below (side −1) or above (+1), K/m; the two differ only at kinks. */
  temperatureGradient_K_per_m(z_m: number, side: -1 | 1): number;
  /** Total pressure at z (hydrostatic from the surface pressure), Pa. */
  pressure_Pa(z_m: number): number;
  /**
   * dp/dz at z, Pa/m, consistent with pressure_Pa (hydrostatic: −p·g(z)·M/(R·T)). Continuous, so
   * no side. The index table uses it for the pressure term of dn/dz.
   */
  pressureGradient_Pa_per_m(z_m: number): number;
  /** Water-vapour partial pressure at z, Pa. */
  vapour_pressure_Pa(z_m: number): number;
  /** d(vapour pressure)/dz from below (−1) or above (+1), Pa/m. */
  vapourGradient_Pa_per_m(z_m: number, side: -1 | 1): number;
  /** Heights where dT/dz or de/dz jump (profile nodes, standard-atmosphere layer bases), m, sorted. */
  readonly kinks_m: readonly number[];
  /**
   * Heights where the profile changes fast and the index table needs fine spacing, with the
   * spacing wanted there: e.g. the logarithmic surface layer wants millimetres near z = 0.
   */
  readonly refinements: readonly { from_m: number; to_m: number; spacing_m: number }[];
  /** Top of the modelled air, m (86 000 for the US 1976 continuation). */
  readonly top_m: number;
}
