/**
 * traceRay: one ray through a tabulated, spherically stratified atmosphere, traced from the
 * observer outward (DESIGN.md §2–3), with its fate, end point, Bouguer invariant and optional path.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { FATES, RayKernel } from './kernel.js';
import type { Fate } from './kernel.js';
import { knotColumns, resampleKnots } from './knots.js';
import { requireElevation, requireObserverHeight, resolveTraceOptions } from './options.js';
import type { TraceOptions, TraceSettings } from './options.js';

/** A point of a ray. */
export interface RayPoint {
  /** Ground range from the observer (arc length on the surface sphere), m. */
  range_m: number;
  /** Height above the surface, m. */
  height_m: number;
  /** Local elevation angle of the ray, rad, positive upward. */
  elevation_rad: number;
}

/** Path of a ray as columns. */
export interface RayPath {
  range_m: Float64Array;
  height_m: Float64Array;
  elevation_rad: Float64Array;
}

/** Everything traceRay reports about one ray (plain data). */
export interface RayResult {
  /** Apparent elevation at the observer, rad (the input). */
  elevation_rad: number;
  /** 'target' (reached stopRange_m), 'surface' (met z = 0), 'escaped' (reached top_m), 'trapped' (reached maxRange_m). */
  fate: Fate;
  /** Where the ray ended: at the target range, on the surface, at the top, or at the maximum range. */
  end: RayPoint;
  /** Bouguer's invariant c0 = n·r·cos α at the observer, m. */
  invariant_m: number;
  /** Largest |c/c0 − 1| over the ray's accepted steps and events (DESIGN.md §3 check 1). */
  maxInvariantDrift: number;
  /** Accepted integrator steps that make up the ray (events included). */
  steps: number;
  /** All integrator steps spent, including event location. */
  integratorSteps: number;
  /** Evaluations of the ray equations (the integrator's work, rejected trials included). */
  evaluations: number;
  /** Lowest height reached, m (the observer, the end, or a turning point). */
  minHeight_m: number;
  /** Range of the lowest point, m. */
  minHeightRange_m: number;
  /** True when the ray passed a lower turning point (vertex: descending, then ascending). */
  turned: boolean;
  /** Path when recordPath is set: the integrator's points, or uniform samples (pathSpacing_m). */
  path: RayPath | null;
  /** Soft problems, e.g. the step limit. */
  warnings: string[];
}

/**
 * Traces one ray from the observer outward.
 *
 * @param table the medium n(z) (sim/refractivity/index-table.ts), read only.
 * @param observerHeight_m observer height above the surface, m; 0 ≤ h < top_m.
 * @param elevation_rad apparent elevation at the observer, rad; |α| ≤ 80° (MAX_ELEVATION_RAD).
 * @param options see TraceOptions / DEFAULTS (stop range, maximum range, top, tolerance, path).
 * @returns the ray's fate, end point, invariant drift, lowest point and (optionally) path.
 * @throws InputRangeError naming the field and its allowed range for bad input.
 *
 * Accuracy: events (surface, top, kinks) lie on the integrated ray to |Δz| ≤ 1e-11 m; the target
 * range is met exactly; the height error at the end is set by tolerance_m (see its doc).
 * Reference: ray equations and Bouguer's invariant, DESIGN.md §3 (Bouguer 1729; any text on
 * spherically stratified media, e.g. Born & Wolf, Principles of Optics, §3.2.2).
 */
export function traceRay(table: IndexTable, observerHeight_m: number, elevation_rad: number, options: TraceOptions = {}): RayResult {
  return rayTracer(table, observerHeight_m, options)(elevation_rad);
}

/**
 * A tracer of many rays from one observer through one medium with one set of options: the options
 * and the observer height are validated once and one kernel (integrator, knot store, levels)
 * serves every ray. Each ray comes out exactly as traceRay would give it alone: the kernel keeps
 * nothing from one ray to the next.
 *
 * @param table the medium n(z), read only.
 * @param observerHeight_m observer height above the surface, m; 0 ≤ h < top_m.
 * @param options see TraceOptions / DEFAULTS.
 * @returns a function tracing the ray at an apparent elevation, rad (|α| ≤ 80°), to a RayResult.
 * @throws InputRangeError naming the option or observerHeight_m (here), or elevation_rad (per ray).
 * Reference: as traceRay.
 */
export function rayTracer(table: IndexTable, observerHeight_m: number, options: TraceOptions = {}): (elevation_rad: number) => RayResult {
  const settings = resolveTraceOptions(table, options);
  requireObserverHeight(observerHeight_m, settings);
  const kernel = new RayKernel(table, settings);
  return (elevation_rad) => {
    requireElevation('elevation_rad', elevation_rad);
    kernel.trace(observerHeight_m, elevation_rad, settings.recordPath);
    return kernelResult(kernel, elevation_rad, settings);
  };
}

/** Builds the plain result of the kernel's last ray. */
function kernelResult(kernel: RayKernel, elevation_rad: number, settings: TraceSettings): RayResult {
  const warnings: string[] = [];
  if (kernel.stepLimitReached) warnings.push(`step limit maxSteps = ${settings.maxSteps} reached at range ${kernel.endRange_m} m`);
  return {
    elevation_rad,
    fate: FATES[kernel.fate],
    end: { range_m: kernel.endRange_m, height_m: kernel.endHeight_m, elevation_rad: kernel.endElevation_rad },
    invariant_m: kernel.invariant_m,
    maxInvariantDrift: kernel.maxInvariantDrift,
    steps: kernel.steps,
    integratorSteps: kernel.integratorSteps,
    evaluations: kernel.evaluations,
    minHeight_m: kernel.minHeight_m,
    minHeightRange_m: kernel.minHeightRange_m,
    turned: kernel.turned,
    path: settings.recordPath ? recordedPath(kernel, settings) : null,
    warnings,
  };
}

/** The knots as they are, or resampled at the requested spacing (widened to fit maxPathSamples). */
function recordedPath(kernel: RayKernel, settings: TraceSettings): RayPath {
  const knots = kernel.knots;
  const end = kernel.endRange_m;
  if (end === 0 || (settings.pathSpacing_m === 0 && knots.count <= settings.maxPathSamples)) return knotColumns(knots);
  const spacing = Math.max(settings.pathSpacing_m, end / (settings.maxPathSamples - 2));
  const capacity = Math.min(settings.maxPathSamples, Math.floor(end / spacing) + 2);
  const flat = new Float64Array(3 * capacity);
  const count = resampleKnots(knots, 0, knots.count, spacing, capacity, flat, 0);
  const path: RayPath = { range_m: new Float64Array(count), height_m: new Float64Array(count), elevation_rad: new Float64Array(count) };
  for (let j = 0; j < count; j++) {
    path.range_m[j] = flat[3 * j];
    path.height_m[j] = flat[3 * j + 1];
    path.elevation_rad[j] = flat[3 * j + 2];
  }
  return path;
}
