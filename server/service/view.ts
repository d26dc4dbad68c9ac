/**
 * The simulated view toward the target as plain JSON for the viewer's heatmap
 * (sim/analysis/view.ts): row elevations and column angles in degrees, class codes per cell,
 * per-row heights at the target range, and the horizon. Used by the HTTP API.
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { silhouette, type ShapeName } from '../../sim/analysis/silhouettes.js';
import { simulatedView, VIEW_CLASSES, VIEW_DEFAULTS } from '../../sim/analysis/view.js';
import { RAD_PER_DEG } from '../../sim/constants.js';
import { InputRangeError } from '../../sim/errors.js';
import type { Scenario } from '../../sim/scenario.js';
import type { Fate } from '../../sim/trace/kernel.js';
import { deg, degOrNull } from './angles.js';

/** Shape drawn when the scenario names none. */
export const DEFAULT_SHAPE: ShapeName = 'tower';

/** Options of viewFinding. */
export interface ViewFindingOptions {
  /** Rows (apparent elevations), 2..4000. Default 241. */
  rows?: number;
  /** Columns (horizontal angles), 2..4000. Default 161. */
  columns?: number;
  /** Lowest and highest row elevation, degrees (±80); default: chosen from the scene. */
  from_elevation_deg?: number;
  to_elevation_deg?: number;
  /** Half the horizontal field, degrees; default: the target fills two thirds of the width. */
  half_width_deg?: number;
  medium?: Medium;
}

/** The view JSON. */
export interface ViewJson {
  scenario: string;
  range_m: number;
  /** Row elevations, degrees, increasing (row 0 lowest). */
  elevations_deg: number[];
  /** Column angles from the target's centre line, degrees, increasing. */
  azimuths_deg: number[];
  /** classes[row][column]: index into legend. */
  classes: number[][];
  legend: readonly string[];
  heights_at_target_m: (number | null)[];
  fates: Fate[];
  /** Class behind the target for each row. */
  background: number[];
  horizon_elevation_deg: number;
  false_horizon: boolean;
  false_horizon_elevation_deg: number | null;
  silhouette: { shape: string; width_m: number; height_m: number; outline_m: [number, number][] };
  warnings: string[];
}

/**
 * The simulated view of the scenario's target.
 * @param scenario the SI scenario (target.shape and target.outline_m choose the silhouette).
 * @param options grid, windows (degrees), a prebuilt medium.
 * @throws InputRangeError naming the field for bad input.
 */
export function viewFinding(scenario: Scenario, options: ViewFindingOptions = {}): ViewJson {
  const medium = options.medium ?? buildMedium(scenario);
  const shape = silhouette((scenario.target.shape as ShapeName | undefined) ?? DEFAULT_SHAPE, Math.max(scenario.target.height_m, 1e-3), scenario.target.outline_m);
  const hasFrom = options.from_elevation_deg !== undefined;
  if (hasFrom !== (options.to_elevation_deg !== undefined)) throw new InputRangeError('to_elevation_deg', options.to_elevation_deg ?? null, 'give both from_elevation_deg and to_elevation_deg, or neither');
  const view = simulatedView(medium.table, scenario.observer.height_m, scenario.target.range_m, shape, {
    rows: options.rows ?? VIEW_DEFAULTS.rows,
    columns: options.columns ?? VIEW_DEFAULTS.columns,
    elevationWindow: hasFrom ? { from_rad: options.from_elevation_deg! * RAD_PER_DEG, to_rad: options.to_elevation_deg! * RAD_PER_DEG } : null,
    halfWidth_rad: options.half_width_deg !== undefined ? options.half_width_deg * RAD_PER_DEG : null,
    earthRadius_m: scenario.earth.radius_m,
  });
  return {
    scenario: scenario.name,
    range_m: view.range_m,
    elevations_deg: view.elevations_rad.map(deg),
    azimuths_deg: view.azimuths_rad.map(deg),
    classes: view.classes,
    legend: VIEW_CLASSES,
    heights_at_target_m: view.heights_at_target_m,
    fates: view.fates,
    background: view.background,
    horizon_elevation_deg: deg(view.horizon_elevation_rad),
    false_horizon: view.false_horizon,
    false_horizon_elevation_deg: degOrNull(view.false_horizon_elevation_rad),
    silhouette: { shape: shape.shape, width_m: shape.width_m, height_m: shape.height_m, outline_m: shape.outline_m },
    warnings: medium.warnings,
  };
}
