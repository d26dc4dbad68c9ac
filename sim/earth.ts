/**
 * Earth radius of curvature for a sphere that best matches the WGS 84 ellipsoid along one azimuth.
 */

/** WGS 84 semi-major axis, m. NIMA TR8350.2 (2000), Table 3.1. */
export const WGS84_A_M = 6_378_137;
/** WGS 84 flattening (dimensionless). NIMA TR8350.2 (2000), Table 3.1: 1/298.257223563. */
export const WGS84_F = 1 / 298.257223563;

/**
 * Radius of curvature of the WGS 84 ellipsoid in the normal section at azimuth A (Euler's theorem):
 * 1/R_A = cos²A / M + sin²A / N, with the meridional radius M = a(1 − e²)/(1 − e² sin²φ)^{3/2} and
 * the prime-vertical radius N = a/(1 − e² sin²φ)^{1/2}.
 * Source: e.g. Torge & Müller, Geodesy (4th ed., 2012), §4.1.2, eqs. 4.15, 4.16, 4.21.
 * @param latitude_rad geodetic latitude, rad (−π/2..π/2).
 * @param azimuth_rad azimuth of the line of sight from north, rad (any value).
 * @returns radius of curvature, m (6 335 439 m at the equator north-south .. 6 399 594 m at the poles).
 */
export function radiusOfCurvature_m(latitude_rad: number, azimuth_rad: number): number {
  const e2 = WGS84_F * (2 - WGS84_F);
  const s = Math.sin(latitude_rad);
  const w2 = 1 - e2 * s * s;
  const meridional = (WGS84_A_M * (1 - e2)) / (w2 * Math.sqrt(w2));
  const primeVertical = WGS84_A_M / Math.sqrt(w2);
  const c = Math.cos(azimuth_rad);
  const sn = Math.sin(azimuth_rad);
  return 1 / ((c * c) / meridional + (sn * sn) / primeVertical);
}
