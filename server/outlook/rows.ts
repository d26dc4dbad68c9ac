/**
 * From a series row to the simulation's observation (°C, hPa → K, Pa) and from the simulation's
 * finding to the outlook's output row (rad → arcmin): the edge units of DESIGN.md §6 `outlook`.
 */
import type { OutlookFinding, OutlookObservation } from '../../sim/analysis/outlook.js';
import type { StabilityClass } from '../../sim/analysis/outlook-label.js';
import { CELSIUS_OFFSET_K, RAD_PER_ARCMIN } from '../../sim/constants.js';
import type { SeriesRow } from './csv.js';

/** Pascals per hectopascal. */
const PA_PER_HPA = 100;

/** One row of the outlook as the CLI prints it and the HTTP API sends it (DESIGN.md §6 plus more). */
export interface OutlookRowJson {
  /** Line of the row in the series file. */
  line: number;
  /** Time as written in the series (ISO 8601). */
  time: string;
  stability: StabilityClass;
  /** Obukhov length, m (negative unstable, positive stable); null when exactly neutral (infinite). */
  obukhov_length_m: number | null;
  /** Air minus sea temperature, K. */
  air_sea_difference_K: number;
  /** Apparent horizon elevation minus the US 1976 reference's, arcmin (positive: seen higher). */
  horizon_shift_arcmin: number;
  /** Apparent horizon elevation, arcmin (negative: below the horizontal). */
  horizon_elevation_arcmin: number;
  false_horizon: boolean;
  /** Apparent elevation change of the landmark's top vs the reference, arcmin (positive: looming); null unless seen in both. */
  landmark_shift_arcmin: number | null;
  /** Apparent elevation of the landmark's top, arcmin; null when it is not seen. */
  landmark_elevation_arcmin: number | null;
  /** Vertical magnification relative to the reference (> 1 towering, < 1 stooping): angular height of the part seen in both over the reference's; null unless seen in both. */
  landmark_magnification: number | null;
  /** Images of the landmark (every monotonic piece of the transfer curve over its height). */
  image_count: number;
  /** Images at least as tall as the resolving limit (the eye's 1′, or the site's instrument). */
  resolvable_image_count: number;
  /** Lowest height on the landmark that is seen, m (the landmark's height when none of it is). */
  lowest_visible_height_m: number;
  /** The same in the reference air, m. */
  reference_lowest_visible_height_m: number;
  /** Heights on the landmark above the lowest visible one that no ray reaches, m. */
  hidden_bands: { from_height_m: number; to_height_m: number }[];
  label: string;
  /** 0 (ordinary) .. 1 (striking). */
  strength: number;
  warnings: string[];
}

/** The SI observation of a series row. */
export function observationOf(row: SeriesRow): OutlookObservation {
  return {
    air_temperature_K: row.air_temperature_C + CELSIUS_OFFSET_K,
    sea_temperature_K: row.sea_temperature_C + CELSIUS_OFFSET_K,
    wind_speed_m_s: row.wind_speed_m_s,
    relative_humidity: row.relative_humidity,
    surface_pressure_Pa: row.pressure_hPa * PA_PER_HPA,
  };
}

const arcmin = (rad: number): number => rad / RAD_PER_ARCMIN;
const arcminOrNull = (rad: number | null): number | null => (rad === null ? null : arcmin(rad));

/** The output row of a finding. */
export function outlookRowJson(row: SeriesRow, f: OutlookFinding): OutlookRowJson {
  return {
    line: row.line,
    time: row.time,
    stability: f.stability,
    obukhov_length_m: Number.isFinite(f.obukhov_length_m) ? f.obukhov_length_m : null,
    air_sea_difference_K: f.air_sea_difference_K,
    horizon_shift_arcmin: arcmin(f.horizon_shift_rad),
    horizon_elevation_arcmin: arcmin(f.horizon_elevation_rad),
    false_horizon: f.false_horizon,
    landmark_shift_arcmin: arcminOrNull(f.landmark_shift_rad),
    landmark_elevation_arcmin: arcminOrNull(f.landmark.top_elevation_rad),
    landmark_magnification: f.landmark_magnification,
    image_count: f.image_count,
    resolvable_image_count: f.resolvable_image_count,
    lowest_visible_height_m: f.landmark.lowest_visible_height_m,
    reference_lowest_visible_height_m: f.reference_landmark.lowest_visible_height_m,
    hidden_bands: f.landmark.hidden_bands,
    label: f.label,
    strength: f.strength,
    warnings: f.warnings,
  };
}
