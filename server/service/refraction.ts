/**
 * The DESIGN.md §6 `refraction` JSON: astronomical refraction at given apparent elevations (rays
 * traced out of the atmosphere by the invariant quadrature, sim/analysis/astronomical.ts), and
 * how bodies such as the Sun or Moon at given true elevations appear. Shared by the CLI
 * `refraction` command, `findings` and the HTTP API.
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { bodyAppearance, refractionOfProfile } from '../../sim/analysis/astronomical.js';
import { horizon, type HorizonFinding } from '../../sim/analysis/dip.js';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { InputRangeError } from '../../sim/errors.js';
import { RAD_PER_DEG } from '../../sim/constants.js';
import type { Scenario } from '../../sim/scenario.js';
import { arcmin, deg, degOrNull } from './angles.js';

/** Apparent elevations of the default table, degrees (DESIGN.md §6). */
export const DEFAULT_REFRACTION_ELEVATIONS_DEG = [0, 1, 5, 10, 45] as const;
/** Allowed apparent and true elevations, degrees. */
export const REFRACTION_ELEVATION_RANGE_DEG = [-90, 90] as const;
/** Most elevations or bodies in one request. */
export const MAX_REFRACTION_ROWS = 1000;

/** One row of the table. */
export interface RefractionRow {
  apparent_elevation_deg: number;
  /** Refraction (apparent − true elevation), arcmin; null when the ray does not leave the atmosphere. */
  refraction_arcmin: number | null;
  /** True (airless) elevation of the source, degrees; null with the refraction. */
  true_elevation_deg: number | null;
}

/** A body at a true elevation, as seen. */
export interface BodyJson {
  true_elevation_deg: number;
  angular_diameter_deg: number;
  upper_limb_elevation_deg: number | null;
  lower_limb_elevation_deg: number | null;
  /** Apparent over true vertical diameter (below 1: flattened); null unless both limbs are seen. */
  flattening: number | null;
  /** True when at least the upper limb is above the apparent horizon. */
  above_horizon: boolean;
}

/** The `refraction` JSON. */
export interface RefractionJson {
  scenario: string;
  observer_height_m: number;
  rows: RefractionRow[];
  bodies: BodyJson[];
  /** Elevation of the apparent horizon for this observer, degrees. */
  horizon_elevation_deg: number;
  warnings: string[];
}

/** Options of refractionFinding. */
export interface RefractionOptions {
  /** Apparent elevations, degrees (−90..90). Default DEFAULT_REFRACTION_ELEVATIONS_DEG. */
  elevations_deg?: readonly number[];
  /** True elevations of bodies (0.53° discs), degrees (−90..90). Default none. */
  bodies_deg?: readonly number[];
  medium?: Medium;
  /** The apparent horizon of this medium and observer (sim/analysis/dip.ts), if already found. */
  horizon?: HorizonFinding;
}

/**
 * Astronomical refraction for the scenario's observer.
 * @param scenario the SI scenario.
 * @param options elevations, bodies, a prebuilt medium, its horizon for this observer.
 * @returns the `refraction` JSON.
 * @throws InputRangeError naming elevations_deg[i], bodies_deg[i], observerHeight_m or earthRadius_m.
 * Reference: sim/analysis/astronomical.ts (Auer & Standish 2000).
 */
export function refractionFinding(scenario: Scenario, options: RefractionOptions = {}): RefractionJson {
  const elevations = checkList('elevations_deg', options.elevations_deg ?? DEFAULT_REFRACTION_ELEVATIONS_DEG);
  const bodies = checkList('bodies_deg', options.bodies_deg ?? []);
  const medium = options.medium ?? buildMedium(scenario);
  const h = scenario.observer.height_m;
  const R = scenario.earth.radius_m;
  // horizon() checks h (0..table top) and R as astronomicalRefraction_rad would; one invariant
  // profile then serves every row (refractionOfProfile is that function's kernel).
  const horizonElevation = (options.horizon ?? horizon(medium.table, h, R)).horizon_elevation_rad;
  const profile = elevations.length > 0 ? new InvariantProfile(medium.table, R) : null;
  const rows = elevations.map((e): RefractionRow => {
    const r = refractionOfProfile(profile!, h, e * RAD_PER_DEG);
    return { apparent_elevation_deg: e, refraction_arcmin: r === null ? null : arcmin(r), true_elevation_deg: r === null ? null : e - deg(r) };
  });
  const seen = bodies.length > 0 ? bodyAppearance(medium.table, h, bodies.map((b) => ({ true_elevation_rad: b * RAD_PER_DEG })), R) : [];
  return {
    scenario: scenario.name,
    observer_height_m: h,
    rows,
    bodies: seen.map((b) => ({
      true_elevation_deg: deg(b.true_elevation_rad),
      angular_diameter_deg: deg(b.angular_diameter_rad),
      upper_limb_elevation_deg: degOrNull(b.upper_limb_elevation_rad),
      lower_limb_elevation_deg: degOrNull(b.lower_limb_elevation_rad),
      flattening: b.flattening,
      above_horizon: b.above_horizon,
    })),
    horizon_elevation_deg: deg(horizonElevation),
    warnings: medium.warnings,
  };
}

function checkList(field: string, values: readonly number[]): number[] {
  if (values.length > MAX_REFRACTION_ROWS) throw new InputRangeError(field, `${values.length} values`, `at most ${MAX_REFRACTION_ROWS}`);
  const [min, max] = REFRACTION_ELEVATION_RANGE_DEG;
  return values.map((v, i) => {
    if (typeof v !== 'number' || !Number.isFinite(v) || v < min || v > max) throw new InputRangeError(`${field}[${i}]`, v, `${min}..${max} degrees`);
    return v;
  });
}
