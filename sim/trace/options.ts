/**
 * Options of the ray tracer, their defaults (one DEFAULTS object, STYLE.md §7) and the one-time
 * validation done by the public entry points traceRay and traceFan (STYLE.md §6).
 */
import { EARTH_RADIUS_M, RAD_PER_DEG } from '../constants.js';
import { InputRangeError, requireInRange } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';

/**
 * Steepest elevation accepted, rad (80°). With ground range as the independent variable,
 * dz/ds = (r/R)·tan α grows without bound toward the vertical; up to 80° tan α ≤ 5.7 and the steps
 * stay well conditioned. Steeper rays belong to the quadrature (sim/trace/quadrature.ts).
 */
export const MAX_ELEVATION_RAD = 80 * RAD_PER_DEG;

/** Options of traceRay and traceFan; every one is optional (defaults in DEFAULTS). */
export interface TraceOptions {
  /** Radius of the surface sphere, m. Default 6 371 000 (DESIGN.md §2). Allowed 1e5..1e16; ≥ 1e12 approximates flat geometry. */
  earthRadius_m?: number;
  /**
   * Range at which a ray that is still inside the domain ends with fate 'target' (typically the
   * target's range), m. Default Infinity: no target, rays run to maxRange_m and end 'trapped'.
   */
  stopRange_m?: number;
  /** Largest range traced, m; a ray reaching it (before stopRange_m) ends 'trapped'. Default 200 000. Allowed (0, 1e8]. */
  maxRange_m?: number;
  /** Top of the domain, m: a ray reaching it ends 'escaped'. Default null: the table's top. Allowed (observer height, table top]. */
  top_m?: number | null;
  /**
   * Local error accepted per integrator step, m: the larger of the height error and the elevation error times
   * the lever arm L = min(stopRange_m, maxRange_m) (so an angle error is weighed by the height it
   * would cost at the end). Default 2e-6 m. Measured over 1001-ray fans from 10 m through a
   * 10 K / 30 m surface inversion to 50 km (bench/trace.ts): worst final-height error 3e-6 m
   * (Ciddor medium) and 3e-5 m (test medium) against a 1e-13 m run; the error scales about
   * linearly with the tolerance (1e-5 m gave 1.3e-4 m). Allowed 1e-15..1 m.
   */
  tolerance_m?: number;
  /** Record the path (traceRay only; traceFan always resamples). Default false. */
  recordPath?: boolean;
  /** Spacing of the recorded path, m; 0 keeps the integrator's own points (steps and events). Default 0. */
  pathSpacing_m?: number;
  /** Most path samples per ray (the spacing widens to fit). Default 100 000. Allowed 2..1e7. */
  maxPathSamples?: number;
  /** Most integrator steps per ray; a ray stopped by this ends 'trapped' with a warning. Default 100 000. */
  maxSteps?: number;
  /** traceFan only: samples per ray in the resampled paths. Default 200. Allowed 2..100 000 (and rays × samples ≤ 2e7). */
  samplesPerRay?: number;
}

/** Defaults of every trace option (repeated in each option's doc comment). */
export const DEFAULTS = Object.freeze({
  earthRadius_m: EARTH_RADIUS_M,
  stopRange_m: Number.POSITIVE_INFINITY,
  maxRange_m: 200_000,
  top_m: null as number | null,
  tolerance_m: 2e-6,
  recordPath: false,
  pathSpacing_m: 0,
  maxPathSamples: 100_000,
  maxSteps: 100_000,
  samplesPerRay: 200,
});

/** Options with defaults filled in and derived quantities; what the kernel reads. */
export interface TraceSettings {
  readonly earthRadius_m: number;
  readonly stopRange_m: number;
  readonly maxRange_m: number;
  /** min(stopRange_m, maxRange_m): where integration stops. */
  readonly endRange_m: number;
  /** True when reaching endRange_m means 'target' (stopRange_m ≤ maxRange_m). */
  readonly endIsTarget: boolean;
  readonly top_m: number;
  readonly tolerance_m: number;
  readonly recordPath: boolean;
  readonly pathSpacing_m: number;
  readonly maxPathSamples: number;
  readonly maxSteps: number;
}

/**
 * Fills defaults and validates the options against the table (throws InputRangeError naming the
 * option and its allowed range).
 */
export function resolveTraceOptions(table: IndexTable, options: TraceOptions = {}): TraceSettings {
  const earthRadius_m = requireInRange('earthRadius_m', options.earthRadius_m ?? DEFAULTS.earthRadius_m, 1e5, 1e16, 'm');
  const maxRange_m = requireInRange('maxRange_m', options.maxRange_m ?? DEFAULTS.maxRange_m, 0, 1e8, 'm');
  if (maxRange_m === 0) throw new InputRangeError('maxRange_m', 0, '(0, 1e8] m');
  const stopRange_m = options.stopRange_m ?? DEFAULTS.stopRange_m;
  if (typeof stopRange_m !== 'number' || Number.isNaN(stopRange_m) || !(stopRange_m > 0)) {
    throw new InputRangeError('stopRange_m', stopRange_m, '(0, Infinity] m');
  }
  const top_m = options.top_m ?? DEFAULTS.top_m ?? table.top_m;
  requireInRange('top_m', top_m, Number.MIN_VALUE, table.top_m, 'm (the table top)');
  const tolerance_m = requireInRange('tolerance_m', options.tolerance_m ?? DEFAULTS.tolerance_m, 1e-15, 1, 'm');
  const pathSpacing_m = requireInRange('pathSpacing_m', options.pathSpacing_m ?? DEFAULTS.pathSpacing_m, 0, 1e8, 'm');
  const maxPathSamples = requireInteger('maxPathSamples', options.maxPathSamples ?? DEFAULTS.maxPathSamples, 2, 1e7);
  const maxSteps = requireInteger('maxSteps', options.maxSteps ?? DEFAULTS.maxSteps, 1, 1e8);
  return {
    earthRadius_m,
    stopRange_m,
    maxRange_m,
    endRange_m: Math.min(stopRange_m, maxRange_m),
    endIsTarget: stopRange_m <= maxRange_m,
    top_m,
    tolerance_m,
    recordPath: options.recordPath ?? DEFAULTS.recordPath,
    pathSpacing_m,
    maxPathSamples,
    maxSteps,
  };
}

/** Validates an observer height against the settings' domain: 0 ≤ h < top_m. */
export function requireObserverHeight(observerHeight_m: number, settings: TraceSettings): void {
  if (typeof observerHeight_m !== 'number' || !Number.isFinite(observerHeight_m) || observerHeight_m < 0 || observerHeight_m >= settings.top_m) {
    throw new InputRangeError('observerHeight_m', observerHeight_m, `0 <= h < ${settings.top_m} m (top_m)`);
  }
}

/** Validates one elevation angle: finite, |α| ≤ MAX_ELEVATION_RAD. */
export function requireElevation(field: string, elevation_rad: number): void {
  requireInRange(field, elevation_rad, -MAX_ELEVATION_RAD, MAX_ELEVATION_RAD, 'rad (±80°)');
}

/** Throws InputRangeError unless value is an integer within [min, max]. */
export function requireInteger(field: string, value: number, min: number, max: number): number {
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new InputRangeError(field, value, `integers ${min}..${max}`);
  }
  return value;
}
