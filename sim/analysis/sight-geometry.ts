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
