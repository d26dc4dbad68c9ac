/**
 * The landmark of an outlook site as seen through one medium, read from the transfer curve at the
 * landmark's range (transfer.ts, DESIGN.md §7): where its top is seen, how many images of it there
 * are and how many of those an observer can tell apart, the lowest height seen and the hidden bands.
 * The comparison with the reference (looming, towering) is looming.ts's compareScenes.
 */
import type { IndexTable } from '../refractivity/index-table.js';
import type { HeightBand } from './images.js';
import { primaryImage } from './looming.js';
import type { OutlookSite } from './outlook.js';
import { isResolvable } from './resolution.js';
import { transferCurve, type TransferCurve } from './transfer.js';

/** The landmark as seen through one medium. */
export interface LandmarkView {
  /** Apparent elevation of the landmark's top (top of its highest image), rad; null when no ray reaches it. */
  top_elevation_rad: number | null;
  /** Images of the landmark (monotonic pieces of the transfer curve within 0..height). */
  image_count: number;
  /** Images at least as tall as the resolving limit (the eye's 1′, or the site's instrument): the ones an observer can tell apart. */
  resolvable_image_count: number;
  /** Lowest height on the landmark that is seen, m; the landmark's height when none of it is. */
  lowest_visible_height_m: number;
  /** Heights on the landmark above the lowest visible one that no ray reaches, m. */
  hidden_bands: HeightBand[];
  warnings: string[];
}

/**
 * The transfer curve from the site's observer to its landmark.
 * @param table the medium n(z).
 * @param site observer height, landmark range and height, Earth radius (SI).
 * @returns transferCurve's result with maxHeight_m the landmark's height (its accuracy: image ends
 *   to better than 1e-4°).
 */
export function landmarkCurve(table: IndexTable, site: OutlookSite): TransferCurve {
  return transferCurve(table, site.observer_height_m, site.landmark_range_m, { maxHeight_m: site.landmark_height_m, earthRadius_m: site.earth_radius_m });
}

/**
 * The landmark as seen, from its transfer curve.
 * @param curve landmarkCurve's result.
 * @param site the site (optics and aperture set the resolving limit: resolution.ts).
 * @returns LandmarkView.
 * Reference: DESIGN.md §7 (images, hidden bands, visual resolution).
 */
export function landmarkView(curve: TransferCurve, site: OutlookSite): LandmarkView {
  const viewing = { wavelength_um: site.optics.wavelength_um, ...(site.aperture_m !== undefined ? { aperture_m: site.aperture_m } : {}) };
  return {
    top_elevation_rad: primaryImage(curve)?.to_elevation_rad ?? null,
    image_count: curve.images.length,
    resolvable_image_count: curve.images.filter((i) => isResolvable(i.angular_extent_rad, viewing)).length,
    lowest_visible_height_m: curve.lowest_visible_height_m ?? site.landmark_height_m,
    hidden_bands: curve.hidden_bands,
    warnings: curve.warnings,
  };
}
