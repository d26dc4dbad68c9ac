/**
 * Looming / sinking and towering / stooping of the target against a reference scene (DESIGN.md
 * §7): is the target seen higher or lower than in the reference, and is it stretched or
 * compressed vertically?
 *
 * Definitions used here.
 * - The primary image is the image, among those that reach the target's top, whose top is seen
 *   highest (in ordinary air the one direct image).
 * - Looming shift: apparent elevation of the top in the primary image minus the same in the
 *   reference (positive: seen higher, looming; negative: sinking). The base shift compares the
 *   elevations of height 0 where both primary images reach the base.
 * - Magnification ratio: the angular height of the common part of the two primary images (from
 *   the higher of their lowest heights to the top) divided by the same in the reference (above 1:
 *   towering, below 1: stooping).
 * - Labels use the thresholds LOOMING_THRESHOLD_RAD and TOWERING_THRESHOLD: smaller changes are
 *   reported as 'none'.
 */
import { RAD_PER_ARCMIN } from '../constants.js';
import type { SightImage } from './images.js';
import type { TransferCurve } from './transfer.js';
import type { CurvePoint } from './transfer-pieces.js';

/**
 * Shift of the top below which the scene is neither looming nor sinking, rad: 0.1 arcmin, a tenth
 * of what the unaided eye resolves (1 arcmin, common practice, no source). A reporting choice.
 */
export const LOOMING_THRESHOLD_RAD = 0.1 * RAD_PER_ARCMIN;

/** Relative change of the magnification below which there is no towering or stooping (5 %, a reporting choice). */
export const TOWERING_THRESHOLD = 0.05;

/** The target against one reference. Angles in rad. */
export interface SceneComparison {
  /** Apparent elevation of the target's top in the primary image; null when the top is not seen. */
  top_elevation_rad: number | null;
  reference_top_elevation_rad: number | null;
  /** top − reference top, rad (positive: seen higher); null unless both are seen. */
  top_shift_rad: number | null;
  /** Apparent elevation of the base (height 0) in the primary image; null when hidden. */
  base_elevation_rad: number | null;
  reference_base_elevation_rad: number | null;
  base_shift_rad: number | null;
  /** Angular height of the common part of the primary images over the reference's; null if none. */
  magnification_ratio: number | null;
  looming: 'looming' | 'sinking' | 'none' | null;
  towering: 'towering' | 'stooping' | 'none' | null;
}

/**
 * The image among those reaching maxHeight whose top is seen highest, or null.
 * @param curve a transfer curve (images clipped at curve.max_height_m).
 */
export function primaryImage(curve: TransferCurve): SightImage | null {
  let best: SightImage | null = null;
  for (const image of curve.images) {
    if (image.to_height_m < curve.max_height_m) continue;
    if (best === null || image.to_elevation_rad > best.to_elevation_rad) best = image;
  }
  return best;
}

/**
 * Compares the target in a scene with the same target in a reference scene.
 * @param actual transfer curve of the scenario.
 * @param reference transfer curve of the reference (same range and maximum height).
 * @returns shifts (rad), magnification ratio and labels (see the module comment).
 */
export function compareScenes(actual: TransferCurve, reference: TransferCurve): SceneComparison {
  const a = primaryImage(actual);
  const r = primaryImage(reference);
  const top = a ? a.to_elevation_rad : null;
  const refTop = r ? r.to_elevation_rad : null;
  const base = a && a.from_height_m === 0 ? a.from_elevation_rad : null;
  const refBase = r && r.from_height_m === 0 ? r.from_elevation_rad : null;
  const topShift = top !== null && refTop !== null ? top - refTop : null;
  let ratio: number | null = null;
  if (a && r) {
    const low = Math.max(a.from_height_m, r.from_height_m);
    if (low < actual.max_height_m) {
      const span = Math.abs(top! - elevationAt(pieceOf(actual, a), low));
      const refSpan = Math.abs(refTop! - elevationAt(pieceOf(reference, r), low));
      ratio = refSpan !== 0 ? span / refSpan : null;
    }
  }
  return {
    top_elevation_rad: top,
    reference_top_elevation_rad: refTop,
    top_shift_rad: topShift,
    base_elevation_rad: base,
    reference_base_elevation_rad: refBase,
    base_shift_rad: base !== null && refBase !== null ? base - refBase : null,
    magnification_ratio: ratio,
    looming: topShift === null ? null : topShift > LOOMING_THRESHOLD_RAD ? 'looming' : topShift < -LOOMING_THRESHOLD_RAD ? 'sinking' : 'none',
    towering: ratio === null ? null : ratio > 1 + TOWERING_THRESHOLD ? 'towering' : ratio < 1 - TOWERING_THRESHOLD ? 'stooping' : 'none',
  };
}

/** The points of the piece an image came from (the piece holding both of its edges). */
function pieceOf(curve: TransferCurve, image: SightImage): CurvePoint[] {
  const lo = Math.min(image.from_elevation_rad, image.to_elevation_rad);
  const hi = Math.max(image.from_elevation_rad, image.to_elevation_rad);
  const piece = curve.pieces.find((p) => p.points[0].elevation_rad <= lo && p.points[p.points.length - 1].elevation_rad >= hi);
  return piece ? piece.points : [
    { elevation_rad: image.from_elevation_rad, height_m: image.from_height_m },
    { elevation_rad: image.to_elevation_rad, height_m: image.to_height_m },
  ];
}

/**
 * Elevation at which a monotonic piece reaches height z, by linear interpolation between its
 * samples (the fan keeps them within 1/200 of the target's height and follows bends, so the error
 * is far below the magnification's own significance).
 */
function elevationAt(points: readonly CurvePoint[], z: number): number {
  for (let k = 0; k + 1 < points.length; k++) {
    const a = points[k];
    const b = points[k + 1];
    if ((a.height_m - z) * (b.height_m - z) <= 0) {
      if (a.height_m === b.height_m) return a.elevation_rad;
      return a.elevation_rad + ((z - a.height_m) / (b.height_m - a.height_m)) * (b.elevation_rad - a.elevation_rad);
    }
  }
  const first = points[0];
  const last = points[points.length - 1];
  return Math.abs(first.height_m - z) < Math.abs(last.height_m - z) ? first.elevation_rad : last.elevation_rad;
}
