/**
 * D(z) = n(z)·r(z) − c for one ray, the quantity under the square root of the invariant
 * quadrature (n²r² − c² = D·(D + 2c)), computed without cancellation.
 *
 * D is carried as D_ref + [n r(z) − n r(z_ref)] from a reference point where D is known exactly:
 * the observer (D = n0 r0 (1 − cos α0) = 2 n0 r0 sin²(α0/2)) or a turning point (D = 0). The
 * increment is (z − z_ref)(1 + (n−1)_ref) + (R + z)·Δ(n − 1), and Δ(n − 1) between two heights
 * in the same or neighbouring table cells is taken from the factored cubic,
 * p(t) − p(u) = (t − u)·(a1 + a2 (t + u) + a3 (t² + t u + u²)), so its rounding is relative to Δ
 * itself. A plain difference of two values of n − 1 ≈ 3e-4 would carry ≈ 5e-20 of noise, which R
 * turns into ≈ 3e-13 m of D: harmless far from a turning point, but near one the range grows
 * like sqrt(D) and such noise would cost about 1e-7 of the range.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { findCell } from '../refractivity/index-table.js';
import { RayEquations } from './equations.js';

/** D(z) of one ray over one table. */
export class InvariantExcess {
  readonly eq: RayEquations;
  readonly table: IndexTable;
  readonly R: number;
  /** Bouguer's invariant c = n0 r0 cos α0, m. */
  readonly c: number;
  private refZ: number;
  private refD: number;
  private refNm1: number;

  /**
   * @param table the medium.
   * @param R Earth radius, m.
   * @param z0 start height, m (inside the table).
   * @param elevation_rad start elevation, rad.
   */
  constructor(table: IndexTable, R: number, z0: number, elevation_rad: number) {
    this.eq = new RayEquations(table, R);
    this.table = table;
    this.R = R;
    this.eq.sample(z0, false);
    const n0r0 = (1 + this.eq.nm1) * (R + z0);
    this.c = n0r0 * Math.cos(elevation_rad);
    const half = Math.sin(0.5 * elevation_rad);
    this.refZ = z0;
    this.refNm1 = this.eq.nm1;
    this.refD = n0r0 * 2 * half * half;
  }

  /** Makes z the reference point with D(z) = d (e.g. a turning point with d = 0). */
  setReference(z: number, d: number): void {
    this.eq.sample(z, false);
    this.refZ = z;
    this.refNm1 = this.eq.nm1;
    this.refD = d;
  }

  /** Height of the reference point, m. */
  get referenceHeight_m(): number {
    return this.refZ;
  }

  /** D(z), m. Leaves the medium sampled at z (dn/dz from below when below). */
  excess(z: number, below = false): number {
    return this.excessAt(z, z - this.refZ, below);
  }

  /**
   * D at z = reference + offset with the offset taken as exact (z itself may round): next to a
   * turning point z − z_t is far smaller than the rounding of z.
   */
  excessAt(z: number, offset: number, below = false): number {
    const increment = nm1Increment(this.table, this.refZ, z, offset);
    this.eq.sample(z, below);
    return this.refD + offset * (1 + this.refNm1) + (this.R + z) * increment;
  }

  /** dD/dz = n + r dn/dz at the last sample (height z). */
  slope(z: number): number {
    return 1 + this.eq.nm1 + (this.R + z) * this.eq.dndz_per_m;
  }

  /** dθ/dz = c / (r sqrt(D (D + 2c))), 1/m; 0 where rounding leaves D ≤ 0 at a turning point. */
  integrand(z: number): number {
    return this.integrandFrom(z, this.excess(z));
  }

  /** dθ/dz at reference + offset (offset exact, see excessAt). */
  integrandAtOffset(offset: number): number {
    const z = this.refZ + offset;
    return this.integrandFrom(z, this.excessAt(z, offset));
  }

  private integrandFrom(z: number, d: number): number {
    const f = d * (d + 2 * this.c);
    return f > 0 ? this.c / ((this.R + z) * Math.sqrt(f)) : 0;
  }
}

/**
 * (n − 1)(z) − (n − 1)(zRef) from the table, with z − zRef = offset: factored within a cell,
 * summed over two neighbouring cells, a plain difference farther apart or outside the table
 * (where it is large or linear).
 */
export function nm1Increment(table: IndexTable, zRef: number, z: number, offset = z - zRef): number {
  const top = table.top_m;
  if (!(zRef >= 0 && zRef <= top && z >= 0 && z <= top)) return plainNm1(table, z) - plainNm1(table, zRef);
  const i = findCell(table, zRef, 0);
  const j = findCell(table, z, i);
  if (i === j) return cellIncrement(table, i, zRef, offset);
  if (j === i + 1 || j === i - 1) {
    const node = table.z_m[Math.max(i, j)];
    const first = node - zRef;
    return cellIncrement(table, i, zRef, first) + cellIncrement(table, j, node, offset - first);
  }
  return plainNm1(table, z) - plainNm1(table, zRef);
}

/** p(u + delta) − p(u) of the cubic of cell i (heights in m), factored. */
function cellIncrement(table: IndexTable, i: number, u_m: number, delta_m: number): number {
  const z0 = table.z_m[i];
  const h = table.z_m[i + 1] - z0;
  const dy = table.nm1[i + 1] - table.nm1[i];
  const m0 = table.dndz_bottom[i] * h;
  const m1 = table.dndz_top[i] * h;
  const a2 = 3 * dy - 2 * m0 - m1;
  const a3 = -2 * dy + m0 + m1;
  const u = (u_m - z0) / h;
  const d = delta_m / h;
  const t = u + d;
  return d * (m0 + a2 * (t + u) + a3 * (t * t + t * u + u * u));
}

/** n − 1 at z as the equations see it (the table, extrapolated outside). */
function plainNm1(table: IndexTable, z: number): number {
  const eq = scratchEquations(table);
  eq.sample(z, false);
  return eq.nm1;
}

let scratch: RayEquations | null = null;
function scratchEquations(table: IndexTable): RayEquations {
  if (scratch === null || scratch.table !== table) scratch = new RayEquations(table, 1);
  return scratch;
}
