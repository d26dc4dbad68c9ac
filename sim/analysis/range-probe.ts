/**
 * A probe of the sight line at one range: traces rays from the observer to the target range and
 * reports where each one ends (the raw material of the transfer curve, DESIGN.md §7). Counts the
 * rays it traces so that callers can cap their work.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { FATES, FATE_TARGET, RayKernel, type Fate } from '../trace/kernel.js';
import { requireElevation, requireObserverHeight, resolveTraceOptions } from '../trace/options.js';

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
 * would trace it alone.
 */
export class RangeProbe {
  readonly table: IndexTable;
  readonly observerHeight_m: number;
  readonly range_m: number;
  readonly earthRadius_m: number;
  /** Rays traced so far. */
  count = 0;
  /** Kernels of the ordinary and the fine tolerance, built at their first ray. */
  private ordinary: RayKernel | null = null;
  private fine: RayKernel | null = null;

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
  }

  /**
   * Traces the ray at an apparent elevation to the target range.
   * @param elevation_rad apparent elevation, rad (|α| ≤ 80°).
   * @param fine true for the fine tolerance (FINE_PROBE_TOLERANCE_M).
   */
  probe(elevation_rad: number, fine = false): RangeSample {
    this.count++;
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

  /** A kernel to the target range with the given tolerance (validates as traceRay does: InputRangeError). */
  private kernel(tolerance_m: number): RayKernel {
    const settings = resolveTraceOptions(this.table, {
      earthRadius_m: this.earthRadius_m,
      stopRange_m: this.range_m,
      maxRange_m: this.range_m,
      tolerance_m,
    });
    requireObserverHeight(this.observerHeight_m, settings);
    return new RayKernel(this.table, settings);
  }
}
