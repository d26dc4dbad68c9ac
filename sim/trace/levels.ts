/**
 * Event levels of a ray (surface, kinks of n(z), top) and the aim of a step at the next one.
 *
 * Aiming matters: a step that straddles a kink carries an error estimate far above the tolerance
 * (the jump of dα/ds times the overshoot times the lever arm) and the step control would creep up
 * to the kink in many shrinking steps. The crossing is predicted by a quadratic in range from z,
 * dz/ds and d²z/ds², good to O(h³): the ray stops short (LEVEL_APPROACH), then aims at the level;
 * a step that lands a hair short arrives after one more tiny step, one that crosses is located
 * (locate.ts).
 */

/**
 * A step heading for a level stops at this fraction of the predicted distance; the next step, much
 * shorter, aims at the level itself with a prediction error of order (1 − fraction)³ smaller. A
 * step that straddles a kink by δ carries an error estimate of about jump(dα/ds)·δ·lever arm,
 * which exceeds the tolerance already for δ of a fraction of a millimetre in a strong inversion.
 */
const LEVEL_APPROACH = 0.99;

/** Below this many metres of predicted distance the step aims at the level directly. */
const LEVEL_DIRECT_M = 1;

/**
 * Where a step from (s, z) should stop: at the predicted crossing of the nearest level above or
 * below (LEVEL_APPROACH of the way when it is farther than LEVEL_DIRECT_M), if that lies within
 * the proposed step; otherwise at end.
 * @param levels sorted event heights, m.
 * @param s current range, m; z current height, m.
 * @param slope dz/ds at the state; elevationRate dα/ds there, rad/m.
 * @param earthRadius_m R, m; proposedStep_m the integrator's next step, m; end the end range, m.
 * @returns the range limit for the next step, m (> s).
 */
export function levelAim(
  levels: Float64Array, s: number, z: number, slope: number, elevationRate: number,
  earthRadius_m: number, proposedStep_m: number, end: number,
): number {
  const q = 1 + z / earthRadius_m;
  const tanA = slope / q;
  // d²z/ds² = d/ds[(r/R) tan α] = (dz/ds) tan α / R + (r/R) sec²α · dα/ds.
  const curvature = (slope * tanA) / earthRadius_m + q * (1 + tanA * tanA) * elevationRate;
  let ahead = Infinity;
  const up = nextLevel(levels, z, 1);
  if (up >= 0) ahead = firstPositiveRoot(0.5 * curvature, slope, z - levels[up]);
  const down = nextLevel(levels, z, -1);
  if (down >= 0) ahead = Math.min(ahead, firstPositiveRoot(0.5 * curvature, slope, z - levels[down]));
  if (!(ahead <= proposedStep_m)) return end;
  const aim = s + (ahead > LEVEL_DIRECT_M ? LEVEL_APPROACH * ahead : ahead);
  // A distance below the resolution of the range still has to move the ray.
  const target = aim > s ? aim : s + Math.abs(s) * Number.EPSILON + Number.MIN_VALUE;
  return Math.min(end, target);
}

/** Smallest positive root of a·x² + b·x + c (Infinity if none), by the cancellation-free formulas. */
function firstPositiveRoot(a: number, b: number, c: number): number {
  if (a === 0) {
    const x = -c / b;
    return x > 0 ? x : Infinity;
  }
  const disc = b * b - 4 * a * c;
  if (disc < 0) return Infinity;
  const qq = -0.5 * (b + (b >= 0 ? 1 : -1) * Math.sqrt(disc));
  const r1 = qq / a;
  const r2 = qq !== 0 ? c / qq : Infinity;
  const lo = Math.min(r1, r2);
  const hi = Math.max(r1, r2);
  return lo > 0 ? lo : hi > 0 ? hi : Infinity;
}

/** Index of the nearest level strictly above z (dir > 0) or strictly below z (dir < 0); −1 if none. */
export function nextLevel(levels: Float64Array, z: number, dir: number): number {
  let lo = 0;
  let hi = levels.length; // first index with levels[i] > z
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (levels[mid] > z) hi = mid;
    else lo = mid + 1;
  }
  if (dir > 0) return lo < levels.length ? lo : -1;
  let i = lo - 1;
  if (i >= 0 && levels[i] === z) i--;
  return i;
}
