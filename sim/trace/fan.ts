/**
 * traceFan: a fan of rays from one observer through one medium, into typed arrays and one ndarray
 * of resampled paths [ray, sample, field] (DESIGN.md §1). Validates once, then runs one reusable
 * kernel (one integrator, no per-step allocation) over every ray.
 */
import ndarray from 'ndarray';
import type { NdArray } from 'ndarray';
import { InputRangeError } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { FATES, RayKernel } from './kernel.js';
import { KnotBuffer, resampleKnots } from './knots.js';
import { DEFAULTS, requireElevation, requireInteger, requireObserverHeight, resolveTraceOptions } from './options.js';
import type { TraceOptions } from './options.js';

/** Most rays in one fan. */
export const MAX_FAN_RAYS = 1_000_000;
/** Most values rays × samplesPerRay in one fan (× 3 fields × 8 bytes = 480 MB). */
export const MAX_FAN_SAMPLES = 20_000_000;
/** Knots per ray to reserve room for (about 8 in the bench fan; the buffer grows if needed). */
const KNOTS_PER_RAY_GUESS = 12;
/** Field order of the last axis of FanResult.paths. */
export const PATH_FIELDS = ['range_m', 'height_m', 'elevation_rad'] as const;

/** Result of traceFan: one entry per ray in every per-ray array (plain typed arrays). */
export interface FanResult {
  /** Resampled paths, shape [rays, samplesPerRay, 3], fields PATH_FIELDS; beyond sampleCount[k] the last sample repeats. */
  paths: NdArray<Float64Array>;
  /** Samples of ray k that are its own (uniform spacing from range 0, then its end point). */
  sampleCount: Int32Array;
  /** Spacing of the resampled paths, m (the longest ray's range / (samplesPerRay − 1)). */
  spacing_m: number;
  /** Index into FATES. */
  fate: Uint8Array;
  /** Names of the fate codes. */
  fates: typeof FATES;
  /** The apparent elevations traced, rad (a copy of the input). */
  elevation_rad: Float64Array;
  endRange_m: Float64Array;
  endHeight_m: Float64Array;
  endElevation_rad: Float64Array;
  /** Lowest height reached per ray, m. */
  minHeight_m: Float64Array;
  /** Accepted steps per ray (events included). */
  steps: Int32Array;
  /** All integrator steps per ray (including event location). */
  integratorSteps: Int32Array;
  /** Evaluations of the ray equations per ray (rejected trials included). */
  evaluations: Int32Array;
  /** Largest |c/c0 − 1| per ray over its accepted steps (DESIGN.md §3 check 1). */
  maxInvariantDrift: Float64Array;
  /** Soft problems (e.g. rays stopped by maxSteps), counted per kind. */
  warnings: string[];
}

/**
 * Traces a fan of rays from one observer.
 *
 * @param table the medium n(z), read only.
 * @param observerHeight_m observer height, m; 0 ≤ h < top_m.
 * @param elevations_rad apparent elevations, rad; each |α| ≤ 80°; 1..MAX_FAN_RAYS of them.
 * @param options TraceOptions (see DEFAULTS) and samplesPerRay (default 200, 2..100 000).
 * @returns per-ray fates, end points, drifts and step counts, and the paths resampled at uniform
 *   range spacing by cubic Hermite interpolation of the integrator's points (display accuracy:
 *   O(h⁴) between steps; end points and events are exact).
 * @throws InputRangeError naming the field and its allowed range.
 * Reference: DESIGN.md §3 (ray equations), §6 (fates).
 */
export function traceFan(table: IndexTable, observerHeight_m: number, elevations_rad: Float64Array, options: TraceOptions = {}): FanResult {
  const settings = resolveTraceOptions(table, options);
  requireObserverHeight(observerHeight_m, settings);
  const rays = elevations_rad.length;
  requireInteger('elevations_rad.length', rays, 1, MAX_FAN_RAYS);
  for (let k = 0; k < rays; k++) requireElevation(`elevations_rad[${k}]`, elevations_rad[k]);
  const samples = requireInteger('samplesPerRay', options.samplesPerRay ?? DEFAULTS.samplesPerRay, 2, 100_000);
  if (rays * samples > MAX_FAN_SAMPLES) {
    throw new InputRangeError('samplesPerRay', samples, `2..${Math.floor(MAX_FAN_SAMPLES / rays)} for ${rays} rays (rays × samples ≤ ${MAX_FAN_SAMPLES})`);
  }

  const kernel = new RayKernel(table, settings);
  const all = new KnotBuffer(KNOTS_PER_RAY_GUESS * rays);
  const firstKnot = new Int32Array(rays + 1);
  const fate = new Uint8Array(rays);
  const endRange_m = new Float64Array(rays);
  const endHeight_m = new Float64Array(rays);
  const endElevation_rad = new Float64Array(rays);
  const minHeight_m = new Float64Array(rays);
  const steps = new Int32Array(rays);
  const integratorSteps = new Int32Array(rays);
  const evaluations = new Int32Array(rays);
  const maxInvariantDrift = new Float64Array(rays);
  let stepLimited = 0;
  let longest = 0;
  for (let k = 0; k < rays; k++) {
    kernel.trace(observerHeight_m, elevations_rad[k], true);
    fate[k] = kernel.fate;
    endRange_m[k] = kernel.endRange_m;
    endHeight_m[k] = kernel.endHeight_m;
    endElevation_rad[k] = kernel.endElevation_rad;
    minHeight_m[k] = kernel.minHeight_m;
    steps[k] = kernel.steps;
    integratorSteps[k] = kernel.integratorSteps;
    evaluations[k] = kernel.evaluations;
    maxInvariantDrift[k] = kernel.maxInvariantDrift;
    if (kernel.stepLimitReached) stepLimited++;
    if (kernel.endRange_m > longest) longest = kernel.endRange_m;
    all.append(kernel.knots);
    firstKnot[k + 1] = all.count;
  }

  const spacing_m = longest / (samples - 1);
  const data = new Float64Array(rays * samples * 3);
  const sampleCount = new Int32Array(rays);
  for (let k = 0; k < rays; k++) {
    const base = k * samples * 3;
    const count = resampleKnots(all, firstKnot[k], firstKnot[k + 1] - firstKnot[k], spacing_m, samples, data, base);
    sampleCount[k] = count;
    // Repeat the last sample to the end of the row, doubling the copied block each time.
    const end = base + 3 * samples;
    let filled = base + 3 * count;
    let block = 3;
    while (filled < end) {
      const n = Math.min(block, end - filled);
      data.copyWithin(filled, filled - n, filled);
      filled += n;
      block *= 2;
    }
  }
  const warnings: string[] = [];
  if (stepLimited > 0) warnings.push(`${stepLimited} ray(s) stopped by maxSteps = ${settings.maxSteps}`);
  return {
    paths: ndarray(data, [rays, samples, 3]),
    sampleCount,
    spacing_m,
    fate,
    fates: FATES,
    elevation_rad: Float64Array.from(elevations_rad),
    endRange_m,
    endHeight_m,
    endElevation_rad,
    minHeight_m,
    steps,
    integratorSteps,
    evaluations,
    maxInvariantDrift,
    warnings,
  };
}
