/**
 * The ray equations of a spherically stratified medium (DESIGN.md §3) over a tabulated n(z), with
 * ground range s as the independent variable and state y = [z (m), α (rad)]:
 *
 *   dz/ds = (r/R) · tan α,   dα/ds = (1/R) · (1 + r · n'(r) / n),   r = R + z.
 *
 * Written as r/R = 1 + z/R so that z keeps full precision even for a huge R (the flat-Earth limit).
 *
 * Domain. Between two event levels (surface, kinks of n(z), top) the medium is smooth. The kernel
 * tells the equations which such interval the ray is in (setDomain); the derivative continues the
 * medium linearly beyond the interval's ends from their one-sided values. A trial step that pokes
 * past a kink therefore still sees a smooth right-hand side: its error estimate stays honest and
 * the crossing it reveals is located on the true medium (identical up to the level). A step that
 * starts on a level sees the side it moves into.
 */
import { evaluateIndex } from '../refractivity/index-table.js';
import type { IndexTable } from '../refractivity/index-table.js';
import type { Derivative } from './ode.js';

/** The ray equations bound to one medium and Earth radius; allocation-free after construction. */
export class RayEquations {
  readonly table: IndexTable;
  readonly earthRadius_m: number;
  /** n − 1 at the last sampled height. */
  nm1 = 0;
  /** dn/dz at the last sampled height, 1/m (one-sided at kinks). */
  dndz_per_m = 0;
  /** Calls of derivative so far (the integrator's work: six per trial step). */
  evaluations = 0;
  private readonly invR: number;
  private readonly nodes_m: Float64Array;
  private readonly dndzTop: Float64Array;
  private readonly scratch = new Float64Array(2);
  private cell = 0;
  // Current domain [lo, hi] and the one-sided medium at its ends (see setDomain).
  private lo = -Infinity;
  private hi = Infinity;
  private nm1Lo = 0;
  private dndzLo = 0;
  private nm1Hi = 0;
  private dndzHi = 0;

  /**
   * @param table the medium (read only).
   * @param earthRadius_m radius of the surface sphere, m (> 0; ≥ 1e12 approximates flat geometry).
   */
  constructor(table: IndexTable, earthRadius_m: number) {
    this.table = table;
    this.earthRadius_m = earthRadius_m;
    this.invR = 1 / earthRadius_m;
    this.nodes_m = table.z_m;
    this.dndzTop = table.dndz_top;
  }

  /**
   * Samples n − 1 and dn/dz at z into nm1 and dndz_per_m.
   * @param z_m height, m (the table extrapolates below 0 and holds n above its top).
   * @param below true to take dn/dz from below when z is exactly on a node (a ray moving down).
   * Not restricted by setDomain.
   */
  sample(z_m: number, below: boolean): void {
    const cell = evaluateIndex(this.table, z_m, this.scratch, this.cell);
    this.cell = cell;
    this.nm1 = this.scratch[0];
    let dndz = this.scratch[1];
    if (below) {
      // Left limits: on an inner node, and at the table top (where the table holds n constant above).
      if (cell > 0 && z_m === this.nodes_m[cell]) dndz = this.dndzTop[cell - 1];
      else if (z_m === this.table.top_m) dndz = this.dndzTop[this.dndzTop.length - 1];
    }
    this.dndz_per_m = dndz;
  }

  /**
   * Restricts the derivative's medium to [lo_m, hi_m] (levels between which n is smooth), with
   * linear continuation beyond: from n and dn/dz just above lo_m and just below hi_m.
   * setDomain(-Infinity, Infinity) lifts the restriction.
   */
  setDomain(lo_m: number, hi_m: number): void {
    this.lo = lo_m;
    this.hi = hi_m;
    if (Number.isFinite(lo_m)) {
      this.sample(lo_m, false);
      this.nm1Lo = this.nm1;
      this.dndzLo = this.dndz_per_m;
    }
    if (Number.isFinite(hi_m)) {
      this.sample(hi_m, true);
      this.nm1Hi = this.nm1;
      this.dndzHi = this.dndz_per_m;
    }
  }

  /** dy/ds for y = [z, α] (DESIGN.md §3) in the current domain; the form the integrator calls. */
  readonly derivative: Derivative = (dydt, y) => {
    this.evaluations++;
    const z = y[0];
    const tanA = Math.tan(y[1]);
    let nm1: number;
    let dndz: number;
    if (z >= this.hi) {
      dndz = this.dndzHi;
      nm1 = this.nm1Hi + dndz * (z - this.hi);
    } else if (z <= this.lo) {
      dndz = this.dndzLo;
      nm1 = this.nm1Lo + dndz * (z - this.lo);
    } else {
      this.cell = evaluateIndex(this.table, z, this.scratch, this.cell);
      nm1 = this.scratch[0];
      dndz = this.scratch[1];
    }
    const q = 1 + z * this.invR;
    dydt[0] = q * tanA;
    dydt[1] = this.invR + (q * dndz) / (1 + nm1);
  };

  /**
   * Bouguer's invariant c = n · r · cos α, m (DESIGN.md §3; REFERENCES.md §5.4 item 1).
   * Leaves the sample at z in nm1 / dndz_per_m (side given by the sign of α).
   */
  invariant(z_m: number, elevation_rad: number): number {
    this.sample(z_m, elevation_rad < 0);
    return (1 + this.nm1) * (this.earthRadius_m + z_m) * Math.cos(elevation_rad);
  }

  /** dz/ds at (z, α), dimensionless. */
  heightRate(z_m: number, elevation_rad: number): number {
    return (1 + z_m * this.invR) * Math.tan(elevation_rad);
  }

  /** dα/ds at z, rad/m, with dn/dz from below (below = true) or above a node. */
  elevationRate(z_m: number, below: boolean): number {
    this.sample(z_m, below);
    return this.sampledElevationRate(z_m);
  }

  /** dα/ds at z from the last sample (which must be at z), rad/m. */
  sampledElevationRate(z_m: number): number {
    return this.invR + ((1 + z_m * this.invR) * this.dndz_per_m) / (1 + this.nm1);
  }
}
