/**
 * The DESIGN.md §6 `transfer` JSON: the transfer curve at the target range, its images and hidden
 * bands, with the looming / towering comparison against the US 1976 atmosphere and pure geometry.
 * Shared by the CLI `transfer` command, `findings` and the HTTP API.
 */
import type { SightImage } from '../../sim/analysis/images.js';
import { compareScenes, type SceneComparison } from '../../sim/analysis/looming.js';
import type { TransferCurve } from '../../sim/analysis/transfer.js';
import type { Fate } from '../../sim/trace/kernel.js';
import type { Scenario } from '../../sim/scenario.js';
import { arcmin, arcminOrNull, deg, degOrNull } from './angles.js';
import { sightCurves, type SightCurves, type SightOptions } from './sight.js';

/** One image in the JSON (DESIGN.md §6; from_height_m ≤ to_height_m, each elevation where that height is seen). */
export interface ImageJson {
  from_height_m: number;
  to_height_m: number;
  from_elevation_deg: number;
  to_elevation_deg: number;
  orientation: 'erect' | 'inverted';
  /** Angular height of the image, arcmin. */
  angular_extent_arcmin: number;
  /** Mean vertical magnification d elevation / d height, arcmin per m. */
  magnification_arcmin_per_m: number;
  /** Magnification over that of straight lines for the same heights (1: as without air); null if undefined. */
  relative_magnification: number | null;
  /** True when the piece went on above max_height_m and was cut there. */
  clipped: boolean;
}

/** The target against one reference scene (sim/analysis/looming.ts), in degrees and arcminutes. */
export interface ComparisonJson {
  top_elevation_deg: number | null;
  reference_top_elevation_deg: number | null;
  /** Positive: the top is seen higher than in the reference. */
  top_shift_arcmin: number | null;
  base_elevation_deg: number | null;
  reference_base_elevation_deg: number | null;
  base_shift_arcmin: number | null;
  magnification_ratio: number | null;
  looming: SceneComparison['looming'];
  towering: SceneComparison['towering'];
}

/** The `transfer` JSON. */
export interface TransferJson {
  scenario: string;
  range_m: number;
  observer_height_m: number;
  max_height_m: number;
  window: { from_elevation_deg: number; to_elevation_deg: number };
  rays: { elevation_deg: number; height_m: number | null; fate: Fate }[];
  images: ImageJson[];
  lowest_visible_height_m: number | null;
  hidden_bands: { from_height_m: number; to_height_m: number }[];
  folds: { elevation_deg: number; height_m: number; kind: 'max' | 'min' }[];
  boundaries: { elevation_deg: number; below_fate: Fate; above_fate: Fate; height_m: number | null }[];
  /** Against the US 1976 atmosphere at the same surface air and against pure geometry; null when not computed. */
  looming: { standard: ComparisonJson | null; geometry: ComparisonJson | null };
  rays_traced: number;
  warnings: string[];
}

/** An image in the JSON's units. */
export function imageJson(image: SightImage): ImageJson {
  return {
    from_height_m: image.from_height_m,
    to_height_m: image.to_height_m,
    from_elevation_deg: deg(image.from_elevation_rad),
    to_elevation_deg: deg(image.to_elevation_rad),
    orientation: image.orientation,
    angular_extent_arcmin: arcmin(image.angular_extent_rad),
    magnification_arcmin_per_m: arcmin(image.magnification_rad_per_m),
    relative_magnification: image.relative_magnification,
    clipped: image.clipped,
  };
}

/** A scene comparison in the JSON's units. */
export function comparisonJson(c: SceneComparison): ComparisonJson {
  return {
    top_elevation_deg: degOrNull(c.top_elevation_rad),
    reference_top_elevation_deg: degOrNull(c.reference_top_elevation_rad),
    top_shift_arcmin: arcminOrNull(c.top_shift_rad),
    base_elevation_deg: degOrNull(c.base_elevation_rad),
    reference_base_elevation_deg: degOrNull(c.reference_base_elevation_rad),
    base_shift_arcmin: arcminOrNull(c.base_shift_rad),
    magnification_ratio: c.magnification_ratio,
    looming: c.looming,
    towering: c.towering,
  };
}

/** The `transfer` JSON of computed curves. */
export function transferJson(curves: SightCurves): TransferJson {
  const c: TransferCurve = curves.actual;
  const against = (reference: TransferCurve | null) => (reference ? comparisonJson(compareScenes(c, reference)) : null);
  return {
    scenario: curves.scenario.name,
    range_m: c.range_m,
    observer_height_m: c.observer_height_m,
    max_height_m: c.max_height_m,
    window: { from_elevation_deg: deg(c.window.from_rad), to_elevation_deg: deg(c.window.to_rad) },
    rays: c.rays.map((r) => ({ elevation_deg: deg(r.elevation_rad), height_m: r.height_m, fate: r.fate })),
    images: c.images.map(imageJson),
    lowest_visible_height_m: c.lowest_visible_height_m,
    hidden_bands: c.hidden_bands.map((b) => ({ from_height_m: b.from_height_m, to_height_m: b.to_height_m })),
    folds: c.folds.map((f) => ({ elevation_deg: deg(f.elevation_rad), height_m: f.height_m, kind: f.kind })),
    boundaries: c.boundaries.map((b) => ({ elevation_deg: deg(b.elevation_rad), below_fate: b.below_fate, above_fate: b.above_fate, height_m: b.height_m })),
    looming: { standard: against(curves.standard), geometry: against(curves.geometry) },
    rays_traced: c.rays_traced,
    warnings: curves.warnings,
  };
}

/**
 * The transfer curve of a scenario at its target range (or range_m), as DESIGN.md §6 `transfer` JSON.
 * @param scenario the SI scenario.
 * @param options medium, range_m, max_height_m, rays, references (server/service/sight.ts).
 * @throws InputRangeError naming the field for bad input.
 */
export function transferFinding(scenario: Scenario, options: SightOptions = {}): TransferJson {
  return transferJson(sightCurves(scenario, options));
}
