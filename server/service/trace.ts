/**
 * Tracing a set of rays for a scenario and shaping the DESIGN.md §6 `trace` JSON: the one place
 * that builds that JSON, shared by the CLI `trace` command and the HTTP API (POST /api/trace).
 */
import { RAD_PER_DEG } from '../../sim/constants.js';
import { deg } from './angles.js';
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { InputRangeError } from '../../sim/errors.js';
import type { Scenario } from '../../sim/scenario.js';
import { rayTracer, type RayResult } from '../../sim/trace/ray.js';
import { MAX_ELEVATION_RAD } from '../../sim/trace/options.js';
import { RangeProbe } from '../../sim/analysis/range-probe.js';
import { transferWindow } from '../../sim/analysis/transfer-window.js';

/** One traced ray in the `trace` JSON. */
export interface TracedRay {
  /** Apparent elevation at the observer, degrees (positive upward). */
  elevation_deg: number;
  /** 'target' (reached the target range), 'surface', 'escaped' (left the top of the model) or 'trapped'. */
  fate: 'target' | 'surface' | 'escaped' | 'trapped';
  /** Height at the target range, m; null unless fate is 'target'. */
  height_at_target_m: number | null;
  /** Where the ray ended: ground range, m, and height, m. */
  end_range_m: number;
  end_height_m: number;
  /** The path as [range_m, height_m] pairs (range rounded to 0.1 m, height to 1 mm), down-sampled. */
  path: [number, number][];
}

/** The `trace` JSON (DESIGN.md §6) with a few extra fields for drawing. */
export interface TraceResult {
  scenario: string;
  /** Target range, m: where rays stop with fate 'target'. */
  range_m: number;
  observer_height_m: number;
  target_height_m: number;
  earth_radius_m: number;
  rays: TracedRay[];
  /** Number of rays of each fate. */
  fates: Record<TracedRay['fate'], number>;
  warnings: string[];
}

/** Options of traceRays; defaults in TRACE_DEFAULTS. */
export interface TraceRaysOptions {
  /** Points per ray path (uniform in range, plus the end point). Default 121; allowed 2..100 000. */
  path_points?: number;
  /** Most integrator steps per ray (a ray stopped by it ends 'trapped' with a warning). Default 100 000. */
  max_steps?: number;
  /** A medium already built for this scenario (saves rebuilding it). Default: buildMedium(scenario). */
  medium?: Medium;
}

/** Defaults of traceRays and automaticFan. */
export const TRACE_DEFAULTS = Object.freeze({
  path_points: 121,
  max_steps: 100_000,
  /** The automatic fan frames heights at the target range up to this multiple of the target's height. */
  fan_top_factor: 1.5,
});

/** Decimal places kept in paths: 0.1 m in range, 1 mm in height (well below what a plot shows). */
const RANGE_DECIMALS = 1;
/** Lowest top of the automatic fan's frame, m (a target of height 0 still gets a view of the sea's edge). */
const MIN_FAN_TOP_M = 1;
const HEIGHT_DECIMALS = 3;

function round(value: number, decimals: number): number {
  const scale = 10 ** decimals;
  return Math.round(value * scale) / scale;
}

/**
 * Traces rays at the given apparent elevations from the scenario's observer toward its target and
 * returns the DESIGN.md §6 `trace` JSON.
 *
 * Rays stop at the target range (fate 'target'), on the surface, or at the top of the model; the
 * maximum range is the target range, so 'trapped' appears only when the step limit stops a ray.
 * @param scenario the SI scenario (server/scenario/convert.ts).
 * @param elevations_deg apparent elevations at the observer, degrees, each within ±80 (the tracer's limit).
 * @param options path points, step limit, a prebuilt medium (TraceRaysOptions; defaults TRACE_DEFAULTS).
 * @returns rays with fate, height at the target range and down-sampled path; warnings of the
 *   medium and of the rays (once each).
 * @throws InputRangeError naming `elevations_deg[i]` or the option, with the allowed range.
 * Accuracy: heights at the target as the tracer gives them (sim/trace/options.ts tolerance_m);
 * path points between the integrator's own steps are cubic Hermite interpolants (display only).
 * Reference: DESIGN.md §3 (ray equations) and §6 (trace JSON).
 */
export function traceRays(scenario: Scenario, elevations_deg: readonly number[], options: TraceRaysOptions = {}): TraceResult {
  const pathPoints = options.path_points ?? TRACE_DEFAULTS.path_points;
  if (!Number.isInteger(pathPoints) || pathPoints < 2 || pathPoints > 100_000) throw new InputRangeError('path_points', pathPoints, 'integers 2..100000');
  const limit_deg = deg(MAX_ELEVATION_RAD);
  elevations_deg.forEach((e, i) => {
    if (typeof e !== 'number' || !Number.isFinite(e) || Math.abs(e) > limit_deg) throw new InputRangeError(`elevations_deg[${i}]`, e, `-${limit_deg}..${limit_deg} degrees`);
  });
  const medium = options.medium ?? buildMedium(scenario);
  const range_m = scenario.target.range_m;
  const traceOptions = {
    earthRadius_m: scenario.earth.radius_m,
    stopRange_m: range_m,
    maxRange_m: range_m,
    recordPath: true,
    pathSpacing_m: range_m / (pathPoints - 1),
    maxPathSamples: pathPoints + 1,
    maxSteps: options.max_steps ?? TRACE_DEFAULTS.max_steps,
  };
  const fates: TraceResult['fates'] = { target: 0, surface: 0, escaped: 0, trapped: 0 };
  const rayWarnings = new Set<string>();
  // One kernel for every ray, made at the first (so an empty list checks nothing, as before).
  let trace: ((elevation_rad: number) => RayResult) | null = null;
  const rays = elevations_deg.map((elevation_deg): TracedRay => {
    trace ??= rayTracer(medium.table, scenario.observer.height_m, traceOptions);
    const ray = trace(elevation_deg * RAD_PER_DEG);
    fates[ray.fate]++;
    for (const w of ray.warnings) rayWarnings.add(w.replace(/ at range [0-9.e+-]+ m$/, ''));
    const path: [number, number][] = [];
    const p = ray.path;
    if (p) for (let j = 0; j < p.range_m.length; j++) path.push([round(p.range_m[j], RANGE_DECIMALS), round(p.height_m[j], HEIGHT_DECIMALS)]);
    return {
      elevation_deg,
      fate: ray.fate,
      height_at_target_m: ray.fate === 'target' ? ray.end.height_m : null,
      end_range_m: ray.end.range_m,
      end_height_m: ray.end.height_m,
      path,
    };
  });
  const warnings = [...medium.warnings, ...[...rayWarnings].map((w) => `a ray stopped early: ${w}`)];
  return {
    scenario: scenario.name,
    range_m,
    observer_height_m: scenario.observer.height_m,
    target_height_m: scenario.target.height_m,
    earth_radius_m: scenario.earth.radius_m,
    rays,
    fates,
    warnings,
  };
}

/**
 * Evenly spaced elevations from `from_deg` to `to_deg` inclusive (one value when count is 1).
 * @param from_deg first elevation, degrees. @param to_deg last elevation, degrees.
 * @param count number of rays, ≥ 1.
 * @returns the elevations, degrees.
 */
export function fanElevations(from_deg: number, to_deg: number, count: number): number[] {
  if (count === 1) return [from_deg];
  return Array.from({ length: count }, (_, i) => from_deg + ((to_deg - from_deg) * i) / (count - 1));
}

/**
 * A fan that frames the scene at the target range: the elevation window whose rays reach the
 * target range between the surface and TRACE_DEFAULTS.fan_top_factor × the target's height, with
 * the window's own margins (sim/analysis/transfer-window.ts: the invariant bounds, widened by
 * probing rays until the ends meet the surface and clear the top).
 * @param scenario the SI scenario. @param medium its medium (default: built here).
 * @returns from_deg and to_deg, degrees, within ±80.
 * Reference: sim/analysis/transfer-window.ts (DESIGN.md §3 items 3–4).
 */
export function automaticFan(scenario: Scenario, medium: Medium = buildMedium(scenario)): { from_deg: number; to_deg: number } {
  const probe = new RangeProbe(medium.table, scenario.observer.height_m, scenario.target.range_m, scenario.earth.radius_m);
  const window = transferWindow(probe, TRACE_DEFAULTS.fan_top_factor * Math.max(scenario.target.height_m, MIN_FAN_TOP_M));
  return { from_deg: deg(window.from_rad), to_deg: deg(window.to_rad) };
}
