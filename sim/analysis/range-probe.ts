/**
 * A probe of the sight line at one range: traces rays from the observer to the target range and
 * reports where each one ends (the raw material of the transfer curve, DESIGN.md §7). Counts the
 * rays it traces so that callers can cap their work.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { FATES, FATE_TARGET, RayKernel, type Fate } from '../trace/kernel.js';
import { requireElevation, requireObserverHeight, resolveTraceOptions, type TraceSettings } from '../trace/options.js';
import { straightRayEnd } from './sight-geometry.js';

/** Where one ray from the observer ends when traced toward the target range. */
export interface RangeSample {
  /** Apparent elevation at the observer, rad. */
  elevation_rad: number;
  /** 'target' (reached the target range), 'surface', 'escaped' or 'trapped' (DESIGN.md §6). */
  fate: Fate;
  /** Height at the target range, m, for fate 'target'; null otherwise. */
  height_m: number | null;
  /** Range where the ray ended, m (the target range for fate 'target'). */
  endRange_m: number;
  /** Local elevation of the ray where it ended, rad (negative: descending). */
  endElevation_rad: number;
}

/**
 * Local integrator tolerance of the ordinary probe, m: the tracer's default (sim/trace/options.ts,
 * 2e-6 m per step, about 2e-5 m of height at 50 km).
 */
export const PROBE_TOLERANCE_M = 2e-6;

/**
 * Local integrator tolerance of the fine probe, m, used where a height is compared with its
 * neighbours' to locate an extremum (a fold of the transfer curve): 1e-9 m keeps the height noise
 * near 1e-8 m, so a fold is placed to about 1e-6° instead of 1e-4°.
 */
export const FINE_PROBE_TOLERANCE_M = 1e-9;

/**
 * Traces rays from one observer to one range through one medium. One ray kernel per tolerance
 * serves every ray (sim/trace/kernel.ts: the integrator, knot store and levels are built once);
 * a kernel keeps no state from one ray to the next, so each ray is traced exactly as traceRay
 * would trace it alone. In a medium without refraction (n ≡ 1: the pure-geometry reference, index
 * model 'none') rays are straight lines and their ends are computed in closed form
 * (straightRayEnd, sight-geometry.ts), exact where the tracer is good to about 1e-9 m.
 */
export class RangeProbe {
  readonly table: IndexTable;
  readonly observerHeight_m: number;
  readonly range_m: number;
  readonly earthRadius_m: number;
  /** Rays traced so far. */
  count = 0;
  /** True when n ≡ 1 throughout the table: straight rays, no tracing. */
  readonly straight: boolean;
  /** Kernels of the ordinary and the fine tolerance, built at their first ray. */
  private ordinary: RayKernel | null = null;
  private fine: RayKernel | null = null;
  private straightChecked = false;

  /**
   * @param table the medium n(z).
   * @param observerHeight_m observer height, m (0 ≤ h < table top; checked at the first ray).
   * @param range_m target range, m (> 0).
   * @param earthRadius_m radius of the surface sphere, m.
   */
  constructor(table: IndexTable, observerHeight_m: number, range_m: number, earthRadius_m: number) {
    this.table = table;
    this.observerHeight_m = observerHeight_m;
    this.range_m = range_m;
    this.earthRadius_m = earthRadius_m;
    this.straight = isVacuum(table);
  }

  /**
   * Traces the ray at an apparent elevation to the target range.
   * @param elevation_rad apparent elevation, rad (|α| ≤ 80°).
   * @param fine true for the fine tolerance (FINE_PROBE_TOLERANCE_M).
   */
  probe(elevation_rad: number, fine = false): RangeSample {
    this.count++;
    if (this.straight) return this.straightProbe(elevation_rad);
    const kernel = fine ? (this.fine ??= this.kernel(FINE_PROBE_TOLERANCE_M)) : (this.ordinary ??= this.kernel(PROBE_TOLERANCE_M));
    requireElevation('elevation_rad', elevation_rad);
    kernel.trace(this.observerHeight_m, elevation_rad, false);
    const target = kernel.fate === FATE_TARGET;
    return {
      elevation_rad,
      fate: FATES[kernel.fate],
      height_m: target ? Math.max(0, kernel.endHeight_m) : null,
      endRange_m: kernel.endRange_m,
      endElevation_rad: kernel.endElevation_rad,
    };
  }

  /** The closed-form end of a straight ray (validated as a traced one). */
  private straightProbe(elevation_rad: number): RangeSample {
    if (!this.straightChecked) {
      this.settings(PROBE_TOLERANCE_M);
      this.straightChecked = true;
    }
    requireElevation('elevation_rad', elevation_rad);
    const end = straightRayEnd(this.observerHeight_m, elevation_rad, this.range_m, this.earthRadius_m, this.table.top_m);
    return {
      elevation_rad,
      fate: end.fate,
      height_m: end.fate === 'target' ? Math.max(0, end.endHeight_m) : null,
      endRange_m: end.endRange_m,
      endElevation_rad: end.endElevation_rad,
    };
  }

  /** A kernel to the target range with the given tolerance. */
  private kernel(tolerance_m: number): RayKernel {
    return new RayKernel(this.table, this.settings(tolerance_m));
  }

  /** Trace settings to the target range, validated as traceRay validates them (InputRangeError). */
  private settings(tolerance_m: number): TraceSettings {
    const settings = resolveTraceOptions(this.table, {
      earthRadius_m: this.earthRadius_m,
      stopRange_m: this.range_m,
      maxRange_m: this.range_m,
      tolerance_m,
    });
    requireObserverHeight(this.observerHeight_m, settings);
    return settings;
  }
}

/** True when a table has n − 1 = 0 and dn/dz = 0 everywhere (n ≡ 1). */
export function isVacuum(table: IndexTable): boolean {
  const zero = (a: Float64Array): boolean => a.every((v) => v === 0);
  return zero(table.nm1) && zero(table.dndz_bottom) && zero(table.dndz_top);
}
