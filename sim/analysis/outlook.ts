/**
 * The outlook for one observation: what routine marine observations (air and sea temperature,
 * wind, humidity, pressure) mean for a watcher at a site, measured against the US Standard
 * Atmosphere 1976 (DESIGN.md §6 `outlook`, §7 looming/sinking, towering/stooping).
 *
 * For one row: the COARE-style surface layer (sim/atmosphere/surface-column.ts) gives the air
 * column, its Obukhov length and the stability class; the reference is the US 1976 atmosphere
 * through the same air temperature at the sensor height, the same surface pressure and relative
 * humidity. Both are tabulated with the same index model; the apparent horizon (dip.ts) and the
 * landmark as seen (outlook-landmark.ts) are found in each, and the differences named
 * (outlook-label.ts). Positive shifts mean "seen higher than in the reference".
 */
import { buildMedium, columnWarnings } from '../atmosphere/medium.js';
import { resolveBulkColumn } from '../atmosphere/surface-column.js';
import { us1976Temperature_K } from '../atmosphere/us1976.js';
import { STANDARD_TEMPERATURE_K } from '../constants.js';
import { buildIndexTable } from '../refractivity/build-table.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { refractivityModel } from '../refractivity/models.js';
import type { BulkAtmosphere, OpticsSpec, StandardAtmosphere } from '../scenario.js';
import { horizon } from './dip.js';
import { outlookLabel, stabilityClass, STABILITY_REFERENCE_HEIGHT_M, type StabilityClass } from './outlook-label.js';
import { compareScenes } from './looming.js';
import { landmarkCurve, landmarkView, type LandmarkView } from './outlook-landmark.js';

/** A site as the outlook needs it, SI. */
export interface OutlookSite {
  /** Eye height above the sea, m (0 ≤ h < the table top). */
  observer_height_m: number;
  /** Aperture of the observer's instrument, m (> 0); absent: the unaided eye (1′ resolution). */
  aperture_m?: number;
  /** Height of the air temperature and humidity sensors above the sea, m (0.5..100). */
  air_temperature_height_m: number;
  /** Height of the wind sensor above the sea, m (0.5..100). */
  wind_height_m: number;
  /** True when the sea temperature is a bulk (sub-surface) value to be corrected for the cool skin. */
  cool_skin: boolean;
  /** Surface range to the landmark, m. */
  landmark_range_m: number;
  /** Height of the landmark's top above the sea, m (> 0). */
  landmark_height_m: number;
  /** Radius of the surface sphere along the line of sight, m. */
  earth_radius_m: number;
  /** Latitude, rad, for gravity in the flux iteration. */
  latitude_rad: number;
  /** Optics of both tables (index model, wavelength, CO2). */
  optics: OpticsSpec;
}

/** One observation, SI. */
export interface OutlookObservation {
  air_temperature_K: number;
  sea_temperature_K: number;
  wind_speed_m_s: number;
  /** Relative humidity over water at the sensor height, 0..1. */
  relative_humidity: number;
  surface_pressure_Pa: number;
}

/** The outlook of one observation. Angles in rad, heights in m. */
export interface OutlookFinding {
  stability: StabilityClass;
  /** Obukhov length L, m (negative unstable, positive stable). */
  obukhov_length_m: number;
  /** ζ = 10 m / L, dimensionless. */
  stability_parameter: number;
  /** Air minus sea temperature, K (positive: warm air over cold water). */
  air_sea_difference_K: number;
  /** Apparent elevation of the horizon, rad; and the reference's. */
  horizon_elevation_rad: number;
  reference_horizon_elevation_rad: number;
  /** horizon_elevation_rad − reference_horizon_elevation_rad, rad (positive: horizon seen higher). */
  horizon_shift_rad: number;
  /** The apparent horizon is the top of a duct, not the sea's edge (dip.ts). */
  false_horizon: boolean;
  /** The landmark as seen in the row's air and in the reference air. */
  landmark: LandmarkView;
  reference_landmark: LandmarkView;
  /** Apparent elevation change of the landmark's top, rad (positive: looming); null unless seen in both (looming.ts). */
  landmark_shift_rad: number | null;
  /**
   * Vertical magnification relative to the reference (> 1 towering, < 1 stooping): the angular
   * height of the part of the landmark seen in both, over the reference's (looming.ts); null
   * unless seen in both.
   */
  landmark_magnification: number | null;
  /** Images of the landmark in the row's air, and those tall enough to be told apart (resolution.ts). */
  image_count: number;
  resolvable_image_count: number;
  /** A few plain words and a 0..1 strength (outlook-label.ts). */
  label: string;
  strength: number;
  /** Soft problems (surface layer, index model validity, landmark search), plain sentences. */
  warnings: string[];
}

/** The bulk atmosphere of an observation at a site (US 1976 lapse rates above the surface layer). */
export function bulkAtmosphere(obs: OutlookObservation, site: OutlookSite): BulkAtmosphere {
  return {
    kind: 'bulk',
    sea_temperature_K: obs.sea_temperature_K,
    air_temperature_K: obs.air_temperature_K,
    air_temperature_height_m: site.air_temperature_height_m,
    wind_speed_m_s: obs.wind_speed_m_s,
    wind_height_m: site.wind_height_m,
    relative_humidity: obs.relative_humidity,
    surface_pressure_Pa: obs.surface_pressure_Pa,
    cool_skin: site.cool_skin,
    nodes: [],
    above: { kind: 'us1976' },
  };
}

/**
 * The reference air of an observation: the US 1976 standard atmosphere shifted so that it passes
 * through the observed air temperature at the sensor height (surface temperature
 * T_air + T76(0) − T76(z_t), 0.065 K warmer at 10 m), with the observed surface pressure and
 * relative humidity (held constant with height, as for every standard atmosphere here).
 */
export function referenceAtmosphere(obs: OutlookObservation, site: OutlookSite): StandardAtmosphere {
  return {
    kind: 'standard',
    surface_temperature_K: obs.air_temperature_K + STANDARD_TEMPERATURE_K - us1976Temperature_K(site.air_temperature_height_m),
    surface_pressure_Pa: obs.surface_pressure_Pa,
    relative_humidity: obs.relative_humidity,
  };
}

/**
 * The outlook of one observation at a site.
 * @param obs the observation, SI (validated at the edge; the flux iteration checks its ranges again
 *   and throws InputRangeError naming `observation.<field>`).
 * @param site the site, SI.
 * @returns OutlookFinding. Angles are exact for the tabulated media to the accuracy of dip.ts
 *   (horizon) and outlook-landmark.ts (landmark); the physics is that of Monin-Obukhov similarity
 *   in the surface layer (horizontally uniform air over the whole line of sight).
 * Reference: DESIGN.md §6–7; Fairall et al. (2003) J. Climate 16, 571–590 (COARE);
 * US Standard Atmosphere 1976 (NOAA/NASA/USAF).
 */
export function outlookForObservation(obs: OutlookObservation, site: OutlookSite): OutlookFinding {
  const bulk = resolveBulkColumn(bulkAtmosphere(obs, site), { latitude_rad: site.latitude_rad });
  const table = buildIndexTable(bulk.column, refractivityModel(site.optics.index_model, site.optics));
  const reference = referenceTable(obs, site);
  const warnings = [...bulk.warnings, ...columnWarnings(bulk.column, site.optics.index_model)];

  const R = site.earth_radius_m;
  const h = site.observer_height_m;
  const seen = horizon(table, h, R);
  const refSeen = horizon(reference, h, R);
  const curve = landmarkCurve(table, site);
  const referenceCurve = landmarkCurve(reference, site);
  const comparison = compareScenes(curve, referenceCurve);
  const landmark = landmarkView(curve, site);
  const referenceLandmark = landmarkView(referenceCurve, site);
  warnings.push(...seen.warnings, ...landmark.warnings);
  const landmark_shift_rad = comparison.top_shift_rad;
  const landmark_magnification = comparison.magnification_ratio;
  const air_sea_difference_K = obs.air_temperature_K - obs.sea_temperature_K;
  const horizon_shift_rad = seen.horizon_elevation_rad - refSeen.horizon_elevation_rad;
  const { label, strength } = outlookLabel({
    air_sea_difference_K,
    landmark_shift_rad,
    landmark_magnification,
    landmark_seen: landmark.top_elevation_rad !== null,
    reference_landmark_seen: referenceLandmark.top_elevation_rad !== null,
    image_count: landmark.resolvable_image_count,
    horizon_shift_rad,
    false_horizon: seen.false_horizon,
  });
  const L = bulk.flux.obukhov_length_m;
  return {
    stability: stabilityClass(L),
    obukhov_length_m: L,
    stability_parameter: STABILITY_REFERENCE_HEIGHT_M / L,
    air_sea_difference_K,
    horizon_elevation_rad: seen.horizon_elevation_rad,
    reference_horizon_elevation_rad: refSeen.horizon_elevation_rad,
    horizon_shift_rad,
    false_horizon: seen.false_horizon,
    landmark,
    reference_landmark: referenceLandmark,
    landmark_shift_rad,
    landmark_magnification,
    image_count: landmark.image_count,
    resolvable_image_count: landmark.resolvable_image_count,
    label,
    strength,
    warnings,
  };
}

/** The reference medium of an observation (see referenceAtmosphere). */
export function referenceTable(obs: OutlookObservation, site: OutlookSite): IndexTable {
  return buildMedium({
    name: 'outlook reference (US 1976)',
    observer: { height_m: site.observer_height_m },
    target: { range_m: site.landmark_range_m, height_m: site.landmark_height_m },
    atmosphere: referenceAtmosphere(obs, site),
    optics: site.optics,
    earth: { radius_m: site.earth_radius_m },
  }).table;
}
