/**
 * The tabulated refractive index n(z) that the ray integrator reads.
 *
 * Each cell [z_i, z_{i+1}] holds a cubic Hermite interpolant built from n − 1 at both nodes and
 * the one-sided derivatives dn/dz at both ends of the cell (right limit at z_i, left limit at
 * z_{i+1}). n and dn/dz are therefore evaluated from the *same* cubic, so the medium the
 * integrator sees is self-consistent (Bouguer's invariant is conserved to integration accuracy),
 * and a kink of the temperature profile placed on a node stays a true kink of n(z).
 *
 * Heights are metres above the surface. Below 0 and above the top the table extrapolates
 * linearly (below) or holds n constant (above); callers stop rays at both bounds.
 */

export interface IndexTable {
  /** Node heights, m; strictly increasing; z_m[0] = 0. Length cells + 1. */
  readonly z_m: Float64Array;
  /** n − 1 at the nodes. Length cells + 1. */
  readonly nm1: Float64Array;
  /** dn/dz at the bottom of each cell (right limit), 1/m. Length cells. */
  readonly dndz_bottom: Float64Array;
  /** dn/dz at the top of each cell (left limit), 1/m. Length cells. */
  readonly dndz_top: Float64Array;
  /** Heights where dn/dz may jump (profile nodes), m; sorted; every one is also a node of z_m. */
  readonly kinks_m: Float64Array;
  /** Top of the table, m (= last node). */
  readonly top_m: number;
}

/** One sample of a medium: n − 1 and dn/dz, with the side of a kink it describes. */
export interface IndexSample {
  nm1: number;
  dndz_per_m: number;
}

/**
 * A medium to tabulate: n − 1 at z, and dn/dz at z taken from below (side = −1) or above
 * (side = +1); the two differ only at kinks.
 */
export interface IndexSampler {
  nm1(z_m: number): number;
  dndz(z_m: number, side: -1 | 1): number;
}

/**
 * Tabulates a medium on the given nodes.
 * @param sampler the medium.
 * @param nodes_m strictly increasing heights, first 0, m. Must contain every kink.
 * @param kinks_m heights where dn/dz jumps, m (each must be one of nodes_m).
 */
export function tabulateIndex(sampler: IndexSampler, nodes_m: ArrayLike<number>, kinks_m: ArrayLike<number> = []): IndexTable {
  const count = nodes_m.length;
  if (count < 2) throw new RangeError('index table needs at least 2 nodes');
  const z_m = Float64Array.from(nodes_m);
  if (z_m[0] !== 0) throw new RangeError('index table must start at height 0 m');
  for (let i = 1; i < count; i++) {
    if (!(z_m[i] > z_m[i - 1])) throw new RangeError(`index table nodes must increase strictly (node ${i})`);
  }
  const nm1 = new Float64Array(count);
  const dndz_bottom = new Float64Array(count - 1);
  const dndz_top = new Float64Array(count - 1);
  for (let i = 0; i < count; i++) nm1[i] = sampler.nm1(z_m[i]);
  for (let i = 0; i < count - 1; i++) {
    dndz_bottom[i] = sampler.dndz(z_m[i], 1);
    dndz_top[i] = sampler.dndz(z_m[i + 1], -1);
  }
  return { z_m, nm1, dndz_bottom, dndz_top, kinks_m: Float64Array.from(kinks_m), top_m: z_m[count - 1] };
}

/** A table for n ≡ 1 (no refraction) up to top_m. */
export function vacuumTable(top_m: number): IndexTable {
  return tabulateIndex({ nm1: () => 0, dndz: () => 0 }, [0, top_m]);
}

/** Index of the cell containing z (clamped to the table), found from a starting guess. */
export function findCell(table: IndexTable, z_m: number, guess: number): number {
  const z = table.z_m;
  const last = z.length - 2;
  let i = guess < 0 ? 0 : guess > last ? last : guess;
  if (z_m < z[i]) {
    if (i > 0 && z_m >= z[i - 1]) return i - 1;
    let lo = 0;
    let hi = i;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (z[mid] <= z_m) lo = mid;
      else hi = mid;
    }
    return lo;
  }
  if (z_m < z[i + 1] || i === last) return i;
  if (i + 1 < last && z_m < z[i + 2]) return i + 1;
  let lo = i + 1;
  let hi = last + 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (z[mid] <= z_m) lo = mid;
    else hi = mid;
  }
  return lo > last ? last : lo;
}

/**
 * Evaluates n − 1 and dn/dz at z from the table (cubic Hermite in the cell).
 * Writes out[0] = n − 1, out[1] = dn/dz (1/m). Returns the cell index, a good guess for the next call.
 * Below 0: linear extrapolation from the surface; above the top: n held at its top value, dn/dz = 0.
 */
export function evaluateIndex(table: IndexTable, z_m: number, out: Float64Array, guess = 0): number {
  const z = table.z_m;
  if (z_m >= table.top_m) {
    out[0] = table.nm1[z.length - 1];
    out[1] = 0;
    return z.length - 2;
  }
  if (z_m <= 0) {
    const d = table.dndz_bottom[0];
    out[0] = table.nm1[0] + d * z_m;
    out[1] = d;
    return 0;
  }
  const i = findCell(table, z_m, guess);
  const h = z[i + 1] - z[i];
  const t = (z_m - z[i]) / h;
  const y0 = table.nm1[i];
  const y1 = table.nm1[i + 1];
  const m0 = table.dndz_bottom[i] * h;
  const m1 = table.dndz_top[i] * h;
  const t2 = t * t;
  const t3 = t2 * t;
  // Hermite basis functions and their derivatives.
  const h00 = 2 * t3 - 3 * t2 + 1;
  const h10 = t3 - 2 * t2 + t;
  const h01 = -2 * t3 + 3 * t2;
  const h11 = t3 - t2;
  out[0] = h00 * y0 + h10 * m0 + h01 * y1 + h11 * m1;
  const d00 = 6 * t2 - 6 * t;
  const d10 = 3 * t2 - 4 * t + 1;
  const d01 = -6 * t2 + 6 * t;
  const d11 = 3 * t2 - 2 * t;
  out[1] = (d00 * y0 + d10 * m0 + d01 * y1 + d11 * m1) / h;
  return i;
}
