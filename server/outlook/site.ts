/**
 * The outlook's site file: where the observer stands, where the instruments are, and the landmark
 * watched. JSON, snake_case keys with units in the names, unknown keys an error (as the scenario
 * file, DESIGN.md §5); ranges from the scenario file's LIMITS.
 *
 *   {
 *     "name": "Cullisker Head lookout (invented)",
 *     "description": "...",
 *     "observer": { "height_m": 12, "latitude_deg": 57.4, "aperture_mm": 50 },
 *     "measurements": { "air_temperature_height_m": 8, "wind_height_m": 10, "cool_skin": false },
 *     "landmark": { "name": "Merrow Stack light (invented)", "range_m": 31000, "height_m": 38, "azimuth_deg": 292 },
 *     "optics": { "wavelength_nm": 550 }
 *   }
 *
 * `aperture_mm` (optional): the instrument the watcher uses (binoculars); images are counted as
 * resolvable against its Rayleigh limit instead of the eye's 1′.
 * Defaults (SITE_DEFAULTS): latitude none (Earth radius 6 371 000 m, COARE gravity at 45°);
 * with a latitude, the WGS 84 radius of curvature along the landmark's azimuth (0°, north, when
 * none is given); cool_skin false (the sea temperature is the skin temperature); 550 nm.
 */
import * as z from 'zod';
import { EARTH_RADIUS_M, RAD_PER_DEG } from '../../sim/constants.js';
import { radiusOfCurvature_m } from '../../sim/earth.js';
import type { OutlookSite } from '../../sim/analysis/outlook.js';
import { describeIssues } from '../scenario/load.js';
import { plainNumber } from '../scenario/schema.js';
import { SiteError } from './errors.js';
import { parseJsonText, readInputFile } from '../json-file.js';

/** Defaults of the site file, in file units. */
export const SITE_DEFAULTS = {
  earth_radius_m: EARTH_RADIUS_M,
  /** Latitude for COARE's gravity when none is given, degrees (the COARE code's default). */
  latitude_deg: 45,
  azimuth_deg: 0,
  cool_skin: false,
  wavelength_nm: 550,
  co2_ppm: 450,
} as const;

export const siteFileSchema = z.strictObject({
  name: z.string().min(1).max(200),
  description: z.string().max(2000).optional(),
  observer: z.strictObject({
    height_m: plainNumber('observer_height_m'),
    latitude_deg: plainNumber('latitude_deg').optional(),
    aperture_mm: plainNumber('aperture_mm').optional(),
  }),
  measurements: z.strictObject({
    air_temperature_height_m: plainNumber('measurement_height_m'),
    wind_height_m: plainNumber('measurement_height_m'),
    cool_skin: z.boolean().optional(),
  }),
  landmark: z.strictObject({
    name: z.string().min(1).max(200).optional(),
    range_m: plainNumber('target_range_m'),
    height_m: plainNumber('target_height_m').refine((v) => v > 0, { error: 'the landmark height must be above 0 m' }),
    azimuth_deg: plainNumber('azimuth_deg').optional(),
  }),
  optics: z.strictObject({ wavelength_nm: plainNumber('wavelength_nm').optional() }).optional(),
});

export type SiteFile = z.infer<typeof siteFileSchema>;

/** Validates a parsed JSON value as a site file; throws SiteError listing every problem (fields prefixed "site."). */
export function validateSiteFile(value: unknown): SiteFile {
  const result = siteFileSchema.safeParse(value);
  if (!result.success) {
    const problems = describeIssues(result.error.issues).map((p) => `site.${p.replace(/ \(not part of the scenario format\)$/, ' (not part of the site format)').replace(/^scenario:/, '')}`);
    const [field, ...rest] = problems[0].split(': ');
    throw new SiteError(field, rest.join(': '), problems);
  }
  return result.data;
}

/** Converts a valid site file to the SI site of sim/analysis/outlook.ts. */
export function convertSite(file: SiteFile): OutlookSite {
  const latitude_deg = file.observer.latitude_deg;
  const azimuth_deg = file.landmark.azimuth_deg ?? SITE_DEFAULTS.azimuth_deg;
  return {
    observer_height_m: file.observer.height_m,
    ...(file.observer.aperture_mm !== undefined ? { aperture_m: file.observer.aperture_mm / 1000 } : {}),
    air_temperature_height_m: file.measurements.air_temperature_height_m,
    wind_height_m: file.measurements.wind_height_m,
    cool_skin: file.measurements.cool_skin ?? SITE_DEFAULTS.cool_skin,
    landmark_range_m: file.landmark.range_m,
    landmark_height_m: file.landmark.height_m,
    earth_radius_m: latitude_deg === undefined ? SITE_DEFAULTS.earth_radius_m : radiusOfCurvature_m(latitude_deg * RAD_PER_DEG, azimuth_deg * RAD_PER_DEG),
    latitude_rad: (latitude_deg ?? SITE_DEFAULTS.latitude_deg) * RAD_PER_DEG,
    optics: { wavelength_um: (file.optics?.wavelength_nm ?? SITE_DEFAULTS.wavelength_nm) / 1000, index_model: 'ciddor', co2_ppm: SITE_DEFAULTS.co2_ppm },
  };
}

/** Validates and converts a parsed site (JSON value): the file as written and its SI form. Throws SiteError. */
export function siteFromJson(value: unknown): { file: SiteFile; site: OutlookSite } {
  const file = validateSiteFile(value);
  return { file, site: convertSite(file) };
}

/** Parses site JSON text: the file as written and its SI form. Throws SiteError. */
export function siteFromText(text: string, source = 'site file'): { file: SiteFile; site: OutlookSite } {
  return siteFromJson(parseJsonText(text, source, (message) => new SiteError('site', message)));
}

/** Reads a site file from disk. Throws SiteError for an unreadable file or bad content. */
export async function loadSiteFile(path: string): Promise<{ file: SiteFile; site: OutlookSite }> {
  const text = await readInputFile(path, 'site file', (message) => new SiteError('--site', message));
  return siteFromText(text, path);
}
