/**
 * Straight-line sight geometry over a sphere (no refraction): the elevation at which a point at a
 * given range and height would be seen if light travelled in straight lines. Used to choose the
 * elevation window of the transfer curve and as the pure-geometry yardstick of magnification.
 */

/**
 * Elevation of the straight line from the observer to a point above the sphere.
 *
 * With the observer at radius R + h and the point at radius R + z, a central angle θ = D/R away,
 * the point lies (R + z) sin θ ahead and (R + z) cos θ − (R + h) above the observer's horizontal,
 * so the elevation is atan2((z − h) − 2 (R + z) sin²(θ/2), (R + z) sin θ) (the half-angle form
 * keeps precision when θ is small).
 * @param observerHeight_m observer height above the surface, m (≥ 0).
 * @param range_m surface range to the point, m (> 0, below π R).
 * @param height_m height of the point above the surface, m (≥ 0).
 * @param earthRadius_m radius of the surface sphere, m (> 0).
 * @returns elevation, rad (negative below the observer's horizontal). Exact (rounding only).
 * Reference: plane trigonometry in the great-circle plane (DESIGN.md §2 coordinates).
 */
export function geometricElevation_rad(observerHeight_m: number, range_m: number, height_m: number, earthRadius_m: number): number {
  const theta = range_m / earthRadius_m;
  const r = earthRadius_m + height_m;
  const half = Math.sin(0.5 * theta);
  return Math.atan2(height_m - observerHeight_m - 2 * r * half * half, r * Math.sin(theta));
}

/** Where a straight ray from the observer ends when followed toward a range (see straightRayEnd). */
export interface StraightRayEnd {
  /** 'target' (reached the range), 'surface' (met the sphere first) or 'escaped' (reached the top first). */
  fate: 'target' | 'surface' | 'escaped';
  /** Surface range where the ray ended, m. */
  endRange_m: number;
  /** Height where it ended, m (0 on the surface, the top when escaped). */
  endHeight_m: number;
  /** Local elevation of the ray there, rad (negative: descending). */
  endElevation_rad: number;
}

/**
 * The end of a straight ray (n ≡ 1) from the observer toward a surface range, exactly: the
 * closed form of what the ray tracer integrates in a medium without refraction.
 *
 * In the great-circle plane a straight line keeps r·cos ε = p = (R + h) cos α (Bouguer's invariant
 * with n = 1), and its local elevation grows with the central angle: ε = α + s/R at surface range
 * s. So the height at range s is z = p / cos(α + s/R) − R, written without cancellation as
 * (h cos α + 2R sin(α + θ/2) sin(θ/2)) / cos(α + θ) with θ = s/R. A descending ray (α < 0) meets
 * the sphere where R cos ε = p, if p ≤ R, at ε = −2 asin(√((R − p)/(2R))); any ray meets the top
 * (radius R + top) on its rising side at ε = +2 asin(√((R + top − p)/(2(R + top)))).
 * @param observerHeight_m observer height, m (0 ≤ h < top_m).
 * @param elevation_rad apparent elevation, rad (|α| < π/2).
 * @param range_m surface range at which the ray ends as 'target', m (> 0, below π R / 2).
 * @param earthRadius_m radius of the sphere, m (> 0).
 * @param top_m height at which the ray ends as 'escaped', m (> h).
 * @returns fate and end point. Exact to rounding (about 1e-9 m of height at 6.4e6 m radius).
 * Reference: plane trigonometry in the great-circle plane; DESIGN.md §3 (invariant, ray equations
 * dα/ds = 1/R for n ≡ 1).
 */
export function straightRayEnd(observerHeight_m: number, elevation_rad: number, range_m: number, earthRadius_m: number, top_m: number): StraightRayEnd {
  const R = earthRadius_m;
  const h = observerHeight_m;
  const a = elevation_rad;
  const sinHalfA = Math.sin(0.5 * a);
  // R − p and (R + top) − p, p = (R + h) cos α, without cancellation.
  const belowSurface = 2 * (R + h) * sinHalfA * sinHalfA - h;
  if (a < 0 && belowSurface >= 0) {
    const hit = -2 * Math.asin(Math.sqrt(belowSurface / (2 * R)));
    const range = R * (hit - a);
    if (range <= range_m) return { fate: 'surface', endRange_m: range, endHeight_m: 0, endElevation_rad: hit };
  }
  const rTop = R + top_m;
  const belowTop = top_m - h + 2 * (R + h) * sinHalfA * sinHalfA;
  const exit = 2 * Math.asin(Math.sqrt(belowTop / (2 * rTop)));
  const exitRange = R * (exit - a);
  if (exitRange < range_m) return { fate: 'escaped', endRange_m: exitRange, endHeight_m: top_m, endElevation_rad: exit };
  const theta = range_m / R;
  const end = a + theta;
  const height = (h * Math.cos(a) + 2 * R * Math.sin(a + 0.5 * theta) * Math.sin(0.5 * theta)) / Math.cos(end);
  return { fate: 'target', endRange_m: range_m, endHeight_m: height, endElevation_rad: end };
}

/**
 * The sea horizon with straight lines of sight (n ≡ 1): dip = arccos(R/(R + h)) and the horizon
 * distance along the surface R·dip (DESIGN.md §3 item 2; exact spherical geometry).
 * @param observerHeight_m eye height above the surface, m (≥ 0).
 * @param earthRadius_m Earth radius, m.
 * @returns dip_rad (positive: below the horizontal) and horizon_distance_m.
 */
export function geometricHorizon(observerHeight_m: number, earthRadius_m: number): { dip_rad: number; horizon_distance_m: number } {
  const dip_rad = Math.acos(earthRadius_m / (earthRadius_m + observerHeight_m));
  return { dip_rad, horizon_distance_m: earthRadius_m * dip_rad };
}
