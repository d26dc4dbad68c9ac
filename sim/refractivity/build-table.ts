/**
 * Builds the index table n(z) of a resolved air column for one refractivity model.
 *
 * dn/dz at a height comes from the chain rule on the air state,
 *   dn/dz = ∂(n−1)/∂T·dT/dz + ∂(n−1)/∂p·dp/dz + ∂(n−1)/∂e·de/dz,
 * with the partials by central differences in T, p and e, dT/dz and de/dz one-sided at kinks and
 * dp/dz the column's hydrostatic gradient −p·g(z)·M/(R·T).
 *
 * Node choice (BUILD_TABLE_DEFAULTS):
 * 1. a graded starting grid: every kink of the column; 1 m cells at the surface and the spacing of
 *    each column refinement, growing by a factor 1.5 per cell away from them, up to 4 km;
 * 2. adaptive bisection: a cell is split at its midpoint until the cubic Hermite interpolant
 *    (index-table.ts) agrees with direct evaluation to 1e-13 in n − 1 at the midpoint (where the
 *    error of n peaks) and to 1e-4 relative in dn/dz at t = 1/2 − √3/6 (where the error of dn/dz
 *    peaks), or the cell is narrower than 0.1 mm. Both targets are 10× inside the accuracy asked of
 *    the table (1e-12 in n, 1e-3 relative in dn/dz) to cover the error between check points.
 * Measured (0.5 K/m inversion from 0 to 20 m, US 1976 above, Ciddor 550 nm, RH 0.7; the check is
 * in test/refractivity/build-table.test.ts): 263 nodes; worst interpolation error over 0..86 km
 * 9.6e-14 in n − 1 and 1.0e-4 relative in dn/dz (near the top; 5e-8 inside the inversion). Build
 * time on this machine about 5 ms once warm (≈ 700 direct evaluations of about 8 µs), 35–45 ms for
 * the first table of a process (JIT warm-up).
 */
import type { AirColumn } from '../atmosphere/column.js';
import { gradedNodes, type Refinement } from '../atmosphere/grid.js';
import { InputRangeError } from '../errors.js';
import { tabulateIndex, type IndexSampler, type IndexTable } from './index-table.js';
import type { AirState, RefractivityFunction } from './types.js';

/** Options of buildIndexTable. Defaults in BUILD_TABLE_DEFAULTS. */
export interface BuildTableOptions {
  /** Top of the table, m; 0 < top_m ≤ column.top_m. Default column.top_m. */
  top_m?: number;
  /** Largest accepted error of n − 1 at a cell's midpoint, dimensionless. Default 1e-13. */
  nm1Tolerance?: number;
  /** Largest accepted relative error of dn/dz at t = 1/2 − √3/6 of a cell. Default 1e-4. */
  slopeTolerance?: number;
  /** Cell size at the surface of the starting grid, m. Default 1. */
  surfaceSpacing_m?: number;
  /** Widest cell of the starting grid, m. Default 4000. */
  maxSpacing_m?: number;
  /** Growth ratio of neighbouring starting cells. Default 1.5. */
  growth?: number;
  /** Cells narrower than this are never split, m. Default 1e-4. */
  minSpacing_m?: number;
}

/** Defaults of BuildTableOptions (see the module comment for the reasons). */
export const BUILD_TABLE_DEFAULTS = {
  nm1Tolerance: 1e-13,
  slopeTolerance: 1e-4,
  surfaceSpacing_m: 1,
  maxSpacing_m: 4000,
  growth: 1.5,
  minSpacing_m: 1e-4,
} as const;

/** Relative temperature step of the central difference ∂(n−1)/∂T (≈ 3 mK): truncation ≈ 1e-10, rounding ≈ 1e-11. */
const T_STEP_REL = 1e-5;
/** Relative pressure step of ∂(n−1)/∂p: n − 1 is nearly linear in p, so truncation is negligible; rounding ≈ 1e-13. */
const P_STEP_REL = 1e-3;
/** Relative vapour-pressure step of ∂(n−1)/∂e (n − 1 is nearly linear in e). */
const E_STEP_REL = 1e-2;
/** Vapour-pressure step where e = 0 (forward difference), Pa. */
const E_STEP_DRY_PA = 1e-2;
/** Position in a cell where the Hermite error of dn/dz peaks for a constant 4th derivative: 1/2 − √3/6. */
const SLOPE_CHECK_T = 0.5 - Math.sqrt(3) / 6;

/** n − 1 and one-sided dn/dz at one height, from the column directly. */
export interface IndexPoint {
  /** n − 1, dimensionless. */
  nm1: number;
  /** dn/dz from below, 1/m. */
  dndzBelow: number;
  /** dn/dz from above, 1/m. */
  dndzAbove: number;
}

/** Partial derivatives of n − 1 with respect to the state variables. */
export interface RefractivityPartials {
  /** ∂(n−1)/∂T, 1/K. */
  dT: number;
  /** ∂(n−1)/∂p, 1/Pa. */
  dp: number;
  /** ∂(n−1)/∂e, 1/Pa. */
  de: number;
}

/**
 * Partial derivatives of a refractivity function by central differences in T, p and e (forward
 * in e where e = 0).
 * @param refractivity the model.
 * @param state temperature_K > 0, pressure_Pa > 0, vapour_pressure_Pa ≥ 0.
 * @returns the partials; relative accuracy about 1e-10 for the smooth optical and radio models.
 */
export function refractivityPartials(refractivity: RefractivityFunction, state: AirState): RefractivityPartials {
  const { temperature_K: T, pressure_Pa: p, vapour_pressure_Pa: e } = state;
  const at = (t: number, pp: number, ee: number): number => refractivity({ temperature_K: t, pressure_Pa: pp, vapour_pressure_Pa: ee });
  const hT = T_STEP_REL * T;
  const hp = P_STEP_REL * p;
  const dT = (at(T + hT, p, e) - at(T - hT, p, e)) / (2 * hT);
  const dp = (at(T, p + hp, e) - at(T, p - hp, e)) / (2 * hp);
  let de: number;
  if (e > 0) {
    const he = E_STEP_REL * e;
    de = (at(T, p, e + he) - at(T, p, e - he)) / (2 * he);
  } else {
    de = (at(T, p, E_STEP_DRY_PA) - at(T, p, 0)) / E_STEP_DRY_PA;
  }
  return { dT, dp, de };
}

/** The air state of a column at z. */
function stateAt(column: AirColumn, z_m: number): AirState {
  return {
    temperature_K: column.temperature_K(z_m),
    pressure_Pa: column.pressure_Pa(z_m),
    vapour_pressure_Pa: column.vapour_pressure_Pa(z_m),
  };
}

/** One-sided dn/dz at z by the chain rule, given the state there; writes into point. */
function fillSlopes(column: AirColumn, refractivity: RefractivityFunction, z_m: number, state: AirState, point: IndexPoint): IndexPoint {
  const eBelow = column.vapourGradient_Pa_per_m(z_m, -1);
  const eAbove = column.vapourGradient_Pa_per_m(z_m, 1);
  const partials = refractivityPartials(refractivity, state);
  const pressureTerm = partials.dp * column.pressureGradient_Pa_per_m(z_m);
  point.dndzBelow = partials.dT * column.temperatureGradient_K_per_m(z_m, -1) + pressureTerm + (eBelow === 0 ? 0 : partials.de * eBelow);
  point.dndzAbove = partials.dT * column.temperatureGradient_K_per_m(z_m, 1) + pressureTerm + (eAbove === 0 ? 0 : partials.de * eAbove);
  return point;
}

/**
 * n − 1 and one-sided dn/dz of a column at height z, evaluated directly (no table).
 * @param column the resolved air.
 * @param refractivity the model.
 * @param z_m height, m.
 * @returns n − 1 and dn/dz from below and above (1/m); equal except at kinks.
 */
export function indexAt(column: AirColumn, refractivity: RefractivityFunction, z_m: number): IndexPoint {
  const state = stateAt(column, z_m);
  return fillSlopes(column, refractivity, z_m, state, { nm1: refractivity(state), dndzBelow: 0, dndzAbove: 0 });
}

/**
 * An IndexSampler reading a column directly (n − 1 and dn/dz by the chain rule), for tables and
 * for checking them.
 */
export function columnIndexSampler(column: AirColumn, refractivity: RefractivityFunction): IndexSampler {
  return {
    nm1: (z_m) => indexAt(column, refractivity, z_m).nm1,
    dndz: (z_m, side) => {
      const point = indexAt(column, refractivity, z_m);
      return side < 0 ? point.dndzBelow : point.dndzAbove;
    },
  };
}

/**
 * Tabulates n(z) of a column (see the module comment for the node choice and accuracy).
 * @param column the resolved air (its kinks become nodes and table kinks).
 * @param refractivity the model, state → n − 1.
 * @param options top and tolerances (BUILD_TABLE_DEFAULTS).
 * @returns the table, from 0 to top_m.
 * @throws InputRangeError naming `top_m` unless 0 < top_m ≤ column.top_m.
 * Reference: DESIGN.md §4 (tabulate once per scenario; kinks are nodes).
 */
export function buildIndexTable(column: AirColumn, refractivity: RefractivityFunction, options: BuildTableOptions = {}): IndexTable {
  const o = { ...BUILD_TABLE_DEFAULTS, ...options };
  const top = options.top_m ?? column.top_m;
  if (!(top > 0 && top <= column.top_m)) throw new InputRangeError('top_m', top, `0 (exclusive)..${column.top_m} m (the top of the column)`);
  const kinks = column.kinks_m.filter((z) => z > 0 && z < top);
  const refinements: Refinement[] = [{ from_m: 0, to_m: 0, spacing_m: o.surfaceSpacing_m }, ...column.refinements];
  const start = gradedNodes(0, top, kinks, refinements, { maxSpacing_m: o.maxSpacing_m, growth: o.growth });

  // Points are cached by height; their slopes are computed only when a cell ending there is used
  // (a midpoint whose cell passes the check needs n − 1 alone).
  const points = new Map<number, { state: AirState; point: IndexPoint; slopes: boolean }>();
  const value = (z: number): { state: AirState; point: IndexPoint; slopes: boolean } => {
    let found = points.get(z);
    if (!found) {
      const state = stateAt(column, z);
      found = { state, point: { nm1: refractivity(state), dndzBelow: 0, dndzAbove: 0 }, slopes: false };
      points.set(z, found);
    }
    return found;
  };
  const point = (z: number): IndexPoint => {
    const found = value(z);
    if (!found.slopes) {
      fillSlopes(column, refractivity, z, found.state, found.point);
      found.slopes = true;
    }
    return found.point;
  };
  const nodes: number[] = [start[0]];
  const refine = (a: number, pa: IndexPoint, b: number, pb: IndexPoint): void => {
    const h = b - a;
    if (h > o.minSpacing_m) {
      const mid = 0.5 * (a + b);
      const m0 = pa.dndzAbove * h;
      const m1 = pb.dndzBelow * h;
      const nmidError = Math.abs(0.5 * (pa.nm1 + pb.nm1) + 0.125 * (m0 - m1) - value(mid).point.nm1);
      let accept = nmidError <= o.nm1Tolerance;
      if (accept) {
        const t = SLOPE_CHECK_T;
        const slope = ((6 * t * t - 6 * t) * (pa.nm1 - pb.nm1) + (3 * t * t - 4 * t + 1) * m0 + (3 * t * t - 2 * t) * m1) / h;
        const direct = indexAt(column, refractivity, a + t * h).dndzAbove;
        const scale = Math.max(Math.abs(pa.dndzAbove), Math.abs(pb.dndzBelow), Math.abs(direct));
        accept = Math.abs(slope - direct) <= o.slopeTolerance * scale;
      }
      if (!accept) {
        const pm = point(mid);
        refine(a, pa, mid, pm);
        refine(mid, pm, b, pb);
        return;
      }
    }
    nodes.push(b);
  };
  for (let i = 0; i + 1 < start.length; i++) refine(start[i], point(start[i]), start[i + 1], point(start[i + 1]));

  const sampler: IndexSampler = {
    nm1: (z) => point(z).nm1,
    dndz: (z, side) => (side < 0 ? point(z).dndzBelow : point(z).dndzAbove),
  };
  return tabulateIndex(sampler, nodes, kinks);
}
