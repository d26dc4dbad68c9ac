/**
 * The transfer curve cut into monotonic pieces (DESIGN.md §7): runs of neighbouring rays that
 * reach the target range, split at folds (extrema of height versus elevation, located by a
 * golden-section search with the fine probe) and bounded by fate boundaries, whose limiting
 * heights are worked out here.
 */
import { goldenMaximum } from './roots.js';
import type { RangeProbe, RangeSample } from './range-probe.js';
import type { FanBoundary } from './transfer-fan.js';

/**
 * Height excursion below which a reversal of the transfer curve is taken for integrator noise, m.
 * The ordinary probe's heights carry up to about 2e-5 m of error at 50 km (sim/trace/options.ts);
 * 1e-4 m is five times that, and an image 0.1 mm tall is of no interest.
 */
export const FOLD_NOISE_M = 1e-4;

/** Width to which a fold is located by the golden-section search, rad (5.7e-8°). */
export const FOLD_TOLERANCE_RAD = 1e-9;

/** An extremum of the transfer curve (where d height / d elevation changes sign). */
export interface Fold {
  elevation_rad: number;
  height_m: number;
  kind: 'max' | 'min';
}

/** A point of the transfer curve: apparent elevation (rad) and height at the target range (m). */
export interface CurvePoint {
  elevation_rad: number;
  height_m: number;
}

/** A monotonic piece of the transfer curve, points by increasing elevation. */
export interface TransferPiece {
  points: CurvePoint[];
  orientation: 'erect' | 'inverted';
}

/**
 * The height a run of target rays tends to at a fate boundary (the end of its first or last
 * piece). Where the other side meets the surface at the target range itself (within
 * BASE_RANGE_TOLERANCE_M) and the target-side ray arrives descending, the limiting ray meets the
 * surface exactly at the target: the height is 0 (the target's base), not the few micrometres the
 * bisection leaves. Otherwise (a ray grazing the surface before the target range, or a limit
 * against escaped or trapped rays) it is the height of the target-side ray, converged by the
 * bisection.
 */
export function boundaryHeight_m(boundary: FanBoundary): number | null {
  const target = boundary.below.fate === 'target' ? boundary.below : boundary.above.fate === 'target' ? boundary.above : null;
  if (target === null) return null;
  const other = target === boundary.below ? boundary.above : boundary.below;
  const atBase = other.fate === 'surface' && target.endElevation_rad < 0 && target.endRange_m - other.endRange_m <= BASE_RANGE_TOLERANCE_M;
  return atBase ? 0 : target.height_m;
}

/**
 * A surface ray ending this close to the target range, next to a descending target ray at a fate
 * boundary, marks the target's base, m. Bisected to 1e-12 rad, a ray descending at 1e-5 rad (a
 * very shallow one) ends within about 1e-12·D/1e-5 = 3 mm of the base at 30 km; a ray grazing the
 * surface before the target ends kilometres short of it.
 */
export const BASE_RANGE_TOLERANCE_M = 1;

/**
 * Finds the folds of the transfer curve and cuts it into monotonic pieces.
 * @param probe traces rays (the fine probe refines each fold).
 * @param samples the refined fan, sorted by elevation.
 * @param boundaries its fate boundaries.
 * @returns folds (sorted by elevation) and pieces (sorted by elevation; a fold ends one piece and starts the next).
 */
export function transferPieces(probe: RangeProbe, samples: RangeSample[], boundaries: FanBoundary[]): { folds: Fold[]; pieces: TransferPiece[] } {
  const limit = new Map<RangeSample, number>();
  for (const b of boundaries) {
    const h = boundaryHeight_m(b);
    if (h === null) continue;
    limit.set(b.below.fate === 'target' ? b.below : b.above, h);
  }
  const folds: Fold[] = [];
  const pieces: TransferPiece[] = [];
  let start = 0;
  while (start < samples.length) {
    if (samples[start].fate !== 'target') {
      start++;
      continue;
    }
    let end = start;
    while (end + 1 < samples.length && samples[end + 1].fate === 'target') end++;
    const points = samples.slice(start, end + 1).map((s) => ({ elevation_rad: s.elevation_rad, height_m: limit.get(s) ?? s.height_m! }));
    const runFolds = locateFolds(probe, points);
    folds.push(...runFolds.map((f) => f.fold));
    let from = 0;
    for (const { index, fold } of runFolds) {
      pieces.push(makePiece([...points.slice(from, index), fold]));
      points[index] = { elevation_rad: fold.elevation_rad, height_m: fold.height_m };
      from = index;
    }
    pieces.push(makePiece(points.slice(from)));
    start = end + 1;
  }
  return { folds, pieces: pieces.filter((p) => p.points.length > 1) };
}

function makePiece(points: CurvePoint[]): TransferPiece {
  const first = points[0].height_m;
  const last = points[points.length - 1].height_m;
  return { points, orientation: last >= first ? 'erect' : 'inverted' };
}

/**
 * Extrema of one run of heights, found with hysteresis FOLD_NOISE_M (a reversal counts once the
 * curve has moved back by more than that), each refined by golden section between its neighbours.
 * Returns the index of the sample each fold replaces, increasing.
 */
function locateFolds(probe: RangeProbe, points: CurvePoint[]): { index: number; fold: Fold }[] {
  const found: { index: number; kind: 'max' | 'min' }[] = [];
  let dir = 0;
  let lowMark = 0;
  let highMark = 0;
  let ext = 0;
  for (let j = 1; j < points.length; j++) {
    const h = points[j].height_m;
    if (dir === 0) {
      if (h > points[highMark].height_m) highMark = j;
      if (h < points[lowMark].height_m) lowMark = j;
      if (points[highMark].height_m - points[lowMark].height_m > FOLD_NOISE_M) {
        dir = highMark > lowMark ? 1 : -1;
        ext = dir > 0 ? highMark : lowMark;
      }
    } else if (dir > 0) {
      if (h >= points[ext].height_m) ext = j;
      else if (points[ext].height_m - h > FOLD_NOISE_M) {
        found.push({ index: ext, kind: 'max' });
        dir = -1;
        ext = j;
      }
    } else if (h <= points[ext].height_m) ext = j;
    else if (h - points[ext].height_m > FOLD_NOISE_M) {
      found.push({ index: ext, kind: 'min' });
      dir = 1;
      ext = j;
    }
  }
  return found.map(({ index, kind }) => ({ index, fold: refineFold(probe, points, index, kind) }));
}

/** Golden-section search for the extremum near points[index], between its neighbours. */
function refineFold(probe: RangeProbe, points: CurvePoint[], index: number, kind: 'max' | 'min'): Fold {
  const sign = kind === 'max' ? 1 : -1;
  const a = points[Math.max(0, index - 1)].elevation_rad;
  const b = points[Math.min(points.length - 1, index + 1)].elevation_rad;
  const objective = (e: number): number => {
    const s = probe.probe(e, true);
    return s.height_m === null ? -Infinity : sign * s.height_m;
  };
  const [e, value] = goldenMaximum(objective, a, b, FOLD_TOLERANCE_RAD);
  if (!Number.isFinite(value)) return { elevation_rad: points[index].elevation_rad, height_m: points[index].height_m, kind };
  return { elevation_rad: e, height_m: sign * value, kind };
}
