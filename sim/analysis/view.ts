/**
 * The simulated view toward the target: a grid of apparent elevations (rows) by horizontal angles
 * (columns), each cell classed as sky, sea, target or duct. Each row's ray is traced to the target
 * range: where it arrives at a height the target's silhouette covers at that column's lateral
 * offset, the cell shows the target; otherwise the cell shows what the ray meets beyond it.
 *
 * Where a ray ends. Before the target range: 'surface' → sea, 'escaped' → sky. At the target
 * range (height z, elevation α) a ray that passes the target goes on in the stratified air with
 * its invariant c = f(z) cos α, f = n·(R + z), and its fate follows exactly from the invariant
 * profile (DESIGN.md §3 items 3–4): rising, it escapes (sky) if f > c all the way up, else it
 * turns down and meets the sea if f ≥ c all the way down, else it is trapped between two heights
 * for ever (duct: light from far along the duct); falling, the same with the directions swapped.
 * So stretched, compressed, stacked and inverted images appear as they do in the transfer curve,
 * and the (false) horizon is where sea gives way to sky or duct.
 *
 * Lateral mapping: a horizontal angle φ from the line of sight to the target's centre meets the
 * target plane at the lateral offset D·tan φ (rays are traced in the vertical plane only; the
 * horizontal angles of interest are far below a degree, where the sphere's sideways curvature does
 * not matter).
 */
import { EARTH_RADIUS_M } from '../constants.js';
import { InputRangeError, requireInRange } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';
import type { Fate } from '../trace/kernel.js';
import { horizon } from './dip.js';
import { InvariantProfile } from './invariant.js';
import { RangeProbe } from './range-probe.js';
import { topAt, type Silhouette } from './silhouettes.js';
import { transferWindow, WINDOW_LIMIT_RAD, type ElevationWindow } from './transfer-window.js';

/** Class codes of the view's cells, in order: index = code. */
export const VIEW_CLASSES = ['sky', 'sea', 'target', 'duct'] as const;
export type ViewClass = (typeof VIEW_CLASSES)[number];
export const SKY = 0;
export const SEA = 1;
export const TARGET = 2;
export const DUCT = 3;

/** Options of simulatedView (defaults in VIEW_DEFAULTS). */
export interface ViewOptions {
  /** Rows (apparent elevations). Default 241. Allowed 2..4000. */
  rows?: number;
  /** Columns (horizontal angles). Default 161. Allowed 2..4000. */
  columns?: number;
  /** Elevation window, rad; default null: the transfer curve's window for the silhouette's height. */
  elevationWindow?: ElevationWindow | null;
  /** Half the horizontal field, rad; default null: 0.75 × silhouette width / range (the target fills two thirds). */
  halfWidth_rad?: number | null;
  /** Radius of the surface sphere, m. Default 6 371 000. */
  earthRadius_m?: number;
}

/** Defaults of ViewOptions. */
export const VIEW_DEFAULTS = Object.freeze({
  rows: 241,
  columns: 161,
  elevationWindow: null as ElevationWindow | null,
  halfWidth_rad: null as number | null,
  earthRadius_m: EARTH_RADIUS_M,
});

/** Share of the horizontal field the silhouette fills by default, as half-width over target width. */
const HALF_WIDTH_FACTOR = 0.75;

/** The simulated view (plain, JSON-serialisable data). Angles in rad. */
export interface SimulatedView {
  range_m: number;
  /** Row elevations, increasing (row 0 is the lowest). */
  elevations_rad: number[];
  /** Column angles from the target's centre line, increasing (negative: left). */
  azimuths_rad: number[];
  /** classes[row][column]: a code of VIEW_CLASSES. */
  classes: number[][];
  /** Height each row's ray reaches at the target range, m; null when it ends before. */
  heights_at_target_m: (number | null)[];
  /** Fate of each row's ray toward the target range. */
  fates: Fate[];
  /** Class of each row away from the target (what lies behind it). */
  background: number[];
  /** Elevation of the apparent horizon (dip.ts), rad. */
  horizon_elevation_rad: number;
  false_horizon: boolean;
  /** The apparent horizon's elevation when it is a false one, else null. */
  false_horizon_elevation_rad: number | null;
  silhouette: Silhouette;
  legend: readonly ViewClass[];
}

/**
 * Computes the simulated view.
 * @param table the medium n(z).
 * @param observerHeight_m observer height, m (0 ≤ h < table top).
 * @param range_m target range, m (1..1e6).
 * @param shape the target's silhouette (silhouettes.ts), m.
 * @param options grid size, windows, Earth radius (see ViewOptions).
 * @returns the grid of classes and its axes, per-row heights and fates, and the horizon.
 * @throws InputRangeError naming the field for bad input.
 * Reference: DESIGN.md §3 (invariant), §7 (transfer curve); the module comment.
 */
export function simulatedView(table: IndexTable, observerHeight_m: number, range_m: number, shape: Silhouette, options: ViewOptions = {}): SimulatedView {
  const rows = integerIn('rows', options.rows ?? VIEW_DEFAULTS.rows, 2, 4000);
  const columns = integerIn('columns', options.columns ?? VIEW_DEFAULTS.columns, 2, 4000);
  const R = requireInRange('earthRadius_m', options.earthRadius_m ?? VIEW_DEFAULTS.earthRadius_m, 1e5, 1e13, 'm');
  requireInRange('observerHeight_m', observerHeight_m, 0, table.top_m, 'm');
  requireInRange('range_m', range_m, 1, 1e6, 'm');
  if (!(shape.width_m > 0 && shape.height_m > 0)) throw new InputRangeError('silhouette', `${shape.width_m} × ${shape.height_m} m`, 'a width and height above 0 m');
  const probe = new RangeProbe(table, observerHeight_m, range_m, R);
  const window = options.elevationWindow ?? transferWindow(probe, shape.height_m);
  requireInRange('elevationWindow.from_rad', window.from_rad, -WINDOW_LIMIT_RAD, WINDOW_LIMIT_RAD, 'rad');
  requireInRange('elevationWindow.to_rad', window.to_rad, window.from_rad, WINDOW_LIMIT_RAD, 'rad');
  const halfWidth = options.halfWidth_rad ?? Math.atan((HALF_WIDTH_FACTOR * shape.width_m) / range_m);
  requireInRange('halfWidth_rad', halfWidth, 1e-9, 0.5, 'rad');

  const profile = new InvariantProfile(table, R);
  const elevations = grid(window.from_rad, window.to_rad, rows);
  const azimuths = grid(-halfWidth, halfWidth, columns);
  const tops = azimuths.map((phi) => topAt(shape, range_m * Math.tan(phi)));
  const heights: (number | null)[] = [];
  const fates: Fate[] = [];
  const background: number[] = [];
  const classes: number[][] = [];
  for (const elevation of elevations) {
    const ray = probe.probe(elevation);
    heights.push(ray.height_m);
    fates.push(ray.fate);
    const behind = ray.fate === 'surface' ? SEA : ray.fate === 'escaped' ? SKY : ray.fate === 'trapped' ? DUCT : beyondTarget(profile, ray.height_m!, ray.endElevation_rad);
    background.push(behind);
    const z = ray.height_m;
    classes.push(tops.map((top) => (z !== null && z <= top ? TARGET : behind)));
  }
  const hz = horizon(table, observerHeight_m, R);
  return {
    range_m,
    elevations_rad: elevations,
    azimuths_rad: azimuths,
    classes,
    heights_at_target_m: heights,
    fates,
    background,
    horizon_elevation_rad: hz.horizon_elevation_rad,
    false_horizon: hz.false_horizon,
    false_horizon_elevation_rad: hz.false_horizon ? hz.horizon_elevation_rad : null,
    silhouette: shape,
    legend: VIEW_CLASSES,
  };
}

/**
 * What a ray passing the target range at height z with elevation α meets beyond it, from its
 * invariant (see the module comment): SKY, SEA or DUCT.
 */
export function beyondTarget(profile: InvariantProfile, z_m: number, elevation_rad: number): number {
  const R = profile.earthRadius_m;
  const half = Math.sin(0.5 * elevation_rad);
  const offset = profile.offset_m(z_m) * Math.cos(elevation_rad) - 2 * R * half * half; // c − R
  const top = profile.table.top_m;
  const z = Math.min(Math.max(z_m, 0), top);
  if (elevation_rad > 0) {
    if (profile.crossingAbove(offset, z) === null) return SKY;
    return profile.crossingBelow(offset, z) === null ? SEA : DUCT;
  }
  if (profile.crossingBelow(offset, z) === null) return SEA;
  return profile.crossingAbove(offset, z) === null ? SKY : DUCT;
}

/** n equally spaced values from a to b inclusive. */
function grid(a: number, b: number, n: number): number[] {
  return Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
}

function integerIn(field: string, value: number, min: number, max: number): number {
  if (!Number.isInteger(value) || value < min || value > max) throw new InputRangeError(field, value, `integers ${min}..${max}`);
  return value;
}
