/**
 * The elevation window of the transfer curve: the apparent elevations whose rays can reach the
 * target range at a height between 0 and the maximum height. Everything below the window meets
 * the surface first; everything above it reaches the target range higher than the maximum height.
 *
 * Construction (f(z) = n(z)·(R + z), Bouguer's invariant profile; a ray has c = f(h) cos α):
 * - Bottom. A downward ray with c ≤ min f over [0, h], i.e. α ≤ −arccos(min f / f(h)) (the dip
 *   of the sea horizon seen through the air below the eye, DESIGN.md §3 item 3), descends to the
 *   surface without turning, and steeper rays meet it sooner. The bottom starts at the lower of
 *   that elevation and the straight-line elevation of the target's base, and steps down (doubling)
 *   until its ray meets the surface before the target range: then every lower ray does too.
 * - Top. An upward ray with c ≤ min f over [h, top] never turns down, and among such rays the
 *   steeper one is higher at every range (dθ/dc > 0 at fixed height in the invariant quadrature,
 *   DESIGN.md §3 item 4). The top starts at the highest of that elevation, the horizontal (the
 *   argument needs upward rays: downward rays may turn up below the eye, as in an inferior
 *   mirage) and the straight-line elevation of the maximum height, and steps up (doubling) until
 *   its ray passes the target range above the maximum height (or escapes): then every higher ray
 *   does too.
 * - Margin. Both ends move out by max(WINDOW_MARGIN_MIN_RAD, WINDOW_MARGIN_FRACTION × width), so
 *   the first and last rays of the fan lie safely outside the curve that matters.
 */
import { RAD_PER_DEG } from '../constants.js';
import { MAX_ELEVATION_RAD } from '../trace/options.js';
import { angleBelowEye } from './dip.js';
import { InvariantProfile } from './invariant.js';
import type { RangeProbe } from './range-probe.js';
import { geometricElevation_rad } from './sight-geometry.js';

/** Smallest margin added at each end of the window, rad (0.01°). */
export const WINDOW_MARGIN_MIN_RAD = 0.01 * RAD_PER_DEG;
/** Margin added at each end of the window as a fraction of its width (10 %). */
export const WINDOW_MARGIN_FRACTION = 0.1;
/** Steepest elevation the window may reach, rad (the tracer's 80° limit, sim/trace/options.ts). */
export const WINDOW_LIMIT_RAD = MAX_ELEVATION_RAD;
/** First step when the window must be widened, rad (0.05°); it doubles at each further step. */
const WIDEN_STEP_RAD = 0.05 * RAD_PER_DEG;

/** An elevation window, rad. */
export interface ElevationWindow {
  from_rad: number;
  to_rad: number;
}

/**
 * Chooses the elevation window of the transfer curve (see the module comment).
 * @param probe traces rays to the target range (its table, observer height, range, Earth radius).
 * @param maxHeight_m highest height of interest at the target range, m (> 0).
 * @returns the window, rad; the probe's count grows by the rays traced (a handful).
 */
export function transferWindow(probe: RangeProbe, maxHeight_m: number): ElevationWindow {
  const { table, observerHeight_m: h, range_m: D, earthRadius_m: R } = probe;
  const profile = new InvariantProfile(table, R);
  const gEye = profile.offset_m(h);
  const fEye = R + gEye;
  const below = profile.minimum(0, h);
  const above = profile.minimum(h, table.top_m);
  const seaLimit = -angleBelowEye(gEye - below.offset_m, fEye);
  const turnLimit = above.offset_m < gEye ? angleBelowEye(gEye - above.offset_m, fEye) : 0;

  let lo = Math.min(seaLimit, geometricElevation_rad(h, D, 0, R));
  for (let step = WIDEN_STEP_RAD; lo > -WINDOW_LIMIT_RAD && probe.probe(lo).fate !== 'surface'; step *= 2) {
    lo = Math.max(-WINDOW_LIMIT_RAD, lo - step);
  }
  let hi = Math.max(0, turnLimit, geometricElevation_rad(h, D, maxHeight_m, R));
  for (let step = WIDEN_STEP_RAD; hi < WINDOW_LIMIT_RAD && !clearsTop(probe, hi, maxHeight_m); step *= 2) {
    hi = Math.min(WINDOW_LIMIT_RAD, hi + step);
  }
  const margin = Math.max(WINDOW_MARGIN_MIN_RAD, WINDOW_MARGIN_FRACTION * (hi - lo));
  return { from_rad: Math.max(-WINDOW_LIMIT_RAD, lo - margin), to_rad: Math.min(WINDOW_LIMIT_RAD, hi + margin) };
}

/** True when the ray at this elevation passes the target range above maxHeight_m, or escapes. */
function clearsTop(probe: RangeProbe, elevation_rad: number, maxHeight_m: number): boolean {
  const sample = probe.probe(elevation_rad);
  return sample.fate === 'escaped' || (sample.height_m !== null && sample.height_m > maxHeight_m);
}
