/**
 * The DESIGN.md §6 `visibility` JSON: hidden height, visible fraction, image count and status of
 * the target, compared with pure geometry and the US 1976 atmosphere, and whether what is seen is
 * resolvable by the eye or the scenario's instrument. Shared by the CLI `visibility` command,
 * `findings` and the HTTP API.
 */
import { targetVisibility, visibilityVerdict, type VisibilityVerdict } from '../../sim/analysis/visibility.js';
import type { Scenario } from '../../sim/scenario.js';
import { SAFETY_CAUTION } from './caution.js';
import { arcmin } from './angles.js';
import { sightCurves, type SightCurves, type SightOptions } from './sight.js';
import { imageJson, type ImageJson } from './transfer.js';

/** The `visibility` JSON. */
export interface VisibilityJson extends VisibilityVerdict {
  scenario: string;
  range_m: number;
  target_height_m: number;
  images: (ImageJson & { resolvable: boolean })[];
  hidden_bands: { from_height_m: number; to_height_m: number }[];
  resolution: {
    /** Resolving limit, arcmin: Rayleigh for the scenario's aperture, else the eye's 1 arcmin. */
    limit_arcmin: number;
    by: 'eye' | 'aperture';
    aperture_mm: number | null;
    /** Angular span of everything seen of the target, arcmin. */
    visible_extent_arcmin: number;
    visible_resolvable: boolean;
    resolvable_image_count: number;
  };
  /** The same verdict with straight lines of sight and in the US 1976 atmosphere; null when not computed. */
  compared: { geometry: VisibilityVerdict | null; standard: VisibilityVerdict | null };
  /** Shown wherever a visibility verdict is shown. */
  caution: string;
  warnings: string[];
}

/** The `visibility` JSON of computed curves (max_height_m is the target's top). */
export function visibilityJson(curves: SightCurves): VisibilityJson {
  const scenario = curves.scenario;
  const aperture = scenario.observer.aperture_m;
  const v = targetVisibility(curves.actual, { wavelength_um: scenario.optics.wavelength_um, ...(aperture !== undefined ? { aperture_m: aperture } : {}) });
  return {
    scenario: scenario.name,
    range_m: v.range_m,
    target_height_m: v.target_height_m,
    hidden_height_m: v.hidden_height_m,
    visible_fraction: v.visible_fraction,
    image_count: v.image_count,
    status: v.status,
    images: v.images.map((i) => ({ ...imageJson(i), resolvable: i.resolvable })),
    hidden_bands: v.hidden_bands.map((b) => ({ from_height_m: b.from_height_m, to_height_m: b.to_height_m })),
    resolution: {
      limit_arcmin: arcmin(v.resolving_limit_rad),
      by: v.resolved_by,
      aperture_mm: aperture === undefined ? null : aperture * 1000,
      visible_extent_arcmin: arcmin(v.visible_extent_rad),
      visible_resolvable: v.visible_resolvable,
      resolvable_image_count: v.resolvable_image_count,
    },
    compared: {
      geometry: curves.geometry ? visibilityVerdict(curves.geometry) : null,
      standard: curves.standard ? visibilityVerdict(curves.standard) : null,
    },
    caution: SAFETY_CAUTION,
    warnings: curves.warnings,
  };
}

/**
 * Visibility of the scenario's target (height max_height_m, default target.height_m, at range_m,
 * default target.range_m), as DESIGN.md §6 `visibility` JSON.
 * @param scenario the SI scenario.
 * @param options medium, range_m, max_height_m (the target's top), rays, references.
 * @throws InputRangeError naming the field for bad input.
 */
export function visibilityFinding(scenario: Scenario, options: SightOptions = {}): VisibilityJson {
  return visibilityJson(sightCurves(scenario, options));
}
