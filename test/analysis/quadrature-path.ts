/**
 * An independent path to the height a ray reaches at a range: the invariant quadrature of DESIGN.md
 * §3 item 4 (sim/trace/quadrature.ts, quadratureRange) leg by leg between turning points, the
 * turning points from Bouguer's invariant profile (sim/analysis/invariant.ts). No ray integrator is
 * involved, so agreement with the transfer curve checks the integrator, the fan and the fold and
 * boundary searches together.
 *
 * A ray with invariant c runs from one turning height (where n·r = c) to the next; each leg is
 * monotone in height, so the range to a height within a leg is monotone and the height at a range
 * is found by bisection on the quadrature.
 */
import { EARTH_RADIUS_M } from '../../sim/constants.js';
import type { IndexTable } from '../../sim/refractivity/index-table.js';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { quadratureRange } from '../../sim/trace/quadrature.js';

/** Bisection steps on a leg's heights (2^-60 of a leg is far below a micrometre). */
const BISECTIONS = 60;
/** Most legs followed (rays in the test media turn a few times within the ranges used). */
const MAX_LEGS = 50;
/** Distance past a turning point where the search for the next one starts, m (n·r − c there ≈ 1e-6 m ≫ rounding of 1e-12 m). */
const TURN_CLEARANCE_M = 1e-6;
/** Relative nudges back from a turning height when the quadrature places it a rounding error earlier. */
const NUDGES = [1e-14, 1e-13, 1e-12, 1e-11];

/**
 * Height at ground range D of the ray leaving the observer at the given elevation, by quadrature;
 * null when the ray meets the surface or leaves the table top first.
 * @param table the medium. @param h observer height, m. @param elevation_rad apparent elevation, rad.
 * @param range_m the range D, m. @param earthRadius_m sphere radius, m.
 */
export function quadratureHeightAt(table: IndexTable, h: number, elevation_rad: number, range_m: number, earthRadius_m = EARTH_RADIUS_M): number | null {
  const profile = new InvariantProfile(table, earthRadius_m);
  const half = Math.sin(0.5 * elevation_rad);
  const offset = profile.offset_m(h) * Math.cos(elevation_rad) - 2 * earthRadius_m * half * half; // c − R
  const options = { earthRadius_m };
  let z0 = h;
  let launch = elevation_rad;
  let dir = elevation_rad > 0 ? 1 : elevation_rad < 0 ? -1 : profile.slope(h, 1) >= 0 ? 1 : -1;
  let travelled = 0;
  for (let leg = 0; leg < MAX_LEGS; leg++) {
    // Start the search for the next turning point just past this one (where n·r − c is 0 to rounding).
    const from = leg === 0 ? z0 : z0 + dir * TURN_CLEARANCE_M;
    const turn = dir < 0 ? profile.crossingBelow(offset, from) : profile.crossingAbove(offset, from);
    let end = turn ?? (dir < 0 ? 0 : table.top_m);
    let legRange = quadratureRange(table, z0, launch, end, options);
    // quadratureRange finds the turning height itself; where its rounding puts it a hair before ours,
    // step back from the turning point by a few ulps until the leg is accepted (range lost: < 1e-2 m).
    for (let k = 0; legRange === null && turn !== null && k < NUDGES.length; k++) {
      end = turn - dir * NUDGES[k] * Math.max(1, Math.abs(turn));
      legRange = quadratureRange(table, z0, launch, end, options);
    }
    if (legRange === null) return null;
    if (travelled + legRange >= range_m) {
      let near = z0;
      let far = end;
      for (let i = 0; i < BISECTIONS; i++) {
        const mid = 0.5 * (near + far);
        const s = quadratureRange(table, z0, launch, mid, options);
        if (s !== null && travelled + s < range_m) near = mid;
        else far = mid;
      }
      return 0.5 * (near + far);
    }
    if (turn === null) return null;
    travelled += legRange;
    z0 = turn;
    launch = 0;
    dir = -dir;
  }
  throw new Error(`ray turned more than ${MAX_LEGS} times before ${range_m} m`);
}

/**
 * Height at range D of the ray that grazes the surface (invariant c = n(0)·R, turning point at 0
 * where n·r increases from the surface): its range from the tangent point to height z is the
 * quadrature from 0 to z, so the observer at h is Q(h) from the tangent point and the ray reaches
 * z at range Q(h) + Q(z). Returns null when the tangent point lies beyond D.
 */
export function grazingHeightAt(table: IndexTable, h: number, range_m: number, earthRadius_m = EARTH_RADIUS_M): number | null {
  const options = { earthRadius_m };
  const toObserver = quadratureRange(table, 0, 0, h, options);
  if (toObserver === null || toObserver > range_m) return null;
  let lo = 0;
  let hi = table.top_m;
  for (let i = 0; i < 200 && hi - lo > 1e-12 * Math.max(1, hi); i++) {
    const mid = 0.5 * (lo + hi);
    const s = quadratureRange(table, 0, 0, mid, options);
    if (s !== null && toObserver + s < range_m) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
