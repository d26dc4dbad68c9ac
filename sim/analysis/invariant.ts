/**
 * Bouguer's invariant profile f(z) = n(z)·(R + z) of a tabulated medium, and the exact searches on
 * it that the horizon, duct and refraction findings need (DESIGN.md §3 items 3–4).
 *
 * f is handled as the offset g(z) = f(z) − R (metres), which keeps full precision: f ≈ 6.4e6 m
 * but the differences that matter are millimetres. Inside a table cell n − 1 is the cell's cubic
 * Hermite polynomial p(t), t = (z − z_i)/H, so g(t) = z_i + tH + p(t)·(R + z_i + tH) is a quartic;
 * its derivative is a cubic whose own derivative is a quadratic. Solving that quadratic splits a
 * cell into pieces where g′ is monotone, so every root of g′ (every extremum of g) is bracketed
 * and found by bisection to machine precision: the extrema are exact for the tabulated medium.
 *
 * Below 0 the table extrapolates n linearly and above its top holds n constant (index-table.ts);
 * g follows the same rules.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { InvariantCells } from './invariant-cell.js';

/** A point of the invariant profile: height and offset g = n·(R + z) − R. */
export interface InvariantPoint {
  /** Height, m. */
  height_m: number;
  /** g = n(z)·(R + z) − R, m. */
  offset_m: number;
}

/**
 * The invariant profile g(z) = n(z)·(R + z) − R of one table over one Earth radius.
 * Precomputes each cell's minimum so that searches skip whole cells.
 */
export class InvariantProfile extends InvariantCells {
  /** Minimum of g over each cell, m. */
  private readonly cellMin: Float64Array;

  /**
   * @param table the medium (read only).
   * @param earthRadius_m radius of the surface sphere, m (> 0).
   */
  constructor(table: IndexTable, earthRadius_m: number) {
    super(table, earthRadius_m);
    this.cellMin = new Float64Array(this.cells);
    for (let i = 0; i < this.cells; i++) {
      let m = Math.min(this.cellOffset(i, 0), this.cellOffset(i, 1));
      for (const t of this.criticalPoints(i, 0, 1)) m = Math.min(m, this.cellOffset(i, t));
      this.cellMin[i] = m;
    }
  }

  /** Offset g(z) = n(z)·(R + z) − R at any height, m (table rules below 0 and above the top). */
  offset_m(z_m: number): number {
    const table = this.table;
    if (z_m <= 0) {
      const nm1 = table.nm1[0] + table.dndz_bottom[0] * z_m;
      return z_m + nm1 * (this.earthRadius_m + z_m);
    }
    if (z_m >= table.top_m) return z_m + table.nm1[this.cells] * (this.earthRadius_m + z_m);
    const i = this.cellOf(z_m);
    return this.cellOffset(i, (z_m - table.z_m[i]) / (table.z_m[i + 1] - table.z_m[i]));
  }

  /**
   * dg/dz = n + (R + z)·dn/dz at z, dimensionless; one-sided on a node: from above (side +1) or
   * below (side −1). Zero where a horizontal ray has the Earth's curvature (DESIGN.md §3).
   */
  slope(z_m: number, side: -1 | 1): number {
    const table = this.table;
    const z = table.z_m;
    if (z_m < 0 || (z_m === 0 && side < 0)) {
      const d = table.dndz_bottom[0];
      return 1 + table.nm1[0] + d * z_m + d * (this.earthRadius_m + z_m);
    }
    if (z_m > table.top_m || (z_m === table.top_m && side > 0)) return 1 + table.nm1[this.cells];
    let i = this.cellOf(z_m);
    if (side < 0 && i > 0 && z_m === z[i]) i -= 1;
    if (side > 0 && z_m === z[i + 1] && i + 1 < this.cells) i += 1;
    const t = (z_m - z[i]) / (z[i + 1] - z[i]);
    return this.cellSlope(i, t) / this.H;
  }

  /**
   * Minimum of g over [from_m, to_m] (within the table, 0 ≤ from ≤ to ≤ top), exact for the
   * tabulated cubic: endpoints, nodes and every interior root of g′ are compared.
   * On ties the lower height is returned.
   */
  minimum(from_m: number, to_m: number): InvariantPoint {
    let best: InvariantPoint = { height_m: from_m, offset_m: this.offset_m(from_m) };
    const consider = (z: number, g: number): void => {
      if (g < best.offset_m) best = { height_m: z, offset_m: g };
    };
    const z = this.table.z_m;
    const first = this.cellOf(from_m);
    const last = this.cellOf(to_m);
    for (let i = first; i <= last; i++) {
      const lo = Math.max(from_m, z[i]);
      const hi = Math.min(to_m, z[i + 1]);
      if (!(hi >= lo)) continue;
      if (i !== first && i !== last && this.cellMin[i] >= best.offset_m) continue;
      const H = z[i + 1] - z[i];
      const tLo = (lo - z[i]) / H;
      const tHi = (hi - z[i]) / H;
      for (const t of this.criticalPoints(i, tLo, tHi)) consider(z[i] + t * H, this.cellOffset(i, t));
      consider(hi, this.cellOffset(i, tHi));
    }
    return best;
  }

  /**
   * Heights of the interior extrema of g in [from_m, to_m]: roots of g′ inside cells and nodes where
   * the one-sided slopes have opposite signs. Sorted; each with its kind.
   */
  extrema(from_m: number, to_m: number): { height_m: number; kind: 'min' | 'max' }[] {
    const out: { height_m: number; kind: 'min' | 'max' }[] = [];
    const z = this.table.z_m;
    const first = this.cellOf(from_m);
    const last = this.cellOf(to_m);
    for (let i = first; i <= last; i++) {
      const H = z[i + 1] - z[i];
      const tLo = Math.max(0, (from_m - z[i]) / H);
      const tHi = Math.min(1, (to_m - z[i]) / H);
      if (!(tHi > tLo)) continue;
      if (i > first && z[i] > from_m) {
        const below = this.slope(z[i], -1);
        const above = this.slope(z[i], 1);
        if (below < 0 && above > 0) out.push({ height_m: z[i], kind: 'min' });
        if (below > 0 && above < 0) out.push({ height_m: z[i], kind: 'max' });
      }
      for (const t of this.criticalPoints(i, tLo, tHi)) {
        const curvature = this.cellCurvature(i, t);
        if (curvature > 0) out.push({ height_m: z[i] + t * H, kind: 'min' });
        else if (curvature < 0) out.push({ height_m: z[i] + t * H, kind: 'max' });
      }
    }
    return out;
  }

  /**
   * Turning point below: the highest z in [0, from_m] with g(z) < offset (strictly), i.e. where a
   * ray with invariant c = R + offset, moving down from from_m, first meets g = offset.
   * Returns the height where g = offset (to machine precision), or null when g ≥ offset on the
   * whole of [0, from_m] (the ray reaches the surface).
   */
  crossingBelow(offset_m: number, from_m: number): number | null {
    const z = this.table.z_m;
    for (let i = this.cellOf(from_m); i >= 0; i--) {
      const top = Math.min(from_m, z[i + 1]);
      if (top < z[i]) continue;
      if (top === z[i + 1] && this.cellMin[i] >= offset_m) continue;
      const H = z[i + 1] - z[i];
      const pieces = [0, ...this.criticalPoints(i, 0, (top - z[i]) / H), (top - z[i]) / H];
      for (let k = pieces.length - 1; k > 0; k--) {
        const gb = this.cellOffset(i, pieces[k]);
        if (gb < offset_m) return z[i] + pieces[k] * H;
        if (this.cellOffset(i, pieces[k - 1]) < offset_m) return z[i] + this.solve(i, offset_m, pieces[k - 1], pieces[k]) * H;
      }
    }
    return null;
  }

  /**
   * Turning point above: the lowest z in [from_m, top] with g(z) < offset (strictly). Returns the
   * height where g = offset, or null when g ≥ offset up to the top (above it g only grows): a ray
   * with that invariant moving up from from_m escapes.
   */
  crossingAbove(offset_m: number, from_m: number): number | null {
    const z = this.table.z_m;
    for (let i = this.cellOf(from_m); i < this.cells; i++) {
      const bottom = Math.max(from_m, z[i]);
      if (bottom > z[i + 1]) continue;
      if (bottom === z[i] && this.cellMin[i] >= offset_m) continue;
      const H = z[i + 1] - z[i];
      const tStart = (bottom - z[i]) / H;
      const pieces = [tStart, ...this.criticalPoints(i, tStart, 1), 1];
      for (let k = 0; k < pieces.length - 1; k++) {
        if (this.cellOffset(i, pieces[k]) < offset_m) return z[i] + pieces[k] * H;
        if (this.cellOffset(i, pieces[k + 1]) < offset_m) return z[i] + this.solve(i, offset_m, pieces[k], pieces[k + 1]) * H;
      }
    }
    return null;
  }

  /** Cell index containing z (clamped to the table). */
  cellOf(z_m: number): number {
    const z = this.table.z_m;
    if (z_m <= z[0]) return 0;
    if (z_m >= z[this.cells]) return this.cells - 1;
    const c = this.loaded;
    if (c >= 0 && z_m >= z[c] && z_m < z[c + 1]) return c;
    let lo = 0;
    let hi = this.cells;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (z[mid] <= z_m) lo = mid;
      else hi = mid;
    }
    return lo;
  }
}
