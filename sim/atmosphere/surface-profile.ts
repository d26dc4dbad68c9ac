/**
 * Temperature and humidity of the marine surface layer from the bulk flux scales (Monin-Obukhov
 * similarity, COARE convention), the height up to which that profile is used (the blending
 * height), and the grid refinement that resolves its logarithmic bottom.
 *
 *   θ(z) = T_skin + (θ_* / κ)[ln(z/z_ot) − ψ_h(z/L)],   T(z) = θ(z) − 0.0098 z,
 *   q(z) = q_s + (q_* / κ)[ln(z/z_oq) − ψ_h(z/L)],      z_oq = z_ot,
 * with κ = 0.4, turbulent Prandtl number 1 and ψ_h the COARE psit_26 (REFERENCES.md §7.1).
 * Below the roughness length z_ot the values at z_ot are held (the log law does not reach below
 * it). They differ from the skin values by (θ_* / κ)ψ_h(z_ot/L) + 0.0098 z_ot, below 1e-3 K.
 *
 * Reference: Fairall et al. (2003), J. Climate 16, 571–590, eqs. (2)–(5); NOAA-PSL
 * COARE-algorithm `coare35vn.py` (TN2/QN2 profile lines).
 */
import { COARE_ADIABATIC_LAPSE_K_PER_M, VON_KARMAN, type FluxResult } from './surface-flux.js';
import { psiHeatCoare, psiHeatCoareDerivative } from './surface-stability.js';

/** The surface-layer profile built from a flux result. Heights in m above the sea. */
export interface SurfaceLayerProfile {
  /** Temperature at z, K. */
  temperature_K(z_m: number): number;
  /** dT/dz at z, K/m (0 below z_ot; at z_ot side −1 gives 0, side +1 the log-law gradient). */
  temperatureGradient_K_per_m(z_m: number, side: -1 | 1): number;
  /** Specific humidity at z, kg/kg. */
  specific_humidity(z_m: number): number;
  /** dq/dz at z, 1/m (same sides as the temperature gradient). */
  specificHumidityGradient_per_m(z_m: number, side: -1 | 1): number;
  /** Roughness length for heat and humidity, m: the height below which values are held. */
  readonly roughness_heat_m: number;
}

/**
 * The Monin-Obukhov profiles of temperature and specific humidity from the bulk scales.
 * @param flux result of computeBulkFlux (u*, θ*, q*, L, z_ot, skin temperature, surface humidity).
 * @returns the profile; exact evaluation of the formulas above (analytic gradients).
 * Validity: inside the surface layer (up to the blending height, see blendingHeight_m).
 * Reference: Fairall et al. (2003) eqs. (2)–(5); REFERENCES.md §7.1 (COARE convention θ = T + 0.0098 z).
 */
export function surfaceLayerProfile(flux: FluxResult): SurfaceLayerProfile {
  const zot = flux.roughness_heat_m;
  const L = flux.obukhov_length_m;
  const tScale = flux.temperature_scale_K / VON_KARMAN;
  const qScale = flux.humidity_scale / VON_KARMAN;
  const shape = (z: number): number => Math.log(z / zot) - psiHeatCoare(z / L);
  const shapeGradient = (z: number): number => 1 / z - psiHeatCoareDerivative(z / L) / L;
  const inside = (z: number, side: -1 | 1): boolean => (side > 0 ? z >= zot : z > zot);
  const theta = (z: number): number => flux.skin_temperature_K + tScale * shape(z);
  return {
    temperature_K: (z_m) => {
      const z = Math.max(z_m, zot);
      return theta(z) - COARE_ADIABATIC_LAPSE_K_PER_M * z;
    },
    temperatureGradient_K_per_m: (z_m, side) =>
      inside(z_m, side) ? tScale * shapeGradient(z_m) - COARE_ADIABATIC_LAPSE_K_PER_M : 0,
    specific_humidity: (z_m) => flux.surface_specific_humidity + qScale * shape(Math.max(z_m, zot)),
    specificHumidityGradient_per_m: (z_m, side) => (inside(z_m, side) ? qScale * shapeGradient(z_m) : 0),
    roughness_heat_m: zot,
  };
}

/**
 * Default top of the surface layer as a fraction of the boundary-layer height: the surface layer
 * is commonly taken as the lowest 10 % of the boundary layer (common practice, no source; e.g.
 * Stull 1988, An Introduction to Boundary Layer Meteorology, ch. 1, from memory). With COARE's
 * default boundary-layer height of 600 m this is 60 m.
 */
export const SURFACE_LAYER_FRACTION = 0.1;

/**
 * In stable air, the largest z/L up to which the surface-layer form is used: 6.35, where
 * g(ζ) = 1/ζ − ψ_h'(ζ) of psit_26 has its minimum (derived: golden-section search, g(6.346) =
 * 2.718). dθ/dz = (θ_* / κL) g(z/L), so below this height the stable gradient weakens with height
 * as observed; above it the Beljaars-Holtslag form would make it grow again without bound, an
 * extrapolation beyond the data the form was fitted to.
 */
export const STABLE_BLEND_ZETA = 6.35;

/** Why the blending height has its value. */
export type BlendingLimit = 'surface-layer' | 'stability' | 'node' | 'measurement' | 'given';

/**
 * Height up to which the Monin-Obukhov profile is used; above it the air continues as the
 * scenario says (nodes, constant lapse or US 1976 lapse rates), joined continuously.
 *
 * Rule: z_b = max(z_meas, min(0.1 z_i, 6.35 L if stable, ½ z_node)), with z_meas the highest
 * temperature or humidity sensor (the profile must pass through the observations), z_i the
 * boundary-layer height, and z_node the first user node above the surface layer (halving leaves a
 * straight segment between the surface layer and that node). A given height overrides the rule;
 * it is still raised to z_meas, and replaced by ½ z_node when it is not below z_node.
 * @param flux result of computeBulkFlux (uses L).
 * @param measurement_height_m highest temperature/humidity sensor, m (> 0).
 * @param boundary_layer_height_m z_i, m (> 0).
 * @param first_node_height_m height of the first user node, m (> measurement_height_m), if any.
 * @param given_m a blending height chosen by the caller, m, if any.
 * @returns the height in m and which limit set it.
 * Reference: rule of this project (see the constants' notes for the parts taken from elsewhere).
 */
export function blendingHeight_m(
  flux: FluxResult,
  measurement_height_m: number,
  boundary_layer_height_m: number,
  first_node_height_m?: number,
  given_m?: number,
): { height_m: number; limited_by: BlendingLimit } {
  let height_m: number;
  let limited_by: BlendingLimit;
  const L = flux.obukhov_length_m;
  if (given_m !== undefined) {
    height_m = given_m;
    limited_by = 'given';
  } else {
    height_m = SURFACE_LAYER_FRACTION * boundary_layer_height_m;
    limited_by = 'surface-layer';
    if (L > 0 && STABLE_BLEND_ZETA * L < height_m) {
      height_m = STABLE_BLEND_ZETA * L;
      limited_by = 'stability';
    }
  }
  const nodeLimit = first_node_height_m === undefined ? Infinity : given_m !== undefined ? first_node_height_m : 0.5 * first_node_height_m;
  if (height_m >= nodeLimit) {
    height_m = 0.5 * first_node_height_m!;
    limited_by = 'node';
  }
  if (height_m < measurement_height_m) {
    height_m = measurement_height_m;
    limited_by = 'measurement';
  }
  return { height_m, limited_by };
}

/** Spacing wanted in the lowest centimetre at least, m: 1 mm. */
export const SURFACE_REFINEMENT_BOTTOM_SPACING_M = 0.001;
/** Top of the band with at most 1 mm spacing, m: 1 cm. */
export const SURFACE_REFINEMENT_BOTTOM_TOP_M = 0.01;
/**
 * Cells per doubling of height above the roughness length: 20, a spacing of 3.5–5 % of the height.
 * A cubic Hermite cell of relative width w on c·ln z errs by about w⁴/64·|c|; with c ≈ (θ_* / κ)
 * ∂n/∂T ≈ 1e-6 at most, w = 0.05 keeps n − 1 within 1e-13 (the table builder does not split cells
 * below 0.1 mm, so the starting grid must be fine enough next to z_ot by itself).
 */
export const SURFACE_REFINEMENT_PER_OCTAVE = 20;

/**
 * Refinements that let a grid resolve the logarithmic layer: spacing z/20 in bands [a, 2a] from the
 * roughness length z_ot up to top_m (geometric growth), at most 1 mm in the lowest centimetre, and
 * one band [0, z_ot] where the profile is held constant.
 * @param roughness_heat_m z_ot, m (> 0): where the log profile starts.
 * @param top_m top of the surface layer (the blending height), m (> roughness_heat_m).
 * @returns refinements in increasing order of from_m; the geometric bands are contiguous from z_ot
 * to top_m.
 */
export function surfaceLayerRefinements(roughness_heat_m: number, top_m: number): { from_m: number; to_m: number; spacing_m: number }[] {
  const bands = [
    { from_m: 0, to_m: roughness_heat_m, spacing_m: roughness_heat_m },
    { from_m: 0, to_m: Math.min(SURFACE_REFINEMENT_BOTTOM_TOP_M, top_m), spacing_m: SURFACE_REFINEMENT_BOTTOM_SPACING_M },
  ];
  for (let a = roughness_heat_m; a < top_m; a *= 2) {
    bands.push({ from_m: a, to_m: Math.min(2 * a, top_m), spacing_m: a / SURFACE_REFINEMENT_PER_OCTAVE });
  }
  return bands;
}
