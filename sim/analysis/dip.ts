/**
 * The apparent sea horizon from Bouguer's invariant (DESIGN.md §3 item 3): its elevation, the dip,
 * the distance to it, whether it is a false horizon, and the elevations whose rays are trapped.
 *
 * Construction. A ray from the observer at height h with elevation α has c = f(h) cos α, where
 * f(z) = n(z)·(R + z), and can exist only where f ≥ c. Let c_below = min f over [0, h] and
 * c_above = min f over [h, top] (both found exactly: InvariantProfile.minimum).
 * - A downward ray reaches the sea iff c ≤ c_below (DESIGN.md §3.3).
 * - An upward ray turns back down iff c > c_above, and then reaches the sea iff c ≤ c_below.
 * So the sea fills the view below −arccos(c_below/f(h)) and, when c_above < c_below, also the band
 * from +arccos(c_below/f(h)) up to +arccos(c_above/f(h)). The apparent horizon (the top of the
 * visible sea) is therefore at
 *   −arccos(c_below / f(h))   when c_above ≥ c_below (DESIGN.md §3.3 exactly: cos dip = c* / f(h)),
 *   +arccos(c_above / f(h))   when c_above < c_below (air above the eye traps rays that the air
 *                             below would let reach the sea: the sea is seen above the horizontal).
 * The limiting ray is horizontal at the height of that minimum (the grazing height). It grazes the
 * sea (a true horizon) when that height is 0; otherwise the horizon is false: it is the top of a
 * duct, not the sea's edge. Rays with c > max(c_below, c_above) are trapped between two heights
 * where f = c (in a stratified medium they neither meet the sea nor escape).
 */
import { requireInRange } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { ductWithTop, findDucts, type Duct } from './ducts.js';
import { InvariantProfile } from './invariant.js';
import { integrateRaySegment } from './ray-quadrature.js';

/** Allowed Earth radius at the public entry points, m (≥ 1e12 approximates flat geometry). */
export const EARTH_RADIUS_RANGE_M = { min: 1e5, max: 1e13 } as const;

/**
 * A limiting ray whose grazing point has |df/dz| below this (dimensionless; f′ ≈ 0.83 in normal
 * air) touches a smooth minimum of n·r and reaches it only asymptotically: no finite distance.
 */
const SMOOTH_MINIMUM_SLOPE = 1e-9;

/** Elevation band, rad. */
export interface ElevationBand {
  from_elevation_rad: number;
  to_elevation_rad: number;
}

/** The apparent horizon seen from one height. Angles in rad, heights and distances in m. */
export interface HorizonFinding {
  observer_height_m: number;
  /** Elevation of the top of the visible sea, rad; negative below the horizontal. */
  horizon_elevation_rad: number;
  /** Dip of the apparent horizon below the horizontal, rad (= −horizon_elevation_rad). */
  dip_rad: number;
  /**
   * DESIGN.md §3.3's dip, arccos(c_below/f(h)) ≥ 0: downward rays steeper than this meet the sea.
   * Equals dip_rad unless air above the eye turns shallower rays back down to the sea.
   */
  invariant_dip_rad: number;
  /**
   * Surface range from the observer to where the limiting ray is horizontal: the sea's edge for a
   * true horizon, the grazing point on the duct for a false one; null when that point is reached
   * only asymptotically (a smooth minimum of n·r).
   */
  horizon_distance_m: number | null;
  /** True when the limiting ray grazes a duct, not the sea surface. */
  false_horizon: boolean;
  /** Height where the limiting ray is horizontal, m (0 for a true horizon). */
  grazing_height_m: number;
  /** Invariant of the limiting ray minus R, c* − R, m. */
  limiting_invariant_offset_m: number;
  /** The duct whose top the limiting ray grazes (false horizon), else null. */
  duct: Duct | null;
  /** Apparent elevations whose rays are trapped between two heights (observer inside a duct), or null. */
  trapped: ElevationBand | null;
  /** Every duct of the medium (tops at local minima of n·r), lowest first. */
  ducts: Duct[];
  warnings: string[];
}

/**
 * Apparent horizon, dip, horizon distance, false horizon and trapped elevations for an observer.
 * @param table tabulated medium n(z) (0..top).
 * @param observerHeight_m observer's eye height above the surface, m (0..table top).
 * @param earthRadius_m radius of the surface sphere, m (1e5..1e13).
 * @returns the finding (see HorizonFinding). Angles exact for the tabulated medium to rounding
 *   (about 1e-15 rad); the distance by quadrature to about 1e-12 relative. For n ≡ 1 the dip is
 *   arccos(R/(R + h)) and the distance R·arccos(R/(R + h)) (DESIGN.md §3 item 2).
 * @throws InputRangeError naming observerHeight_m or earthRadius_m when out of range.
 * Reference: DESIGN.md §3 items 3–4 (Bouguer's invariant); REFERENCES.md §5.3 (exact dip).
 */
export function horizon(table: IndexTable, observerHeight_m: number, earthRadius_m: number): HorizonFinding {
  requireInRange('observerHeight_m', observerHeight_m, 0, table.top_m, 'm');
  requireInRange('earthRadius_m', earthRadius_m, EARTH_RADIUS_RANGE_M.min, EARTH_RADIUS_RANGE_M.max, 'm');
  return horizonOfProfile(new InvariantProfile(table, earthRadius_m), observerHeight_m);
}

/** Kernel of horizon(): no input checks; reuses a prepared profile. */
export function horizonOfProfile(profile: InvariantProfile, h: number): HorizonFinding {
  const R = profile.earthRadius_m;
  const warnings: string[] = [];
  const gEye = profile.offset_m(h);
  const below = profile.minimum(0, h);
  const above = profile.minimum(h, profile.table.top_m);
  const dipBelow = angleBelowEye(gEye - below.offset_m, R + gEye);
  const riseAbove = angleBelowEye(gEye - above.offset_m, R + gEye);
  const upward = above.offset_m < below.offset_m;
  const limit = upward ? above : below;
  const elevation = upward ? riseAbove : -dipBelow;

  const graze = limit.height_m;
  let distance: number | null = 0;
  if (graze !== h) {
    const side = graze < h ? 1 : -1;
    if (Math.abs(profile.slope(graze, side)) < SMOOTH_MINIMUM_SLOPE) {
      distance = null;
      warnings.push(
        `the limiting ray approaches a smooth minimum of n·r at ${graze.toFixed(3)} m only asymptotically: no finite horizon distance`,
      );
    } else {
      const [lo, hi] = graze < h ? [graze, h] : [h, graze];
      distance = R * integrateRaySegment(profile, limit.offset_m, lo, hi, graze, 0).centralAngle_rad;
    }
  }

  const falseHorizon = graze > 0;
  const trappedHalfWidth = Math.min(dipBelow, riseAbove);
  return {
    observer_height_m: h,
    horizon_elevation_rad: elevation,
    dip_rad: -elevation,
    invariant_dip_rad: dipBelow,
    horizon_distance_m: distance,
    false_horizon: falseHorizon,
    grazing_height_m: graze,
    limiting_invariant_offset_m: limit.offset_m,
    duct: falseHorizon ? ductWithTop(profile, graze) : null,
    trapped: trappedHalfWidth > 0 ? { from_elevation_rad: -trappedHalfWidth, to_elevation_rad: trappedHalfWidth } : null,
    ducts: findDucts(profile),
    warnings,
  };
}

/**
 * arccos(c/f_eye) from the gap f_eye − c ≥ 0, without cancellation:
 * 1 − cos a = gap/f_eye, so a = 2·asin(√(gap/(2 f_eye))).
 */
export function angleBelowEye(gap_m: number, fEye_m: number): number {
  return gap_m > 0 ? 2 * Math.asin(Math.sqrt(gap_m / (2 * fEye_m))) : 0;
}
