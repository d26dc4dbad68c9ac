/**
 * Images of the target and hidden bands, read from the monotonic pieces of the transfer curve
 * (DESIGN.md §6 `transfer`, §7): every piece is an image, erect where the height increases with
 * elevation and inverted where it decreases, its heights clipped to 0..maxHeight_m and pieces
 * wholly above left out; hidden bands are the heights between the lowest visible height and
 * maxHeight_m that no piece covers.
 */
import { illinoisRoot } from './roots.js';
import type { RangeProbe } from './range-probe.js';
import { geometricElevation_rad } from './sight-geometry.js';
import type { CurvePoint, TransferPiece } from './transfer-pieces.js';

/** Width to which a clipped image end is located, rad (2e-8″). */
export const CLIP_TOLERANCE_RAD = 1e-10;

/**
 * Gaps between covered heights narrower than this are not hidden bands, m: they come from the
 * rounding of a shared fold height between two pieces (1e-9 m is far below any integrator error).
 */
export const MIN_BAND_M = 1e-9;

/**
 * One image: a monotonic piece of the transfer curve within 0..maxHeight_m. Heights are ordered
 * (from ≤ to); each elevation is the one at which that height is seen, so for an inverted image
 * from_elevation_rad > to_elevation_rad.
 */
export interface SightImage {
  /** Lowest height of the image at the target range, m. */
  from_height_m: number;
  /** Highest height of the image at the target range (≤ maxHeight_m), m. */
  to_height_m: number;
  /** Apparent elevation at which from_height_m is seen, rad. */
  from_elevation_rad: number;
  /** Apparent elevation at which to_height_m is seen, rad. */
  to_elevation_rad: number;
  orientation: 'erect' | 'inverted';
  /** Angular height of the image, rad (|to − from elevation|). */
  angular_extent_rad: number;
  /** Mean vertical magnification d elevation / d height over the image, rad/m (≥ 0). */
  magnification_rad_per_m: number;
  /**
   * Magnification relative to straight-line geometry for the same heights at the same range
   * (1: as without air; above 1 stretched, below 1 compressed); null when the heights coincide.
   */
  relative_magnification: number | null;
  /** True when the piece went on above maxHeight_m and was cut there. */
  clipped: boolean;
}

/** A height band at the target range, m. */
export interface HeightBand {
  from_height_m: number;
  to_height_m: number;
}

/**
 * Images from the pieces of the transfer curve.
 * @param probe traces rays where a piece crosses maxHeight_m (to place the cut exactly).
 * @param pieces monotonic pieces, by elevation.
 * @param maxHeight_m top of the heights of interest, m (> 0).
 * @returns images by increasing elevation of their lower edge in the sky.
 */
export function imagesOf(probe: RangeProbe, pieces: readonly TransferPiece[], maxHeight_m: number): SightImage[] {
  const images: SightImage[] = [];
  for (const piece of pieces) {
    const pts = piece.points;
    const first = pts[0];
    const last = pts[pts.length - 1];
    const low = first.height_m <= last.height_m ? first : last;
    let high = first.height_m <= last.height_m ? last : first;
    if (low.height_m >= maxHeight_m) continue;
    let clipped = false;
    if (high.height_m > maxHeight_m) {
      high = { elevation_rad: crossingElevation(probe, pts, maxHeight_m), height_m: maxHeight_m };
      clipped = true;
    }
    images.push(makeImage(probe, low, high, piece.orientation, clipped));
  }
  return images.sort((a, b) => Math.min(a.from_elevation_rad, a.to_elevation_rad) - Math.min(b.from_elevation_rad, b.to_elevation_rad));
}

function makeImage(probe: RangeProbe, low: CurvePoint, high: CurvePoint, orientation: 'erect' | 'inverted', clipped: boolean): SightImage {
  const extent = Math.abs(high.elevation_rad - low.elevation_rad);
  const dh = high.height_m - low.height_m;
  const { observerHeight_m: h, range_m: D, earthRadius_m: R } = probe;
  const straight = Math.abs(geometricElevation_rad(h, D, high.height_m, R) - geometricElevation_rad(h, D, low.height_m, R));
  return {
    from_height_m: low.height_m,
    to_height_m: high.height_m,
    from_elevation_rad: low.elevation_rad,
    to_elevation_rad: high.elevation_rad,
    orientation,
    angular_extent_rad: extent,
    magnification_rad_per_m: dh > 0 ? extent / dh : 0,
    relative_magnification: straight > 0 ? extent / straight : null,
    clipped,
  };
}

/** Elevation at which a monotonic piece reaches height z (between its samples, refined by the probe). */
function crossingElevation(probe: RangeProbe, pts: readonly CurvePoint[], z: number): number {
  let k = 0;
  while (k + 1 < pts.length && (pts[k].height_m - z) * (pts[k + 1].height_m - z) > 0) k++;
  const a = pts[k];
  const b = pts[Math.min(k + 1, pts.length - 1)];
  const f = (e: number): number => {
    const s = probe.probe(e);
    return s.height_m === null ? Number.NaN : s.height_m - z;
  };
  return illinoisRoot(f, a.elevation_rad, b.elevation_rad, a.height_m - z, b.height_m - z, CLIP_TOLERANCE_RAD)[0];
}

/** Lowest height seen at the target range (the lowest image edge), m; null when there is no image. */
export function lowestVisibleHeight_m(images: readonly SightImage[]): number | null {
  return images.length === 0 ? null : Math.min(...images.map((i) => i.from_height_m));
}

/**
 * Hidden bands: heights above the lowest visible height and below maxHeight_m reached by no image
 * (DESIGN.md §6). Empty when there is no image.
 */
export function hiddenBands(images: readonly SightImage[], maxHeight_m: number): HeightBand[] {
  if (images.length === 0) return [];
  const spans = images.map((i) => [i.from_height_m, i.to_height_m] as const).sort((a, b) => a[0] - b[0]);
  const bands: HeightBand[] = [];
  let covered = spans[0][1];
  for (const [lo, hi] of spans) {
    if (lo - covered > MIN_BAND_M) bands.push({ from_height_m: covered, to_height_m: lo });
    covered = Math.max(covered, hi);
  }
  if (maxHeight_m - covered > MIN_BAND_M) bands.push({ from_height_m: covered, to_height_m: maxHeight_m });
  return bands;
}
