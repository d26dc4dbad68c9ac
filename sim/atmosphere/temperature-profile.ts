/**
 * Temperature profiles of a scenario (DESIGN.md §5): nodes joined by straight lines in geometric
 * height, continued above the last node by the US 1976 lapse rates or by a constant lapse; and the
 * standard atmosphere, which is the US 1976 profile shifted to a surface temperature.
 */
import { InputRangeError, requireInRange } from '../errors.js';
import type { AboveSpec, TemperatureNode } from '../scenario.js';
import { US1976_KINKS_M, US1976_TOP_M, us1976Temperature_K, us1976TemperatureGradient_K_per_m } from './us1976.js';

/** A temperature profile T(z) with its kinks. Heights in m above the surface. */
export interface TemperatureProfile {
  /** Temperature at z, K. */
  temperature_K(z_m: number): number;
  /** dT/dz at z from below (side −1) or above (+1), K/m; the two differ only at kinks. */
  temperatureGradient_K_per_m(z_m: number, side: -1 | 1): number;
  /** Heights strictly between 0 and top_m where dT/dz jumps, m, increasing. */
  readonly kinks_m: readonly number[];
  /** Top of the profile, m. */
  readonly top_m: number;
}

/**
 * Temperature range of the resolved air, K. A constant-lapse continuation ends (the modelled air
 * ends) where it would leave this range; nodes and the standard's surface temperature must lie in
 * it. Wider than the index models' validity (about 180..340 K) so that cold and hot scenarios
 * still resolve; it keeps T well away from 0 K, where the hydrostatic equation breaks down. (A US
 * 1976 continuation is not cut: it falls at most 101.3 K below its start, so stays above 48 K.)
 */
export const PROFILE_TEMPERATURE_RANGE_K = { min: 150, max: 400 } as const;

/** Largest magnitude of a constant-lapse continuation, K/m (a loose sanity bound). */
export const MAX_LAPSE_K_PER_M = 1;

/**
 * Builds a layered temperature profile from nodes (DESIGN.md §5 `profile` and `above`).
 *
 * - Between nodes: linear in geometric height.
 * - Below the first node: if the first node is above 0 m, its temperature is held constant down to
 *   the surface (dT/dz = 0; the first node is then a kink). If it is at 0 m, the gradient just
 *   above 0 continues linearly below 0 (only reached by extrapolation).
 * - Above the last node, `above.kind = 'us1976'`: T(z) = T_last + T76(z) − T76(z_last), the US
 *   1976 lapse rates carried on, with its layer bases above z_last as kinks; top 86 000 m.
 *   `above.kind = 'lapse'`: T(z) = T_last + L·(z − z_last); the profile ends at 86 000 m or where T
 *   would leave PROFILE_TEMPERATURE_RANGE_K, whichever is lower.
 *
 * Validates its input (it is called once per scenario): throws InputRangeError naming
 * `${field}.nodes[i].height_m` (0 ≤ z < 86 000 m, strictly increasing),
 * `${field}.nodes[i].temperature_K` (150..400 K) or `${field}.above.lapse_K_per_m` (±1 K/m).
 *
 * @param nodes at least one node, heights in m, temperatures in K.
 * @param above continuation above the last node.
 * @param field name of the atmosphere in error messages (default 'atmosphere').
 * @returns the profile. Exact piecewise-linear (in z; in geopotential height for the US 1976 part).
 * Reference: DESIGN.md §5; US 1976 (NOAA/NASA/USAF 1976), Table 4, via us1976.ts.
 */
export function profileTemperature(nodes: readonly TemperatureNode[], above: AboveSpec, field = 'atmosphere'): TemperatureProfile {
  validateNodes(nodes, field);
  const count = nodes.length;
  const zs = Float64Array.from(nodes, (node) => node.height_m);
  const Ts = Float64Array.from(nodes, (node) => node.temperature_K);
  const zLast = zs[count - 1];
  const TLast = Ts[count - 1];
  const slopes = new Float64Array(Math.max(count - 1, 0));
  for (let i = 0; i < count - 1; i++) slopes[i] = (Ts[i + 1] - Ts[i]) / (zs[i + 1] - zs[i]);

  let top_m = US1976_TOP_M;
  let aboveT: (z: number) => number;
  let aboveGradient: (z: number, side: -1 | 1) => number;
  let aboveKinks: number[] = [];
  if (above.kind === 'us1976') {
    const t76Last = us1976Temperature_K(zLast);
    aboveT = (z) => TLast + (us1976Temperature_K(z) - t76Last);
    aboveGradient = us1976TemperatureGradient_K_per_m;
    aboveKinks = US1976_KINKS_M.filter((z) => z > zLast);
  } else {
    const lapse = requireInRange(`${field}.above.lapse_K_per_m`, above.lapse_K_per_m, -MAX_LAPSE_K_PER_M, MAX_LAPSE_K_PER_M, 'K/m');
    aboveT = (z) => TLast + lapse * (z - zLast);
    aboveGradient = () => lapse;
    if (lapse < 0) top_m = Math.min(top_m, zLast + (PROFILE_TEMPERATURE_RANGE_K.min - TLast) / lapse);
    if (lapse > 0) top_m = Math.min(top_m, zLast + (PROFILE_TEMPERATURE_RANGE_K.max - TLast) / lapse);
    if (!(top_m > zLast)) {
      throw new InputRangeError(`${field}.above.lapse_K_per_m`, lapse, `a lapse that keeps the temperature within ${PROFILE_TEMPERATURE_RANGE_K.min}..${PROFILE_TEMPERATURE_RANGE_K.max} K above the last node`);
    }
  }
  // Gradient just above the first node (used below it when it sits at the surface).
  const firstGradient = count > 1 ? slopes[0] : aboveGradient(zs[0], 1);
  const holdBelow = zs[0] > 0;

  const kinks: number[] = [];
  for (let i = holdBelow ? 0 : 1; i < count; i++) kinks.push(zs[i]);
  for (const z of aboveKinks) kinks.push(z);

  /** Segment index: −1 below the first node, count − 1 above the last, else i with z_i ≤ z ≤ z_{i+1}. */
  const segment = (z: number, side: -1 | 1): number => {
    if (side > 0 ? z < zs[0] : z <= zs[0]) return -1;
    if (side > 0 ? z >= zLast : z > zLast) return count - 1;
    let lo = 0;
    let hi = count - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (side > 0 ? zs[mid] <= z : zs[mid] < z) lo = mid;
      else hi = mid;
    }
    return lo;
  };

  return {
    temperature_K(z_m: number): number {
      const i = segment(z_m, 1);
      if (i < 0) return holdBelow ? Ts[0] : Ts[0] + firstGradient * (z_m - zs[0]);
      if (i === count - 1) return aboveT(z_m);
      return Ts[i] + slopes[i] * (z_m - zs[i]);
    },
    temperatureGradient_K_per_m(z_m: number, side: -1 | 1): number {
      const i = segment(z_m, side);
      if (i < 0) return holdBelow ? 0 : firstGradient;
      if (i === count - 1) return aboveGradient(z_m, side);
      return slopes[i];
    },
    kinks_m: kinks.filter((z) => z > 0 && z < top_m),
    top_m,
  };
}

/**
 * The standard atmosphere of a scenario: the US 1976 profile shifted to a surface temperature,
 * T(z) = T_s + T76(z) − 288.15 K (DESIGN.md §5 `"standard": "us1976"`). Same as a single node at
 * 0 m continued by `above: us1976`.
 * @param surface_temperature_K temperature at 0 m, K (150..400 K; throws InputRangeError naming
 *   `${field}.surface_temperature_K` outside).
 * @param field name of the atmosphere in error messages (default 'atmosphere').
 * @returns the profile, kinks at the US 1976 layer bases, top 86 000 m.
 * Reference: US 1976 (NOAA/NASA/USAF 1976), Table 4, via us1976.ts.
 */
export function standardTemperature(surface_temperature_K: number, field = 'atmosphere'): TemperatureProfile {
  const { min, max } = PROFILE_TEMPERATURE_RANGE_K;
  requireInRange(`${field}.surface_temperature_K`, surface_temperature_K, min, max, 'K');
  return profileTemperature([{ height_m: 0, temperature_K: surface_temperature_K }], { kind: 'us1976' }, field);
}

function validateNodes(nodes: readonly TemperatureNode[], field: string): void {
  if (!Array.isArray(nodes) || nodes.length === 0) {
    throw new InputRangeError(`${field}.nodes`, nodes?.length ?? nodes, 'at least 1 temperature node');
  }
  const { min, max } = PROFILE_TEMPERATURE_RANGE_K;
  nodes.forEach((node, i) => {
    const previous = i > 0 ? nodes[i - 1].height_m : 0;
    const low = i > 0 ? `above ${previous}` : '0';
    const height = node.height_m;
    if (!Number.isFinite(height) || height < 0 || height >= US1976_TOP_M || (i > 0 && !(height > previous))) {
      throw new InputRangeError(`${field}.nodes[${i}].height_m`, height, `${low}..${US1976_TOP_M} m (exclusive), strictly increasing`);
    }
    requireInRange(`${field}.nodes[${i}].temperature_K`, node.temperature_K, min, max, 'K');
  });
}
