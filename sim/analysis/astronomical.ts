/**
 * Astronomical refraction for an observer at any height: the total bending of a ray that leaves
 * the atmosphere, by the invariant quadrature (ray-quadrature.ts), and its inverse.
 *
 * A ray leaving the observer at apparent elevation α has invariant c = f(h) cos α, f = n·(R + z).
 * Its fate follows from where f < c (InvariantProfile): an upward ray escapes iff f ≥ c all the
 * way up; a downward ray turns at the highest height below the eye where f = c (if f ≥ c down to
 * the surface it meets the sea instead), then climbs and escapes iff f ≥ c above the eye. The
 * refraction of an escaping ray is its total bending τ, so the true (airless) elevation of its
 * source is α − τ:
 *   α ≥ 0: τ = ∫_h^top;   α < 0 with turning point z_t: τ = ∫_{z_t}^h + ∫_{z_t}^top,
 * both with the substitution z = z_t + u² about the turning point (real for α < 0, virtual below
 * the eye for α ≥ 0), plus the step from n(top) to 1 where the modelled air ends (Snell at a
 * sphere: n_top·r·cos α_top = r·cos α_vacuum; below 0.001″ for a table that reaches 86 km).
 * Above the table top the ray is straight (no bending). Near-vertical rays are regular in this
 * form (c → 0): there is no ray integrator step limit to worry about.
 * Reference: Auer & Standish (2000), Astron. J. 119, 2472 (refraction integral, all zenith
 * angles); Smart (1977), Textbook on Spherical Astronomy, ch. III — both cited from memory.
 */
import { requireInRange } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { EARTH_RADIUS_RANGE_M, angleBelowEye, horizonOfProfile } from './dip.js';
import { InvariantProfile } from './invariant.js';
import { integrateRaySegment } from './ray-quadrature.js';

/**
 * Rays closer to the horizontal than this use the substitution about a virtual turning point
 * below the eye, m of (f(h) − c)/f′(h): beyond some kilometres the integrand is smooth anyway.
 */
const VIRTUAL_TURN_RANGE_M = 50_000;

/** Validates the shared inputs of the public functions. */
function checkInputs(table: IndexTable, observerHeight_m: number, earthRadius_m: number): void {
  requireInRange('observerHeight_m', observerHeight_m, 0, table.top_m, 'm');
  requireInRange('earthRadius_m', earthRadius_m, EARTH_RADIUS_RANGE_M.min, EARTH_RADIUS_RANGE_M.max, 'm');
}

/**
 * Astronomical refraction at an apparent elevation: the total bending of the ray from the
 * observer out of the atmosphere.
 * @param table tabulated medium n(z) (0..top; the air is taken to end at the top).
 * @param observerHeight_m observer's height above the surface, m (0..table top).
 * @param apparentElevation_rad apparent elevation of the ray at the observer, rad (−π/2..π/2;
 *   negative below the horizontal, down to the dip of the horizon).
 * @param earthRadius_m radius of the surface sphere, m (1e5..1e13).
 * @returns refraction, rad (positive: the source is seen higher than it is); null when the ray
 *   does not leave the atmosphere (it meets the surface, or is trapped in a duct).
 * Accuracy: quadrature about 1e-12 relative; the result is as good as the table (REFERENCES.md §4:
 *   within 0.3″ of the SOFA/ERFA ray-trace table to 76° zenith distance, test/analysis).
 * @throws InputRangeError naming observerHeight_m, apparentElevation_rad or earthRadius_m.
 * Reference: see the module comment.
 */
export function astronomicalRefraction_rad(
  table: IndexTable,
  observerHeight_m: number,
  apparentElevation_rad: number,
  earthRadius_m: number,
): number | null {
  checkInputs(table, observerHeight_m, earthRadius_m);
  requireInRange('apparentElevation_rad', apparentElevation_rad, -Math.PI / 2, Math.PI / 2, 'rad');
  return refractionOfProfile(new InvariantProfile(table, earthRadius_m), observerHeight_m, apparentElevation_rad);
}

/** Kernel of astronomicalRefraction_rad: no input checks; reuses a prepared profile. */
export function refractionOfProfile(profile: InvariantProfile, h: number, alpha: number): number | null {
  const R = profile.earthRadius_m;
  const top = profile.table.top_m;
  const gEye = profile.offset_m(h);
  const s = Math.sin(0.5 * alpha);
  const offset = gEye * Math.cos(alpha) - 2 * R * s * s; // c − R = f(h) cos α − R, without cancellation
  let bending: number;
  if (alpha < 0) {
    const turn = profile.crossingBelow(offset, h);
    if (turn === null) return null; // meets the surface
    if (profile.crossingAbove(offset, h) !== null) return null; // trapped
    bending =
      integrateRaySegment(profile, offset, turn, h, turn, 0).bending_rad +
      integrateRaySegment(profile, offset, turn, top, turn, 0).bending_rad;
  } else {
    if (profile.crossingAbove(offset, h) !== null) return null; // turns back down
    const gapAtEye = 2 * (R + gEye) * s * s; // f(h) − c = f(h)(1 − cos α)
    const slope = profile.slope(h, 1);
    const reach = slope > 0 ? gapAtEye / slope : Infinity;
    const virtualTurn = reach < VIRTUAL_TURN_RANGE_M ? h - reach : null;
    bending = integrateRaySegment(profile, offset, h, top, virtualTurn, gapAtEye).bending_rad;
  }
  return bending + exitStep(profile, offset);
}

/** Bending at the top of the modelled air, where n steps from n_top to 1, rad. */
function exitStep(profile: InvariantProfile, offset_m: number): number {
  const table = profile.table;
  const nTop = 1 + table.nm1[table.nm1.length - 1];
  const rTop = profile.earthRadius_m + table.top_m;
  const c = profile.earthRadius_m + offset_m;
  return Math.acos(Math.min(1, c / (nTop * rTop))) - Math.acos(Math.min(1, c / rTop));
}

/**
 * Apparent elevation at which a source at a true (airless) elevation is seen: the inverse of
 * astronomicalRefraction_rad, true = apparent − refraction, solved by bracketed root finding
 * (Illinois false position) between the lowest escaping ray and the zenith.
 * @param table tabulated medium n(z).
 * @param observerHeight_m observer's height, m (0..table top).
 * @param trueElevation_rad true elevation of the source, rad (−π/2..π/2).
 * @param earthRadius_m radius of the surface sphere, m (1e5..1e13).
 * @returns apparent elevation, rad, to about 1e-12 rad; null when the source is below every ray
 *   that escapes (hidden below the apparent horizon). Where ducts fold the mapping (several images
 *   of one source), the image found is one of them: trace a fan to see them all.
 * @throws InputRangeError naming the out-of-range field.
 */
export function apparentFromTrue_rad(
  table: IndexTable,
  observerHeight_m: number,
  trueElevation_rad: number,
  earthRadius_m: number,
): number | null {
  checkInputs(table, observerHeight_m, earthRadius_m);
  requireInRange('trueElevation_rad', trueElevation_rad, -Math.PI / 2, Math.PI / 2, 'rad');
  return apparentOfProfile(new InvariantProfile(table, earthRadius_m), observerHeight_m, trueElevation_rad);
}

/** Offset from a limiting ray at which the inverse starts its bracket, rad (its bending may diverge exactly there). */
const LIMIT_OFFSET_RAD = 1e-10;
/** Root tolerance of the inverse, rad. */
const ROOT_TOLERANCE_RAD = 1e-13;
/** Most iterations of the inverse. */
const MAX_ROOT_ITERATIONS = 200;

/** Kernel of apparentFromTrue_rad: no input checks. */
export function apparentOfProfile(profile: InvariantProfile, h: number, trueElevation: number): number | null {
  const lowest = lowestEscapingElevation(profile, h);
  const trueAt = (alpha: number): number => {
    const refraction = refractionOfProfile(profile, h, alpha);
    return refraction === null ? -Infinity : alpha - refraction;
  };
  let lo = lowest + LIMIT_OFFSET_RAD;
  let hi = Math.PI / 2;
  let fLo = trueAt(lo) - trueElevation;
  let fHi = Math.PI / 2 - trueElevation;
  if (fLo > 0) return null;
  if (fLo === 0) return lo;
  if (fHi === 0) return hi;
  let side = 0;
  for (let iteration = 0; iteration < MAX_ROOT_ITERATIONS && hi - lo > ROOT_TOLERANCE_RAD; iteration++) {
    const x = Number.isFinite(fLo) ? (lo * fHi - hi * fLo) / (fHi - fLo) : 0.5 * (lo + hi);
    const mid = x > lo && x < hi ? x : 0.5 * (lo + hi);
    const f = trueAt(mid) - trueElevation;
    if (f === 0) return mid;
    if (f < 0) {
      lo = mid;
      fLo = f;
      if (side === -1) fHi *= 0.5; // Illinois: halve the stale end's value
      side = -1;
    } else {
      hi = mid;
      fHi = f;
      if (side === 1 && Number.isFinite(fLo)) fLo *= 0.5;
      side = 1;
    }
  }
  return 0.5 * (lo + hi);
}

/**
 * Lowest apparent elevation of the band of escaping rays that reaches the zenith, rad (an
 * exclusive limit): −arccos(c_below/f(h)) in ordinary air (the dip of the horizon), and
 * +arccos(c_above/f(h)) when air above the eye turns shallower rays back (see dip.ts).
 */
export function lowestEscapingElevation(profile: InvariantProfile, h: number): number {
  const gEye = profile.offset_m(h);
  const fEye = profile.earthRadius_m + gEye;
  const below = profile.minimum(0, h).offset_m;
  const above = profile.minimum(h, profile.table.top_m).offset_m;
  return above < gEye ? angleBelowEye(gEye - above, fEye) : -angleBelowEye(gEye - below, fEye);
}

/** Apparent angular diameter of the Sun and the Moon used by default, rad (0.53°; common practice, no source). */
export const BODY_DIAMETER_RAD = (0.53 * Math.PI) / 180;

/** A body on the sky: its true (airless) elevation and angular diameter. */
export interface Body {
  /** True elevation of the body's centre, rad (−π/2..π/2). */
  true_elevation_rad: number;
  /** Angular diameter, rad (0..π/2). Default BODY_DIAMETER_RAD. */
  angular_diameter_rad?: number;
}

/** How a body appears to the observer. Angles in rad. */
export interface BodyAppearance {
  true_elevation_rad: number;
  angular_diameter_rad: number;
  /** Apparent elevation of the upper limb; null when even it is hidden below the apparent horizon. */
  upper_limb_elevation_rad: number | null;
  /** Apparent elevation of the lower limb; null when it is hidden. */
  lower_limb_elevation_rad: number | null;
  /** Apparent vertical diameter / true diameter (below 1: flattened); null unless both limbs are seen. */
  flattening: number | null;
  /** True when at least the upper limb is seen above the apparent horizon. */
  above_horizon: boolean;
  /** Elevation of the apparent horizon for this observer (dip.ts), rad. */
  horizon_elevation_rad: number;
}

/**
 * Apparent limbs, vertical flattening and visibility of bodies (Sun, Moon) at given true
 * elevations, e.g. two bodies 180° apart, both seen when refraction and dip allow it.
 * Each limb is placed by apparentFromTrue_rad at true elevation ± diameter/2 (the vertical
 * diameter; parallax is the caller's: pass topocentric true elevations).
 * @param table tabulated medium n(z).
 * @param observerHeight_m observer's height, m (0..table top).
 * @param bodies true elevations (rad, −π/2..π/2) and angular diameters (rad, 0..π/2; default 0.53°).
 * @param earthRadius_m radius of the surface sphere, m (1e5..1e13).
 * @returns one appearance per body, in order. Limb elevations to about 1e-12 rad.
 * @throws InputRangeError naming the out-of-range field (bodies[i].true_elevation_rad, ...).
 */
export function bodyAppearance(
  table: IndexTable,
  observerHeight_m: number,
  bodies: readonly Body[],
  earthRadius_m: number,
): BodyAppearance[] {
  checkInputs(table, observerHeight_m, earthRadius_m);
  bodies.forEach((body, i) => {
    requireInRange(`bodies[${i}].true_elevation_rad`, body.true_elevation_rad, -Math.PI / 2, Math.PI / 2, 'rad');
    if (body.angular_diameter_rad !== undefined) {
      requireInRange(`bodies[${i}].angular_diameter_rad`, body.angular_diameter_rad, 0, Math.PI / 2, 'rad');
    }
  });
  const profile = new InvariantProfile(table, earthRadius_m);
  const horizonElevation = horizonOfProfile(profile, observerHeight_m).horizon_elevation_rad;
  const clampElevation = (x: number): number => Math.max(-Math.PI / 2, Math.min(Math.PI / 2, x));
  return bodies.map((body) => {
    const diameter = body.angular_diameter_rad ?? BODY_DIAMETER_RAD;
    const upper = apparentOfProfile(profile, observerHeight_m, clampElevation(body.true_elevation_rad + diameter / 2));
    const lower = apparentOfProfile(profile, observerHeight_m, clampElevation(body.true_elevation_rad - diameter / 2));
    return {
      true_elevation_rad: body.true_elevation_rad,
      angular_diameter_rad: diameter,
      upper_limb_elevation_rad: upper,
      lower_limb_elevation_rad: lower,
      flattening: upper !== null && lower !== null && diameter > 0 ? (upper - lower) / diameter : null,
      above_horizon: upper !== null && upper > horizonElevation,
      horizon_elevation_rad: horizonElevation,
    };
  });
}
