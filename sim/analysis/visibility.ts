/**
 * Visibility of a target (a height at a range) from its transfer curve (DESIGN.md §6
 * `visibility`), and whether what is seen can be resolved by the unaided eye or an instrument
 * (DESIGN.md §7).
 *
 * Definitions (DESIGN.md §6):
 * - hidden_height_m: the height at the target range below which nothing is seen: the curve's
 *   lowest visible height, or the target's top when none of it is seen;
 * - visible_fraction: the share of the target's height (0..top) seen at least once: the length of
 *   the union of the images' height spans over the top;
 * - image_count: the number of images (monotonic pieces of the transfer curve within 0..top);
 * - status: "hidden" when there is no image, "visible" when the whole height is seen (nothing
 *   hidden at the base, no hidden band), otherwise "partly-hidden".
 */
import type { HeightBand, SightImage } from './images.js';
import { isResolvable, resolvingLimit_rad, type Viewing } from './resolution.js';
import type { TransferCurve } from './transfer.js';

export type VisibilityStatus = 'visible' | 'partly-hidden' | 'hidden';

/** An image with its resolvability. */
export interface ResolvedImage extends SightImage {
  /** True when the image's angular height reaches the resolving limit. */
  resolvable: boolean;
}

/** The four verdict fields of DESIGN.md §6 `visibility`. */
export interface VisibilityVerdict {
  hidden_height_m: number;
  visible_fraction: number;
  image_count: number;
  status: VisibilityStatus;
}

/** Visibility of a target, with resolvability. Angles in rad. */
export interface TargetVisibility extends VisibilityVerdict {
  range_m: number;
  target_height_m: number;
  images: ResolvedImage[];
  hidden_bands: HeightBand[];
  /** Resolving limit used, rad: Rayleigh for an aperture, else the eye's 1 arcmin. */
  resolving_limit_rad: number;
  resolved_by: 'eye' | 'aperture';
  /** Angular span of everything seen of the target: highest minus lowest image elevation; 0 if nothing. */
  visible_extent_rad: number;
  /** True when that span reaches the resolving limit. */
  visible_resolvable: boolean;
  /** Images that reach the resolving limit. */
  resolvable_image_count: number;
}

/**
 * The verdict fields from a transfer curve whose max_height_m is the target's top.
 * @param curve transfer curve at the target range, clipped at the target's top.
 * @returns hidden height (m), visible fraction (0..1), image count and status.
 */
export function visibilityVerdict(curve: TransferCurve): VisibilityVerdict {
  const top = curve.max_height_m;
  const count = curve.images.length;
  if (count === 0 || curve.lowest_visible_height_m === null) return { hidden_height_m: top, visible_fraction: 0, image_count: 0, status: 'hidden' };
  const hidden = curve.lowest_visible_height_m;
  const banded = curve.hidden_bands.reduce((sum, b) => sum + (b.to_height_m - b.from_height_m), 0);
  const fraction = Math.min(1, Math.max(0, (top - hidden - banded) / top));
  const whole = hidden === 0 && curve.hidden_bands.length === 0;
  return { hidden_height_m: hidden, visible_fraction: whole ? 1 : fraction, image_count: count, status: whole ? 'visible' : 'partly-hidden' };
}

/**
 * Visibility of the target with resolvability.
 * @param curve transfer curve at the target range with max_height_m = the target's top.
 * @param viewing wavelength (µm) and optional aperture (m) (sim/analysis/resolution.ts).
 * @returns the verdict, the images with resolvability, and the resolvability of the whole.
 * @throws InputRangeError naming wavelength_um or aperture_m when out of range.
 * Reference: DESIGN.md §6–7; Rayleigh criterion and the eye's 1 arcmin, REFERENCES.md §8.
 */
export function targetVisibility(curve: TransferCurve, viewing: Viewing): TargetVisibility {
  const limit = resolvingLimit_rad(viewing);
  const images = curve.images.map((image) => ({ ...image, resolvable: isResolvable(image.angular_extent_rad, viewing) }));
  const elevations = images.flatMap((i) => [i.from_elevation_rad, i.to_elevation_rad]);
  const extent = elevations.length > 0 ? Math.max(...elevations) - Math.min(...elevations) : 0;
  return {
    ...visibilityVerdict(curve),
    range_m: curve.range_m,
    target_height_m: curve.max_height_m,
    images,
    hidden_bands: curve.hidden_bands,
    resolving_limit_rad: limit,
    resolved_by: viewing.aperture_m === undefined ? 'eye' : 'aperture',
    visible_extent_rad: extent,
    visible_resolvable: elevations.length > 0 && isResolvable(extent, viewing),
    resolvable_image_count: images.filter((i) => i.resolvable).length,
  };
}
