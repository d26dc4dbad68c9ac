/**
 * One ensemble member: the findings of a single scenario that the ensemble summarises (visibility
 * verdict, horizon, apparent elevation of the target's top, and optionally the sighting ranges).
 */
import { buildMedium, type Medium } from '../atmosphere/medium.js';
import type { Scenario } from '../scenario.js';
import { horizon } from './dip.js';
import type { MemberFindings } from './ensemble-summary.js';
import { sightingSweep, type RangeVisibility, type SightingOptions } from './sighting.js';
import { transferCurve, type TransferCurve } from './transfer.js';
import { visibilityVerdict } from './visibility.js';

/** What a member computes besides the verdict. */
export interface MemberOptions {
  /** Sighting sweep per member (a transfer curve per range: costly); null for none. */
  sighting: SightingOptions | null;
}

/** A target top within this of an image's upper edge counts as that image's top, m (clip points are placed to 1e-10 rad). */
const TOP_MATCH_M = 1e-6;

/**
 * The transfer curve of a scenario's target at a range, clipped at the target's top.
 * @param medium the scenario's medium.
 * @param scenario the SI scenario (observer height, target height > 0, Earth radius).
 * @param range_m range, m (the tracer's limits apply).
 */
export function targetCurve(medium: Medium, scenario: Scenario, range_m: number): TransferCurve {
  return transferCurve(medium.table, scenario.observer.height_m, range_m, { maxHeight_m: scenario.target.height_m, earthRadius_m: scenario.earth.radius_m });
}

/** Visibility at a range in the form the sighting sweep reads. */
export function rangeVisibility(medium: Medium, scenario: Scenario, range_m: number): RangeVisibility {
  const curve = targetCurve(medium, scenario, range_m);
  return { ...visibilityVerdict(curve), hidden_bands: curve.hidden_bands };
}

/**
 * Apparent elevation of the target's top: the highest elevation at which an image reaches the top.
 * @returns rad, or null when no image reaches the top.
 */
export function topElevation_rad(curve: TransferCurve): number | null {
  let best: number | null = null;
  for (const image of curve.images) {
    if (curve.max_height_m - image.to_height_m > TOP_MATCH_M) continue;
    if (best === null || image.to_elevation_rad > best) best = image.to_elevation_rad;
  }
  return best;
}

/**
 * Evaluates one member.
 * @param scenario the member's SI scenario (point values).
 * @param options sighting sweep or none.
 * @returns the findings (angles in rad, heights and ranges in m) and the medium's and curve's warnings.
 * @throws InputRangeError / InputError from the medium, the tracer or the sweep for inputs the
 *   model cannot take (the caller records the member as failed).
 * Accuracy: as transferCurve (heights about 2e-5 m at 50 km; image edges better than 1e-4°) and
 * horizon (exact for the tabulated medium).
 * Reference: DESIGN.md §6 (visibility, horizon), §7 (transfer curve).
 */
export function evaluateMember(scenario: Scenario, options: MemberOptions): { findings: MemberFindings; warnings: string[] } {
  const medium = buildMedium(scenario);
  const curve = targetCurve(medium, scenario, scenario.target.range_m);
  const verdict = visibilityVerdict(curve);
  const sky = horizon(medium.table, scenario.observer.height_m, scenario.earth.radius_m);
  const findings: MemberFindings = {
    status: verdict.status,
    hidden_height_m: verdict.hidden_height_m,
    visible_fraction: verdict.visible_fraction,
    image_count: verdict.image_count,
    horizon_elevation_rad: sky.horizon_elevation_rad,
    top_elevation_rad: topElevation_rad(curve),
  };
  if (options.sighting) {
    const sweep = sightingSweep((r) => rangeVisibility(medium, scenario, r), scenario.target.height_m, options.sighting);
    findings.sighting = { top_m: sweep.top.range_m, light_m: sweep.light?.range_m ?? null, whole_m: sweep.whole.range_m };
  }
  return { findings, warnings: [...new Set([...medium.warnings, ...curve.warnings, ...sky.warnings])] };
}
