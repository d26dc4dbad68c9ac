/**
 * Sighting range: how the visibility of a target changes as it moves along the line of sight,
 * and the ranges at which its top, a light at a given height, and its whole height become visible
 * (approaching) or are last seen (receding).
 *
 * Method. Visibility is evaluated on a grid of ranges (same air, observer and target; only the
 * range changes); where a predicate (top seen, light seen, whole height seen) changes between two
 * neighbouring grid ranges, the change is bisected to `tolerance_m`. For an approaching target the
 * event is the outermost range at which the predicate holds (scanning inward: the first range at
 * which it is seen); for a receding one it is the same outermost range seen from the other side
 * (the last range at which it is seen). Changes between grid points narrower than the grid
 * spacing (a target that flickers in and out of a duct) can be missed: `visible_ranges` lists the
 * intervals found on the grid.
 */
import { InputError, InputRangeError, requireInRange } from '../errors.js';

/** What a visibility evaluation at one range must give (DESIGN.md §6 `visibility`, plus hidden bands). */
export interface RangeVisibility {
  /** Height at the target range below which nothing is seen, m (the target's top when none is seen). */
  hidden_height_m: number;
  /** Fraction 0..1 of the target's height seen at least once. */
  visible_fraction: number;
  status: 'visible' | 'partly-hidden' | 'hidden';
  /** Heights above the hidden height that no ray reaches, m. */
  hidden_bands: readonly { from_height_m: number; to_height_m: number }[];
}

export type SightingDirection = 'approaching' | 'receding';

/** Options of the sighting sweep (defaults in SIGHTING_DEFAULTS). */
export interface SightingOptions {
  /** Nearest range of the grid, m (10..1e6). */
  from_m: number;
  /** Farthest range of the grid, m (> from_m, ≤ 1e6). */
  to_m: number;
  /** Grid ranges, 2..500. Default 24. */
  count?: number;
  /** 'approaching' (default): first seen; 'receding': last seen. */
  direction?: SightingDirection;
  /** Height of a light on the target, m (0..target height), or null for none. Default null. */
  light_height_m?: number | null;
  /** Width to which each event is bisected, m (0.01..1e5). Default 20 m. */
  tolerance_m?: number;
}

export const SIGHTING_DEFAULTS = Object.freeze({ count: 24, direction: 'approaching' as SightingDirection, light_height_m: null as number | null, tolerance_m: 20 });

/** One grid range of the sweep. */
export interface SightingRow {
  range_m: number;
  hidden_height_m: number;
  visible_fraction: number;
  status: RangeVisibility['status'];
  top_visible: boolean;
  light_visible: boolean | null;
  whole_visible: boolean;
}

/** An event of the sweep: where an element is first (approaching) or last (receding) seen. */
export interface SightingEvent {
  /** The range, m; null when never seen on the grid. When seen at the farthest grid range, that range (it may be seen farther). */
  range_m: number | null;
  /** True when seen at the farthest grid range too (the true range may be larger). */
  beyond_grid: boolean;
  /** Intervals of the grid where it is seen, m. */
  visible_ranges: { from_m: number; to_m: number }[];
}

export interface SightingResult {
  direction: SightingDirection;
  target_height_m: number;
  light_height_m: number | null;
  rows: SightingRow[];
  top: SightingEvent;
  light: SightingEvent | null;
  whole: SightingEvent;
  /** Visibility evaluations spent (grid and bisection). */
  evaluations: number;
}

/** Below this visible fraction shortfall the whole height counts as seen (rounding of heights, dimensionless). */
const WHOLE_FRACTION_SLACK = 1e-9;

type Predicate = (v: RangeVisibility) => boolean;

/** True when the height lies above the hidden height and outside every hidden band. */
function heightSeen(v: RangeVisibility, height_m: number): boolean {
  if (v.status === 'hidden' || height_m < v.hidden_height_m) return false;
  return !v.hidden_bands.some((b) => height_m > b.from_height_m && height_m < b.to_height_m);
}

/** Checks the options once (InputRangeError / InputError naming the field). */
export function resolveSightingOptions(options: SightingOptions, targetHeight_m: number): Required<SightingOptions> {
  const from_m = requireInRange('sighting.from_m', options.from_m, 10, 1e6, 'm');
  const to_m = requireInRange('sighting.to_m', options.to_m, 10, 1e6, 'm');
  if (!(to_m > from_m)) throw new InputRangeError('sighting.to_m', to_m, `${from_m}..1e6 m (above sighting.from_m)`);
  const count = options.count ?? SIGHTING_DEFAULTS.count;
  if (!Number.isInteger(count) || count < 2 || count > 500) throw new InputRangeError('sighting.count', count, 'integers 2..500');
  const direction = options.direction ?? SIGHTING_DEFAULTS.direction;
  if (direction !== 'approaching' && direction !== 'receding') throw new InputError('sighting.direction', `"${String(direction)}" is not one of approaching, receding`);
  const light = options.light_height_m ?? null;
  if (light !== null) requireInRange('sighting.light_height_m', light, 0, targetHeight_m, 'm (up to the target height)');
  const tolerance_m = requireInRange('sighting.tolerance_m', options.tolerance_m ?? SIGHTING_DEFAULTS.tolerance_m, 0.01, 1e5, 'm');
  return { from_m, to_m, count, direction, light_height_m: light, tolerance_m };
}

/**
 * Sweeps visibility over range and locates the sighting events.
 * @param visibilityAt visibility of the target at a range, m → RangeVisibility (same air, observer, target).
 * @param targetHeight_m the target's height, m (> 0).
 * @param options grid, direction, light height, tolerance (see SightingOptions).
 * @returns rows for every grid range, the events for top, light (when given) and whole height, and
 *   the evaluations spent. Event ranges are accurate to tolerance_m where the predicate changes once
 *   between grid points.
 * @throws InputRangeError / InputError for bad options.
 */
export function sightingSweep(visibilityAt: (range_m: number) => RangeVisibility, targetHeight_m: number, options: SightingOptions): SightingResult {
  const o = resolveSightingOptions(options, targetHeight_m);
  let evaluations = 0;
  const at = (r: number) => {
    evaluations++;
    return visibilityAt(r);
  };
  const ranges = Array.from({ length: o.count }, (_, i) => o.from_m + ((o.to_m - o.from_m) * i) / (o.count - 1));
  const grid = ranges.map(at);
  const top: Predicate = (v) => v.status !== 'hidden' && v.hidden_height_m < targetHeight_m;
  const whole: Predicate = (v) => v.status === 'visible' || (v.hidden_height_m === 0 && v.visible_fraction >= 1 - WHOLE_FRACTION_SLACK);
  const light = o.light_height_m;
  const lightSeen: Predicate | null = light === null ? null : (v) => heightSeen(v, light);
  const rows = grid.map((v, i) => ({
    range_m: ranges[i],
    hidden_height_m: v.hidden_height_m,
    visible_fraction: v.visible_fraction,
    status: v.status,
    top_visible: top(v),
    light_visible: lightSeen ? lightSeen(v) : null,
    whole_visible: whole(v),
  }));
  const event = (p: Predicate) => locateEvent(ranges, grid.map(p), p, at, o.tolerance_m);
  return {
    direction: o.direction,
    target_height_m: targetHeight_m,
    light_height_m: light,
    rows,
    top: event(top),
    light: lightSeen ? event(lightSeen) : null,
    whole: event(whole),
    evaluations,
  };
}

/** The outermost grid range where the predicate holds, bisected outward to the tolerance. */
function locateEvent(ranges: readonly number[], seen: readonly boolean[], p: Predicate, at: (r: number) => RangeVisibility, tolerance_m: number): SightingEvent {
  const visible_ranges: { from_m: number; to_m: number }[] = [];
  for (let i = 0; i < ranges.length; i++) {
    if (!seen[i]) continue;
    const last = visible_ranges[visible_ranges.length - 1];
    if (last && seen[i - 1]) last.to_m = ranges[i];
    else visible_ranges.push({ from_m: ranges[i], to_m: ranges[i] });
  }
  const outer = seen.lastIndexOf(true);
  if (outer < 0) return { range_m: null, beyond_grid: false, visible_ranges };
  if (outer === ranges.length - 1) return { range_m: ranges[outer], beyond_grid: true, visible_ranges };
  let inside = ranges[outer];
  let outside = ranges[outer + 1];
  while (outside - inside > tolerance_m) {
    const mid = 0.5 * (inside + outside);
    if (p(at(mid))) inside = mid;
    else outside = mid;
  }
  return { range_m: 0.5 * (inside + outside), beyond_grid: false, visible_ranges };
}

/**
 * A default grid for a target: from a quarter to 1.6 times the straight-line distance at which its
 * top would just clear the horizon without air, sqrt(2Rh) + sqrt(2RH) (common practice, no source),
 * clamped to 10..1e6 m.
 * @param observerHeight_m eye height, m (≥ 0).
 * @param targetHeight_m target height, m (≥ 0).
 * @param earthRadius_m radius of the sphere, m.
 * @returns from_m and to_m, m.
 */
export function defaultSightingGrid(observerHeight_m: number, targetHeight_m: number, earthRadius_m: number): { from_m: number; to_m: number } {
  const geometric = Math.sqrt(2 * earthRadius_m * observerHeight_m) + Math.sqrt(2 * earthRadius_m * targetHeight_m);
  const from_m = Math.min(1e6 - 10, Math.max(10, 0.25 * geometric));
  return { from_m, to_m: Math.min(1e6, Math.max(from_m + 10, 1.6 * geometric)) };
}
