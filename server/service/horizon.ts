/**
 * The DESIGN.md §6 `horizon` JSON: apparent horizon elevation, dip, horizon distance, false
 * horizon, trapped elevations and ducts (sim/analysis/dip.ts, from Bouguer's invariant),
 * confirmed by tracing a ray just below and just above the horizon, and compared with pure
 * geometry and the US 1976 atmosphere. Shared by the CLI `horizon` command, `findings` and the
 * HTTP API.
 */
import { geometricHorizon } from '../../sim/analysis/sight-geometry.js';
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { horizon, type HorizonFinding } from '../../sim/analysis/dip.js';
import type { Scenario } from '../../sim/scenario.js';
import type { Fate } from '../../sim/trace/kernel.js';
import { traceRay } from '../../sim/trace/ray.js';
import { arcmin, deg } from './angles.js';
import { referenceMedia, standardWarning, type MediumSource, type ReferenceMedia } from './reference-media.js';

/**
 * Offset of the two confirming rays from the horizon, rad (2″): far above the tracer's error in
 * elevation, small enough that both rays stay next to the limiting ray.
 */
export const HORIZON_CHECK_OFFSET_RAD = 1e-5;
/** How far the confirming rays are traced, m (2000 km: a ray above the horizon rises out of any duct long before). */
export const HORIZON_CHECK_RANGE_M = 2_000_000;

/** A duct in the JSON. */
export interface DuctJson {
  bottom_m: number;
  top_m: number;
  trapping_layer_bottom_m: number;
  surface_based: boolean;
  /** Depth of the trapping layer in M-units (10⁶ × Δ(n·r)/R, REFERENCES.md §2.2). */
  depth_M: number;
}

/** The `horizon` JSON. */
export interface HorizonJson {
  scenario: string;
  observer_height_m: number;
  horizon_elevation_deg: number;
  dip_arcmin: number;
  horizon_distance_m: number | null;
  false_horizon: boolean;
  grazing_height_m: number;
  trapped_elevations: { from_elevation_deg: number; to_elevation_deg: number } | null;
  ducts: DuctJson[];
  /** Tracing: the ray 2″ below the horizon meets the sea, the ray 2″ above does not. */
  trace_check: { below_fate: Fate; above_fate: Fate; confirmed: boolean };
  /** Straight lines of sight: dip arccos(R/(R+h)), distance R·arccos(R/(R+h)) (DESIGN.md §3 item 2). */
  geometry: { dip_arcmin: number; horizon_distance_m: number };
  /** The US 1976 atmosphere at the same surface air; null when it cannot be built. */
  standard: { horizon_elevation_deg: number; dip_arcmin: number; horizon_distance_m: number | null } | null;
  warnings: string[];
}

/**
 * The apparent horizon of a scenario's observer.
 * @param scenario the SI scenario.
 * @param options a prebuilt medium; its horizon for this observer (sim/analysis/dip.ts) if
 *   already found; the reference media (./reference-media.ts) or a source of the US 1976 medium
 *   (default: built here).
 * @returns the `horizon` JSON (angles in degrees / arcminutes).
 * @throws InputRangeError naming the field for bad input.
 * Reference: DESIGN.md §3 items 2–3; REFERENCES.md §5.3.
 */
export function horizonFinding(
  scenario: Scenario,
  options: { medium?: Medium; horizon?: HorizonFinding; referenceMedia?: ReferenceMedia; media?: MediumSource } = {},
): HorizonJson {
  const medium = options.medium ?? buildMedium(scenario);
  const h = scenario.observer.height_m;
  const R = scenario.earth.radius_m;
  const found = options.horizon ?? horizon(medium.table, h, R);
  const trace = (elevation: number): Fate =>
    traceRay(medium.table, h, elevation, { earthRadius_m: R, maxRange_m: HORIZON_CHECK_RANGE_M }).fate;
  const below = trace(found.horizon_elevation_rad - HORIZON_CHECK_OFFSET_RAD);
  const above = trace(found.horizon_elevation_rad + HORIZON_CHECK_OFFSET_RAD);
  const geometric = geometricHorizon(h, R);
  let standard: HorizonJson['standard'] = null;
  const warnings = [...medium.warnings, ...found.warnings];
  const references = options.referenceMedia ?? referenceMedia(scenario, medium, options.media);
  if (references.standard) {
    try {
      const s = horizon(references.standard.table, h, R);
      standard = { horizon_elevation_deg: deg(s.horizon_elevation_rad), dip_arcmin: arcmin(s.dip_rad), horizon_distance_m: s.horizon_distance_m };
    } catch (error) {
      warnings.push(standardWarning(error));
    }
  } else if (references.standardWarning) warnings.push(references.standardWarning);
  return {
    scenario: scenario.name,
    observer_height_m: h,
    horizon_elevation_deg: deg(found.horizon_elevation_rad),
    dip_arcmin: arcmin(found.dip_rad),
    horizon_distance_m: found.horizon_distance_m,
    false_horizon: found.false_horizon,
    grazing_height_m: found.grazing_height_m,
    trapped_elevations: found.trapped ? { from_elevation_deg: deg(found.trapped.from_elevation_rad), to_elevation_deg: deg(found.trapped.to_elevation_rad) } : null,
    ducts: found.ducts.map((d) => ductJson(d, R)),
    trace_check: { below_fate: below, above_fate: above, confirmed: below === 'surface' && above !== 'surface' },
    geometry: { dip_arcmin: arcmin(geometric.dip_rad), horizon_distance_m: geometric.horizon_distance_m },
    standard,
    warnings,
  };
}

function ductJson(d: HorizonFinding['ducts'][number], R: number): DuctJson {
  return {
    bottom_m: d.bottom_m,
    top_m: d.top_m,
    trapping_layer_bottom_m: d.trapping_layer_bottom_m,
    surface_based: d.surface_based,
    depth_M: (d.depth_m * 1e6) / R,
  };
}
