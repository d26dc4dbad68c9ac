/**
 * US Standard Atmosphere 1976, lower atmosphere (0 to 86 km geometric): temperature and pressure.
 *
 * Reference: NOAA, NASA and USAF, "U.S. Standard Atmosphere, 1976", NOAA-S/T 76-1562 (U.S.
 * Government Printing Office, Washington, 1976): Table 2 (defining constants g0, M0, R*, r0,
 * P0, T0), Table 4 (the seven layers: geopotential base heights H_b and molecular-scale
 * temperature gradients L_M,b), Eq. 18 (geopotential H = r0·Z/(r0 + Z)), Eqs. 33a/33b (pressure
 * in a layer with L ≠ 0 / L = 0; equation numbers from memory). Layer table and base values as
 * transcribed in REFERENCES.md §3.
 *
 * Base temperatures and pressures are not copied from the standard's table: they are computed
 * here from the layer table and Eqs. 33a/33b, as the standard defines them, and the tests compare
 * them with the published base values.
 *
 * Temperature returned here is the molecular-scale temperature T_M of the standard, linear in
 * geopotential height in each layer. It equals the kinetic temperature below 80 km; between 80 and
 * 86 km the standard's kinetic temperature is T_M·M/M0, lower by at most 0.04 % (186.87 K instead
 * of 186.95 K at 86 km), where n − 1 is below 1e-9: the difference is immaterial for optics.
 *
 * These are numerical kernels (STYLE.md §6): no argument checks. Below 0 m the first layer
 * continues (the standard tabulates it down to −5 km); above 86 km the last layer continues.
 */
import { G0_M_PER_S2, M_DRY_AIR_KG_PER_MOL, STANDARD_PRESSURE_PA, STANDARD_TEMPERATURE_K, US1976_EARTH_RADIUS_M } from '../constants.js';

/**
 * Universal gas constant as the 1976 standard defines it, J/(mol·K) (Table 2: R* = 8.31432e3
 * J/(kmol·K)). It differs from CODATA 2018 (sim/constants.ts) by 1.7e-5 relative; the standard's
 * pressures follow from this value, so the standard atmosphere uses it.
 */
export const US1976_GAS_CONSTANT_J_PER_MOL_K = 8.31432;

/**
 * Hydrostatic constant of the standard, g0·M0/R*, K per geopotential metre:
 * 9.80665 × 0.0289644 / 8.31432 = 0.034163194736 K/m (REFERENCES.md §3: 34.163194736 K/km).
 */
export const US1976_HYDROSTATIC_K_PER_M = (G0_M_PER_S2 * M_DRY_AIR_KG_PER_MOL) / US1976_GAS_CONSTANT_J_PER_MOL_K;

/** Top of the lower atmosphere of the standard, geometric height, m (86 km). */
export const US1976_TOP_M = 86_000;

/** One layer of the standard: temperature linear in geopotential height from its base. */
export interface Us1976Layer {
  /** Geopotential height of the base, m′ (geopotential metres). */
  readonly base_geopotential_m: number;
  /** Geometric height of the base, m. */
  readonly base_geometric_m: number;
  /** Temperature gradient dT/dH, K per geopotential metre. */
  readonly lapse_K_per_m: number;
  /** Temperature at the base, K. */
  readonly base_temperature_K: number;
  /** Pressure at the base, Pa. */
  readonly base_pressure_Pa: number;
}

/** Layer bases H_b (m′) and gradients L_M,b (K/m′), US Standard Atmosphere 1976 Table 4. */
const LAYER_DEFINITIONS: readonly (readonly [number, number])[] = [
  [0, -0.0065],
  [11_000, 0],
  [20_000, 0.001],
  [32_000, 0.0028],
  [47_000, 0],
  [51_000, -0.0028],
  [71_000, -0.002],
];

/**
 * Geopotential height from geometric height, US 1976 Eq. 18: H = r0·Z/(r0 + Z), r0 = 6 356 766 m.
 * @param z_m geometric height above sea level, m (> −r0).
 * @returns geopotential height, m′. Exact (the standard's definition).
 */
export function geopotentialHeight_m(z_m: number): number {
  return (US1976_EARTH_RADIUS_M * z_m) / (US1976_EARTH_RADIUS_M + z_m);
}

/**
 * Geometric height from geopotential height, the inverse of Eq. 18: Z = r0·H/(r0 − H).
 * @param h_m geopotential height, m′ (< r0).
 * @returns geometric height, m.
 */
export function geometricHeight_m(h_m: number): number {
  return (US1976_EARTH_RADIUS_M * h_m) / (US1976_EARTH_RADIUS_M - h_m);
}

/**
 * Ratio of gravity at height z to g0, g(z)/g0 = (r0/(r0 + z))², which is also dH/dz.
 * US 1976 Eq. 17 (inverse-square gravity with r0 = 6 356 766 m).
 * @param z_m geometric height, m.
 * @returns g(z)/g0, dimensionless (0.99686 at 10 km).
 */
export function gravityRatio(z_m: number): number {
  const q = US1976_EARTH_RADIUS_M / (US1976_EARTH_RADIUS_M + z_m);
  return q * q;
}

function buildLayers(): Us1976Layer[] {
  const layers: Us1976Layer[] = [];
  let T = STANDARD_TEMPERATURE_K;
  let p = STANDARD_PRESSURE_PA;
  for (let i = 0; i < LAYER_DEFINITIONS.length; i++) {
    const [H, L] = LAYER_DEFINITIONS[i];
    layers.push({ base_geopotential_m: H, base_geometric_m: geometricHeight_m(H), lapse_K_per_m: L, base_temperature_K: T, base_pressure_Pa: p });
    if (i + 1 < LAYER_DEFINITIONS.length) {
      const dH = LAYER_DEFINITIONS[i + 1][0] - H;
      const Tn = T + L * dH;
      p = layerPressure(p, T, L, dH);
      T = Tn;
    }
  }
  return layers;
}

/** Eqs. 33a/33b: pressure dH above a base at (p_b, T_b) in a layer of gradient L. */
function layerPressure(base_Pa: number, base_K: number, lapse: number, dH: number): number {
  if (lapse === 0) return base_Pa * Math.exp((-US1976_HYDROSTATIC_K_PER_M * dH) / base_K);
  return base_Pa * Math.pow(base_K / (base_K + lapse * dH), US1976_HYDROSTATIC_K_PER_M / lapse);
}

/** The seven layers of the standard from 0 to 84.852 km′, base values computed from Eqs. 33a/33b. */
export const US1976_LAYERS: readonly Us1976Layer[] = buildLayers();

/**
 * Geometric heights where the standard's temperature gradient jumps (the bases of layers 2 to 7:
 * 11, 20, 32, 47, 51, 71 km′), m, increasing. Height 0 and the top are not kinks.
 */
export const US1976_KINKS_M: readonly number[] = US1976_LAYERS.slice(1).map((layer) => layer.base_geometric_m);

/** Index of the layer holding z: side +1 takes the layer above a base, −1 the layer below. */
function layerIndex(z_m: number, side: -1 | 1): number {
  let i = US1976_LAYERS.length - 1;
  while (i > 0 && (side > 0 ? z_m < US1976_LAYERS[i].base_geometric_m : z_m <= US1976_LAYERS[i].base_geometric_m)) i--;
  return i;
}

/**
 * Temperature of the US Standard Atmosphere 1976 at a geometric height.
 * @param z_m geometric height above sea level, m (0..86 000; layers 1 and 7 continue beyond).
 * @returns molecular-scale temperature T_M, K (288.15 K at 0, 216.65 K at 11 019 m).
 * Accuracy: exact to rounding. Reference: US 1976, Table 4 and Eq. 23 (T_M = T_M,b + L_M,b (H − H_b)).
 */
export function us1976Temperature_K(z_m: number): number {
  const layer = US1976_LAYERS[layerIndex(z_m, 1)];
  return layer.base_temperature_K + layer.lapse_K_per_m * (geopotentialHeight_m(z_m) - layer.base_geopotential_m);
}

/**
 * Geometric temperature gradient dT/dz of the standard: L_M,b·dH/dz = L_M,b·(r0/(r0 + z))².
 * @param z_m geometric height, m.
 * @param side at a layer base, −1 for the layer below, +1 for the layer above.
 * @returns dT/dz, K/m (−0.0065 K/m at 0).
 */
export function us1976TemperatureGradient_K_per_m(z_m: number, side: -1 | 1): number {
  return US1976_LAYERS[layerIndex(z_m, side)].lapse_K_per_m * gravityRatio(z_m);
}

/**
 * Pressure of the US Standard Atmosphere 1976 at a geometric height.
 * @param z_m geometric height above sea level, m (0..86 000; layers 1 and 7 continue beyond).
 * @returns pressure, Pa (101 325 Pa at 0; 22 632.06 Pa at 11 km′).
 * Accuracy: the standard's own formulas, exact to rounding (≈ 1e-15 relative).
 * Reference: US 1976, Eqs. 33a (L ≠ 0) and 33b (L = 0).
 */
export function us1976Pressure_Pa(z_m: number): number {
  const layer = US1976_LAYERS[layerIndex(z_m, 1)];
  const dH = geopotentialHeight_m(z_m) - layer.base_geopotential_m;
  return layerPressure(layer.base_pressure_Pa, layer.base_temperature_K, layer.lapse_K_per_m, dH);
}
