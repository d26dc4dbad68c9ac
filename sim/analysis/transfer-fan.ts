/**
 * The self-refining fan behind the transfer curve: rays from the observer to the target range over
 * an elevation window, subdivided where the height at the target range changes fast or bends
 * (near folds and near the horizon), and bisected where the fate changes, so that every fate
 * boundary is pinned to FAN_DEFAULTS.boundaryTolerance_rad.
 */
import { RAD_PER_DEG } from '../constants.js';
import type { RangeProbe, RangeSample } from './range-probe.js';
import type { ElevationWindow } from './transfer-window.js';

/** Options of the fan (defaults in FAN_DEFAULTS). */
export interface FanOptions {
  /**
   * Rays of the first, uniform fan over the window. Default 121: the refinement below adds rays
   * wherever the height steps, bends or fates demand (measured over the eight scenarios of
   * profiles/ and their US 1976 references: 241, 121, 61 and 31 first rays give the same images,
   * folds and hidden bands, image ends within 7e-8°, while 121 traces 10–45 % fewer rays than 241,
   * mostly rays that meet the sea below the window's useful part).
   */
  rays?: number;
  /**
   * Largest height step between neighbouring rays below the maximum height, m. Default null:
   * maxHeight_m / 200. Above the maximum height the step allowed is ten times larger.
   */
  heightStep_m?: number | null;
  /** Narrowest elevation interval the refinement splits, rad. Default 1e-5° (0.036″). */
  minSpacing_rad?: number;
  /** Width to which a fate boundary is bisected, rad. Default 1e-12 rad (2e-7 arcsec). */
  boundaryTolerance_rad?: number;
  /** Most rays traced (refinement stops with a warning beyond it). Default 20 000. */
  maxRays?: number;
}

/** Defaults of FanOptions (repeated in each option's doc comment). */
export const FAN_DEFAULTS = Object.freeze({
  rays: 121,
  heightStep_m: null as number | null,
  minSpacing_rad: 1e-5 * RAD_PER_DEG,
  boundaryTolerance_rad: 1e-12,
  maxRays: 20_000,
});

/** Default height step as a fraction of the maximum height (200 steps over the target). */
const HEIGHT_STEP_FRACTION = 1 / 200;
/** Allowed miss of a linear prediction from the neighbouring interval, as a fraction of the height step. */
const BEND_FRACTION = 0.25;
/** Relaxation of the height step above the maximum height (only the shape matters there). */
const ABOVE_TOP_RELAXATION = 10;
/** Two surface rays whose surface ranges differ by more than this fraction of the target range are split. */
const SURFACE_RANGE_FRACTION = 0.05;
/** Most refinement passes (each can halve every interval once). */
const MAX_PASSES = 60;

/** A fate boundary between two neighbouring rays, bisected to the boundary tolerance. */
export interface FanBoundary {
  /** Ray just below the boundary. */
  below: RangeSample;
  /** Ray just above the boundary. */
  above: RangeSample;
}

/** The refined fan. */
export interface Fan {
  /** Every ray traced into the fan, sorted by elevation (no duplicates). */
  samples: RangeSample[];
  /** Fate boundaries, by elevation; below/above are members of samples. */
  boundaries: FanBoundary[];
  warnings: string[];
}

/**
 * Traces and refines the fan.
 * @param probe traces rays to the target range.
 * @param window elevation window, rad (from < to).
 * @param maxHeight_m highest height of interest at the target range, m (> 0).
 * @param options see FanOptions.
 * @returns the samples and the fate boundaries. The probe's count is the work done.
 */
export function refinedFan(probe: RangeProbe, window: ElevationWindow, maxHeight_m: number, options: FanOptions = {}): Fan {
  const rays = options.rays ?? FAN_DEFAULTS.rays;
  const step = options.heightStep_m ?? maxHeight_m * HEIGHT_STEP_FRACTION;
  const minSpacing = options.minSpacing_rad ?? FAN_DEFAULTS.minSpacing_rad;
  const boundaryTolerance = options.boundaryTolerance_rad ?? FAN_DEFAULTS.boundaryTolerance_rad;
  const maxRays = probe.count + (options.maxRays ?? FAN_DEFAULTS.maxRays);
  const warnings: string[] = [];

  let samples: RangeSample[] = [];
  for (let i = 0; i < rays; i++) {
    // The last ray exactly at the window's top (the formula can round past it, and past the tracer's 80°).
    samples.push(probe.probe(i === rays - 1 ? window.to_rad : window.from_rad + ((window.to_rad - window.from_rad) * i) / (rays - 1)));
  }
  const criteria = { step, minSpacing, maxHeight_m, range_m: probe.range_m };
  let pass = 0;
  for (; pass < MAX_PASSES; pass++) {
    const split = intervalsToSplit(samples, criteria);
    if (split.length === 0) break;
    if (probe.count + split.length > maxRays) {
      warnings.push(`the fan stopped refining at ${probe.count} rays (maxRays); heights may be coarse in places`);
      break;
    }
    const added = split.map((i) => probe.probe(0.5 * (samples[i].elevation_rad + samples[i + 1].elevation_rad)));
    samples = mergeSorted(samples, added);
  }
  if (pass === MAX_PASSES) warnings.push(`the fan stopped refining after ${MAX_PASSES} passes`);

  const boundaries: FanBoundary[] = [];
  const extra: RangeSample[] = [];
  for (let i = 0; i + 1 < samples.length; i++) {
    if (samples[i].fate !== samples[i + 1].fate) bisectBoundary(probe, samples[i], samples[i + 1], boundaryTolerance, boundaries, extra);
  }
  samples = mergeSorted(samples, extra);
  boundaries.sort((a, b) => a.below.elevation_rad - b.below.elevation_rad);
  return { samples, boundaries, warnings };
}

interface SplitCriteria {
  step: number;
  minSpacing: number;
  maxHeight_m: number;
  range_m: number;
}

/** Indices i of the intervals [i, i + 1] that need a midpoint. */
function intervalsToSplit(samples: RangeSample[], c: SplitCriteria): number[] {
  const flagged = new Uint8Array(samples.length);
  for (let i = 0; i + 1 < samples.length; i++) {
    const a = samples[i];
    const b = samples[i + 1];
    if (b.elevation_rad - a.elevation_rad <= c.minSpacing || a.fate !== b.fate) continue;
    if (a.fate === 'surface' && Math.abs(b.endRange_m - a.endRange_m) > SURFACE_RANGE_FRACTION * c.range_m) flagged[i] = 1;
    if (a.height_m === null || b.height_m === null) continue;
    const allowed = Math.min(a.height_m, b.height_m) > c.maxHeight_m ? c.step * ABOVE_TOP_RELAXATION : c.step;
    if (Math.abs(b.height_m - a.height_m) > allowed) flagged[i] = 1;
    // Bend: the line through the previous interval misses b (or the next interval's line misses a).
    for (const [p, q, r, mark] of [
      [i - 1, i, i + 1, i - 1],
      [i + 2, i + 1, i, i + 1],
    ] as const) {
      if (p < 0 || p >= samples.length) continue;
      const sp = samples[p];
      if (sp.height_m === null) continue;
      const sq = samples[q];
      const sr = samples[r];
      const slope = (sq.height_m! - sp.height_m) / (sq.elevation_rad - sp.elevation_rad);
      const predicted = sq.height_m! + slope * (sr.elevation_rad - sq.elevation_rad);
      if (Math.abs(sr.height_m! - predicted) > BEND_FRACTION * allowed) {
        flagged[i] = 1;
        if (samples[mark + 1].elevation_rad - samples[mark].elevation_rad > c.minSpacing) flagged[mark] = 1;
      }
    }
  }
  const out: number[] = [];
  for (let i = 0; i < flagged.length; i++) if (flagged[i]) out.push(i);
  return out;
}

/**
 * Bisects between two rays of different fates until they are closer than the tolerance; a ray of
 * a third fate met on the way opens a second boundary, bisected in turn. The rays are traced with
 * the fine tolerance: next to a boundary the height at the target range can depend on the
 * elevation like a square root (a ray that barely clears a corner of n·r), which magnifies the
 * integrator's error in the invariant.
 */
function bisectBoundary(probe: RangeProbe, lower: RangeSample, upper: RangeSample, tolerance: number, boundaries: FanBoundary[], extra: RangeSample[]): void {
  let lo = lower;
  let hi = upper;
  while (hi.elevation_rad - lo.elevation_rad > tolerance) {
    const mid = 0.5 * (lo.elevation_rad + hi.elevation_rad);
    if (mid <= lo.elevation_rad || mid >= hi.elevation_rad) break;
    const m = probe.probe(mid, true);
    extra.push(m);
    if (m.fate === lo.fate) lo = m;
    else if (m.fate === hi.fate) hi = m;
    else {
      bisectBoundary(probe, m, hi, tolerance, boundaries, extra);
      hi = m;
    }
  }
  boundaries.push({ below: lo, above: hi });
}

/** Merges two lists of samples into one sorted by elevation, dropping repeated elevations. */
export function mergeSorted(a: RangeSample[], b: RangeSample[]): RangeSample[] {
  const all = a.concat(b).sort((x, y) => x.elevation_rad - y.elevation_rad);
  return all.filter((s, i) => i === 0 || s.elevation_rad !== all[i - 1].elevation_rad);
}
