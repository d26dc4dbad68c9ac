/**
 * Independent check of the ray integrator (DESIGN.md §3 item 4): the central angle travelled by the
 * ray with Bouguer invariant c between two heights, by quadrature of
 *
 *   θ = ∫ c dr / (r · sqrt(n²r² − c²)).
 *
 * n²r² − c² is written as D·(D + 2c) with D = n r − c evaluated without cancellation
 * (invariant-excess.ts). At a turning point D = 0 and the integrand has an inverse
 * square-root singularity; the substitution z = z_t ± w² (z_t the turning height) makes it finite,
 * 2w / sqrt(D) → 2 / sqrt(D'(z_t)). A nearby turning point outside the interval (a ray that starts
 * almost horizontal) is treated the same way with z_t extrapolated. The interval is split at every
 * table node (n'' jumps there, dn/dz at kinks) and each piece integrated by adaptive Gauss–Kronrod.
 * Accuracy: relative 1e-11 or better (measured against exact straight lines and the perfect duct),
 * away from the duct threshold (D'(z_t) → 0), where the substitution loses its benefit. Reference: Born & Wolf, Principles of Optics, §3.2.2 (ray in a
 * spherically stratified medium); DESIGN.md §3.
 */
import { EARTH_RADIUS_M } from '../constants.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { integrateAdaptive } from './gauss-kronrod.js';
import { InvariantExcess } from './invariant-excess.js';

/** Relative accuracy asked of each piece of the quadrature. */
const PIECE_TOLERANCE = 1e-13;

/** Bisection steps to pin a turning height to double precision within one table cell. */
const TURNING_BISECTIONS = 200;

/**
 * Height of the first turning point (D = 0) met going from z in direction dir, searched up to
 * limit_m; null if D stays positive. The returned height has D ≥ 0 (the side the ray is on).
 */
function turningHeight(ray: InvariantExcess, table: IndexTable, z: number, dir: 1 | -1, limit_m: number): number | null {
  const nodes = table.z_m;
  let a = z;
  const inner: number[] = [];
  for (let i = 0; i < nodes.length; i++) if ((nodes[i] - z) * dir > 0 && (limit_m - nodes[i]) * dir > 0) inner.push(nodes[i]);
  if (dir < 0) inner.reverse();
  inner.push(limit_m);
  for (const b of inner) {
    if (ray.excess(b, dir < 0) <= 0) {
      let good = a;
      let bad = b;
      for (let k = 0; k < TURNING_BISECTIONS; k++) {
        const m = 0.5 * (good + bad);
        if (m === good || m === bad) break;
        if (ray.excess(m) > 0) good = m;
        else bad = m;
      }
      return good;
    }
    a = b;
  }
  return null;
}

/**
 * θ between heights lo < hi on one monotonic branch (D > 0 inside), rad. turning: which end is
 * the ray's turning point, where the caller has made D exactly 0 (InvariantExcess.setReference).
 * The substitution is anchored there and w starts at 0. Without a turning end, a turning point
 * just beyond an end (D small there) is extrapolated, D(end)/D'(end), and anchors it instead.
 */
function branchAngle(ray: InvariantExcess, table: IndexTable, lo: number, hi: number, turning: 'lo' | 'hi' | null): number {
  if (!(hi > lo)) return 0;
  // Anchor of the substitution: a turning point at (or just beyond) one end, if one is near.
  const dLo = ray.excess(lo);
  const slopeLo = ray.slope(lo);
  const gapLo = turning === 'lo' ? 0 : dLo >= 0 && slopeLo > 0 ? dLo / slopeLo : Infinity;
  const dHi = ray.excess(hi, true);
  const slopeHi = ray.slope(hi);
  const gapHi = turning === 'hi' ? 0 : dHi >= 0 && slopeHi < 0 ? dHi / -slopeHi : Infinity;
  const cuts = [lo];
  for (const z of table.z_m) if (z > lo && z < hi) cuts.push(z);
  cuts.push(hi);
  let sum = 0;
  if (turning === null && Math.min(gapLo, gapHi) >= hi - lo) {
    for (let i = 0; i + 1 < cuts.length; i++) sum += piece((z) => ray.integrand(z), cuts[i], cuts[i + 1]);
    return sum;
  }
  const fromLow = turning === 'lo' || (turning === null && gapLo <= gapHi);
  const anchor = fromLow ? lo - gapLo : hi + gapHi;
  const sign = fromLow ? 1 : -1;
  // Anchored on the reference point (a turning point or a horizontal start): offsets are exact.
  const exact = anchor === ray.referenceHeight_m;
  const f = exact
    ? (w: number): number => 2 * w * ray.integrandAtOffset(sign * w * w)
    : (w: number): number => 2 * w * ray.integrand(anchor + sign * w * w);
  const last = cuts.length - 1;
  for (let i = 0; i < last; i++) {
    // The turning end maps to w = 0 exactly.
    const w0 = fromLow && turning && i === 0 ? 0 : Math.sqrt(Math.abs(cuts[i] - anchor));
    const w1 = !fromLow && turning && i + 1 === last ? 0 : Math.sqrt(Math.abs(cuts[i + 1] - anchor));
    sum += piece(f, Math.min(w0, w1), Math.max(w0, w1));
  }
  return sum;
}

/** One piece by adaptive Gauss–Kronrod, to PIECE_TOLERANCE relative to a one-panel estimate. */
function piece(f: (x: number) => number, a: number, b: number): number {
  if (!(b > a)) return 0;
  const rough = Math.abs(integrateAdaptive(f, a, b, Infinity));
  return integrateAdaptive(f, a, b, rough * PIECE_TOLERANCE);
}

/** Options of quadratureRange. */
export interface QuadratureOptions {
  /** Radius of the surface sphere, m. Default 6 371 000. */
  earthRadius_m?: number;
}

/**
 * Ground range (R·θ, m) at which the ray leaving the observer at the given elevation first reaches
 * height_m, by quadrature of DESIGN.md §3 item 4. Follows the ray through at most one turning point
 * (a descending ray that turns up, or an ascending ray that turns down).
 *
 * @param table the medium; heights 0..table.top_m.
 * @param observerHeight_m 0 ≤ h ≤ table top, m.
 * @param elevation_rad apparent elevation at the observer, rad (any |α| < π/2: no step-size limits here).
 * @param height_m the height sought, 0..table top, m.
 * @returns range in m, or null if the ray meets the surface or the top first, or would need a
 *   second turning point. Kernel function: arguments are not validated.
 */
export function quadratureRange(table: IndexTable, observerHeight_m: number, elevation_rad: number, height_m: number, options: QuadratureOptions = {}): number | null {
  const R = options.earthRadius_m ?? EARTH_RADIUS_M;
  const ray = new InvariantExcess(table, R, observerHeight_m, elevation_rad);
  const z0 = observerHeight_m;
  if (height_m === z0) return 0;
  let dir: 1 | -1 = elevation_rad > 0 ? 1 : -1;
  if (elevation_rad === 0) {
    ray.excess(z0);
    dir = ray.slope(z0) >= 0 ? 1 : -1;
  }
  const boundary = dir > 0 ? table.top_m : 0;
  const turn = turningHeight(ray, table, z0, dir, boundary);
  if ((height_m - z0) * dir > 0) {
    if (turn !== null && (height_m - turn) * dir > 0) return null;
    // A horizontal start is itself a turning point.
    const startTurning = elevation_rad === 0 ? (dir > 0 ? 'lo' : 'hi') : null;
    return R * branchAngle(ray, table, Math.min(z0, height_m), Math.max(z0, height_m), startTurning);
  }
  if (turn === null) return null;
  const back = -dir as 1 | -1;
  const second = turningHeight(ray, table, turn, back, height_m);
  if (second !== null) return null;
  const end = dir < 0 ? 'lo' : 'hi';
  // The turning point as the exact root of D (a rounding-level Newton correction of the bisection)
  // and the reference of D from here on, so D near it is free of the table's rounding.
  const root = turn - ray.excess(turn) / ray.slope(turn);
  ray.setReference(root, 0);
  const first = branchAngle(ray, table, Math.min(z0, root), Math.max(z0, root), end);
  return R * (first + branchAngle(ray, table, Math.min(root, height_m), Math.max(root, height_m), end));
}
