/**
 * Quadrature of a ray's central angle and bending from Bouguer's invariant, independent of the
 * ray integrator (DESIGN.md §3 item 4).
 *
 * For a ray with invariant c = n r cos α in a spherically stratified medium, with f = n r:
 *   dθ/dr = c / (r · √(f² − c²))              (central angle; range s = R θ),
 *   dτ/dr = −c · (dn/dr) / (n · √(f² − c²))   (bending: total turning of the ray's direction).
 * Derivation: the ray's elevation α above the local horizontal obeys tan α = dr/(r dθ), so
 * dθ = cot α dr / r, and cos α = c/f gives cot α = c/√(f² − c²). The direction of the ray in a
 * fixed frame turns by dτ = dθ − dα (a straight line has dα = dθ); differentiating c = f cos α
 * gives dα = (f′/f) cot α dr with f′ = n + r n′, so dτ = cot α (1/r − f′/f) dr = −(n′/n) cot α dr.
 * The astronomical refraction of a ray leaving the atmosphere is its total bending τ: the true
 * (airless) elevation of its source is α_obs − τ. The refraction integral in this form: Smart,
 * Textbook on Spherical Astronomy (6th ed., 1977), ch. III; Auer & Standish (2000), Astron. J. 119,
 * 2472 (who integrate over the zenith angle instead) — both cited from memory, equation numbers
 * not checked.
 *
 * Both integrands have an inverse-square-root singularity at a turning point r_t, where f = c.
 * The substitution z = z_t ± u² (u = √|z − z_t|) turns it into a smooth integrand,
 * 2u/√(f² − c²) → 2/√(2c·|f′(z_t)|) as u → 0; the same substitution about a virtual turning point
 * (below the surface, or below the observer) removes the near-singularity of near-horizontal rays.
 * Each table cell (n is a cubic there, kinks only at nodes) is integrated with adaptive
 * Gauss–Kronrod 7–15 in that variable.
 */
import { InvariantProfile } from './invariant.js';

/** Relative tolerance of one Gauss–Kronrod panel (the 7- and 15-point estimates must agree to this). */
const PANEL_RELATIVE_TOLERANCE = 1e-12;
/** Absolute tolerance of one panel, rad (thousands of panels still sum to below 1e-13 rad). */
const PANEL_ABSOLUTE_TOLERANCE_RAD = 1e-17;
/** Deepest bisection of a panel. */
const MAX_PANEL_DEPTH = 30;

// Gauss–Kronrod 7–15 abscissae and weights on [−1, 1] (Piessens et al., QUADPACK, 1983, routine QK15).
const XGK = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851, 0.864864423359769072789712788640926,
  0.741531185599394439863864773280788, 0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0,
];
const WGK = [
  0.02293532201052922496373200805897, 0.063092092629978553290700663189204, 0.104790010322250183839876322541518,
  0.140653259715525918745189590510238, 0.16900472663926790282658342659855, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
];
/** Gauss 7-point weights for XGK[1], XGK[3], XGK[5], XGK[7]. */
const WG = [0.129484966168869693270611432679082, 0.27970539148927666790146777142378, 0.381830050505118944950369775488975, 0.417959183673469387755102040816327];

/** Central angle and bending accumulated along a ray segment. */
export interface RaySegmentIntegrals {
  /** Central angle θ swept, rad (range along the surface = R·θ). */
  centralAngle_rad: number;
  /** Bending τ, rad: positive when the ray curves toward the surface (n decreasing upward). */
  bending_rad: number;
}

/**
 * Integrates θ and τ over the heights [from_m, to_m] of a ray with invariant c = R + offset_m that
 * is monotone in height there (one leg; a ray that turns is two legs).
 *
 * f − c, the quantity under the square root, is carried from the end of the segment nearest the
 * turning point (the anchor) by exact cell-by-cell rises of f (InvariantProfile.cellRise), so it
 * keeps full relative precision right down to the turning point.
 * @param profile invariant profile of the medium (table and Earth radius).
 * @param offset_m c − R, m (precise form of the invariant: see InvariantProfile).
 * @param from_m lower height, m (0 ≤ from_m ≤ to_m ≤ table top).
 * @param to_m upper height, m.
 * @param turn_m height of the real or virtual turning point (where f = c) nearest the segment:
 *   at or below from_m, or at or above to_m; null for none (steep rays).
 * @param anchorGap_m f − c at the anchor (to_m when turn_m ≥ to_m, else from_m), m: 0 at a real
 *   turning point, 2 f(h) sin²(α/2) at an observer. Default: computed from the table, which loses
 *   about 1e-13 m (fine for steep rays only).
 * @returns θ and τ, rad. Accuracy about 1e-12 relative; a turning point where f′ = 0 (the limiting
 *   ray of a perfect duct) makes both integrals diverge (callers exclude that case).
 * Reference: the integrals above (module comment); the √ substitution is the usual one for an
 * inverse-square-root endpoint singularity (as in DESIGN.md §3 item 4).
 */
export function integrateRaySegment(
  profile: InvariantProfile,
  offset_m: number,
  from_m: number,
  to_m: number,
  turn_m: number | null,
  anchorGap_m?: number,
): RaySegmentIntegrals {
  const R = profile.earthRadius_m;
  const c = R + offset_m;
  const z = profile.table.z_m;
  const sigma = turn_m === null ? 0 : turn_m <= from_m ? 1 : -1;
  const zs = turn_m ?? 0;
  const anchor = sigma < 0 ? to_m : from_m;
  const gap0 = anchorGap_m ?? profile.offset_m(anchor) - offset_m;
  const exactAnchor = turn_m !== null && zs === anchor; // then z − anchor = σu² exactly
  const sample = new Float64Array(2);
  const out = new Float64Array(2);
  const result = { centralAngle_rad: 0, bending_rad: 0 };

  let cell = 0;
  let near = anchor; // edge of the current piece nearest the anchor
  let gapNear = gap0; // f − c there
  // Integrand in the working variable x (x = z, or x = u with z = zs + σu²), both components.
  const integrand = (x: number, into: Float64Array): void => {
    const height = sigma === 0 ? x : zs + sigma * x * x;
    const dz = exactAnchor && near === anchor ? sigma * x * x : height - near;
    profile.sampleCell(cell, height, sample);
    const gap = gapNear + profile.cellRise(cell, near, dz); // f − c
    const root = Math.sqrt(gap * (2 * c + gap)); // √(f² − c²)
    const w = (sigma === 0 ? c : 2 * x * c) / root;
    into[0] = w / (R + height);
    into[1] = (-w * sample[1]) / (1 + sample[0]);
  };

  const first = profile.cellOf(from_m);
  const last = profile.cellOf(to_m);
  const step = sigma < 0 ? -1 : 1;
  for (let i = sigma < 0 ? last : first; i >= first && i <= last; i += step) {
    const lo = Math.max(from_m, z[i]);
    const hi = Math.min(to_m, z[i + 1]);
    if (!(hi > lo)) continue;
    cell = i;
    const far = sigma < 0 ? lo : hi;
    let a = lo;
    let b = hi;
    if (sigma !== 0) {
      a = Math.sqrt(Math.abs(lo - zs));
      b = Math.sqrt(Math.abs(hi - zs));
      if (a > b) [a, b] = [b, a];
    }
    adaptive(integrand, a, b, 0, out);
    result.centralAngle_rad += out[0];
    result.bending_rad += out[1];
    gapNear += profile.cellRise(i, near, far - near);
    near = far;
  }
  return result;
}

/** Adaptive Gauss–Kronrod 7–15 of a two-component integrand over [a, b]; adds into out (cleared first). */
function adaptive(f: (x: number, into: Float64Array) => void, a: number, b: number, depth: number, out: Float64Array): void {
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  const v = new Float64Array(2);
  let k0 = 0;
  let k1 = 0;
  let g0 = 0;
  let g1 = 0;
  for (let j = 0; j < 8; j++) {
    const dx = half * XGK[j];
    f(mid - dx, v);
    let s0 = v[0];
    let s1 = v[1];
    if (j < 7) {
      f(mid + dx, v);
      s0 += v[0];
      s1 += v[1];
    }
    k0 += WGK[j] * s0;
    k1 += WGK[j] * s1;
    if (j % 2 === 1) {
      g0 += WG[(j - 1) / 2] * s0;
      g1 += WG[(j - 1) / 2] * s1;
    }
  }
  k0 *= half;
  k1 *= half;
  g0 *= half;
  g1 *= half;
  const ok0 = Math.abs(k0 - g0) <= Math.max(PANEL_RELATIVE_TOLERANCE * Math.abs(k0), PANEL_ABSOLUTE_TOLERANCE_RAD);
  const ok1 = Math.abs(k1 - g1) <= Math.max(PANEL_RELATIVE_TOLERANCE * Math.abs(k1), PANEL_ABSOLUTE_TOLERANCE_RAD);
  if ((ok0 && ok1) || depth >= MAX_PANEL_DEPTH) {
    out[0] = k0;
    out[1] = k1;
    return;
  }
  const left = new Float64Array(2);
  adaptive(f, a, mid, depth + 1, left);
  adaptive(f, mid, b, depth + 1, out);
  out[0] += left[0];
  out[1] += left[1];
}
