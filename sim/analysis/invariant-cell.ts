/**
 * The per-cell algebra of Bouguer's invariant g(z) = n(z)·(R + z) − R on a tabulated medium:
 * inside cell i, n − 1 is the cubic p(t) = a0 + a1 t + a2 t² + a3 t³ (t = (z − z_i)/H, the same
 * cubic Hermite as evaluateIndex), so g(t) = z_i + tH + p(t)(R + z_i + tH) is a quartic, g′ a cubic
 * and g″ a quadratic. Solving the quadratic splits a cell into pieces on which g′ is monotone, so
 * every extremum of g is bracketed and bisected to machine precision (see invariant.ts).
 */
import type { IndexTable } from '../refractivity/index-table.js';

/** Bisection steps on t in [0, 1]: 2^-64 is below one ulp of any t, so the last steps are no-ops. */
const BISECTION_STEPS = 64;

/** Cell-by-cell evaluation of g and its derivatives on one table and Earth radius. */
export class InvariantCells {
  readonly table: IndexTable;
  readonly earthRadius_m: number;
  /** Number of table cells. */
  readonly cells: number;
  /** Monomial coefficients of the loaded cell (see load). */
  protected z0 = 0;
  protected H = 1;
  protected Rz = 0;
  protected a0 = 0;
  protected a1 = 0;
  protected a2 = 0;
  protected a3 = 0;
  /** Index of the loaded cell, −1 for none. */
  protected loaded = -1;

  /**
   * @param table the medium (read only).
   * @param earthRadius_m radius of the surface sphere, m (> 0).
   */
  constructor(table: IndexTable, earthRadius_m: number) {
    this.table = table;
    this.earthRadius_m = earthRadius_m;
    this.cells = table.z_m.length - 1;
  }

  /**
   * Samples cell i at height z into out: out[0] = n − 1, out[1] = dn/dz (1/m). The same cubic as
   * evaluateIndex.
   */
  sampleCell(i: number, z_m: number, out: Float64Array): void {
    this.load(i);
    const t = (z_m - this.z0) / this.H;
    out[0] = this.a0 + t * (this.a1 + t * (this.a2 + t * this.a3));
    out[1] = (this.a1 + t * (2 * this.a2 + 3 * t * this.a3)) / this.H;
  }

  /**
   * Rise of g within cell i from height z_a to z_a + dz, m, without cancellation:
   * g(t_b) − g(t_a) = dz·[1 + p(t_a) + (q/H)·(R + z_b)], q = (p(t_b) − p(t_a))/(t_b − t_a)
   * = a1 + a2 (t_a + t_b) + a3 (t_a² + t_a t_b + t_b²). Relative accuracy ~1e-15 even for
   * |dz| of 1e-12 m, where subtracting two values of g (≈ 1.8 km) would keep no digit.
   */
  cellRise(i: number, z_a: number, dz_m: number): number {
    this.load(i);
    const ta = (z_a - this.z0) / this.H;
    const tb = ta + dz_m / this.H;
    const pa = this.a0 + ta * (this.a1 + ta * (this.a2 + ta * this.a3));
    const q = this.a1 + this.a2 * (ta + tb) + this.a3 * (ta * ta + ta * tb + tb * tb);
    return dz_m * (1 + pa + (q / this.H) * (this.Rz + tb * this.H));
  }

  /** Loads the monomial form p(t) = a0 + a1 t + a2 t² + a3 t³ of cell i (same cubic as evaluateIndex). */
  protected load(i: number): void {
    if (this.loaded === i) return;
    const table = this.table;
    const z0 = table.z_m[i];
    const H = table.z_m[i + 1] - z0;
    const y0 = table.nm1[i];
    const y1 = table.nm1[i + 1];
    const m0 = table.dndz_bottom[i] * H;
    const m1 = table.dndz_top[i] * H;
    this.z0 = z0;
    this.H = H;
    this.Rz = this.earthRadius_m + z0;
    this.a0 = y0;
    this.a1 = m0;
    this.a2 = 3 * (y1 - y0) - 2 * m0 - m1;
    this.a3 = 2 * (y0 - y1) + m0 + m1;
    this.loaded = i;
  }

  /** g at cell coordinate t, m. */
  protected cellOffset(i: number, t: number): number {
    this.load(i);
    // At t = 1 use the node value itself, so a node evaluates identically from both of its cells.
    const p = t === 1 ? this.table.nm1[i + 1] : this.a0 + t * (this.a1 + t * (this.a2 + t * this.a3));
    const dz = t * this.H;
    return this.z0 + dz + p * (this.Rz + dz);
  }

  /** dg/dt at t (per unit t, i.e. H·dg/dz). */
  protected cellSlope(i: number, t: number): number {
    this.load(i);
    const p = this.a0 + t * (this.a1 + t * (this.a2 + t * this.a3));
    const dp = this.a1 + t * (2 * this.a2 + 3 * t * this.a3);
    return this.H * (1 + p) + dp * (this.Rz + t * this.H);
  }

  /** d²g/dt² at t. */
  protected cellCurvature(i: number, t: number): number {
    this.load(i);
    const dp = this.a1 + t * (2 * this.a2 + 3 * t * this.a3);
    const d2p = 2 * this.a2 + 6 * t * this.a3;
    return 2 * this.H * dp + d2p * (this.Rz + t * this.H);
  }

  /**
   * Roots of g′ strictly inside (tLo, tHi) of cell i, increasing. g″ is the quadratic
   * A t² + B t + C with A = 12 a3 H, B = 6 (a2 H + a3 Rz), C = 2 (a1 H + a2 Rz); its roots split
   * the interval into pieces on which g′ is monotone, each bisected where g′ changes sign.
   */
  protected criticalPoints(i: number, tLo: number, tHi: number): number[] {
    this.load(i);
    const A = 12 * this.a3 * this.H;
    const B = 6 * (this.a2 * this.H + this.a3 * this.Rz);
    const C = 2 * (this.a1 * this.H + this.a2 * this.Rz);
    const breaks = [tLo];
    for (const t of quadraticRoots(A, B, C)) if (t > tLo && t < tHi) breaks.push(t);
    breaks.push(tHi);
    const roots: number[] = [];
    for (let k = 0; k < breaks.length - 1; k++) {
      let a = breaks[k];
      let b = breaks[k + 1];
      let fa = this.cellSlope(i, a);
      const fb = this.cellSlope(i, b);
      if (fa === 0 || fb === 0 || fa > 0 === fb > 0) continue;
      for (let step = 0; step < BISECTION_STEPS; step++) {
        const m = 0.5 * (a + b);
        if (m <= a || m >= b) break;
        const fm = this.cellSlope(i, m);
        if (fm > 0 === fa > 0) {
          a = m;
          fa = fm;
        } else b = m;
      }
      roots.push(0.5 * (a + b));
    }
    return roots;
  }

  /** t in [ta, tb] where g = offset, g monotone on the piece and offset between its end values. */
  protected solve(i: number, offset_m: number, ta: number, tb: number): number {
    let a = ta;
    let b = tb;
    const aBelow = this.cellOffset(i, a) < offset_m;
    for (let step = 0; step < BISECTION_STEPS; step++) {
      const m = 0.5 * (a + b);
      if (m <= a || m >= b) break;
      if (this.cellOffset(i, m) < offset_m === aBelow) a = m;
      else b = m;
    }
    return 0.5 * (a + b);
  }
}

/** Real roots of A t² + B t + C = 0 (numerically stable form; linear when A = 0). */
function quadraticRoots(A: number, B: number, C: number): number[] {
  if (A === 0) return B === 0 ? [] : [-C / B];
  const disc = B * B - 4 * A * C;
  if (disc < 0) return [];
  const q = -0.5 * (B + (B >= 0 ? 1 : -1) * Math.sqrt(disc));
  const roots = [q / A];
  if (q !== 0) roots.push(C / q);
  return roots.sort((x, y) => x - y);
}
