/**
 * The transfer curve at a target range (DESIGN.md §6 `transfer`, §7): the height reached at the
 * target range as a function of apparent elevation at the observer, with the ray fates, the
 * folds, the images (monotonic pieces: erect / inverted), the lowest visible height and the hidden
 * bands.
 *
 * Method. An elevation window is chosen from the invariant profile and a few rays
 * (transfer-window.ts: from below the dip of the sea horizon, or the target's base, to above the
 * elevation at which maxHeight_m is seen and above the horizontal, with a margin of 10 % or at
 * least 0.01°). A uniform fan over it is refined where the height at the target range jumps or
 * bends and bisected at fate changes (transfer-fan.ts); folds are located by golden section with a
 * fine integrator tolerance (transfer-pieces.ts); each monotonic piece becomes an image
 * (images.ts). Every image boundary is located to better than 1e-4° (fate boundaries to 1e-12 rad,
 * clip points to 1e-10 rad, folds to about 1e-6°, limited by the height noise at an extremum).
 */
import { EARTH_RADIUS_M } from '../constants.js';
import { InputRangeError, requireInRange } from '../errors.js';
import type { IndexTable } from '../refractivity/index-table.js';
import { hiddenBands, imagesOf, lowestVisibleHeight_m, type HeightBand, type SightImage } from './images.js';
import { RangeProbe, type RangeSample } from './range-probe.js';
import { FAN_DEFAULTS, refinedFan, type FanOptions } from './transfer-fan.js';
import { boundaryHeight_m, transferPieces, type Fold, type TransferPiece } from './transfer-pieces.js';
import { transferWindow, WINDOW_LIMIT_RAD, type ElevationWindow } from './transfer-window.js';
import type { Fate } from '../trace/kernel.js';

/** Options of transferCurve (defaults in TRANSFER_DEFAULTS and FAN_DEFAULTS). */
export interface TransferOptions extends FanOptions {
  /** Top of the heights reported, m (the target's top). Required; 0 < maxHeight_m ≤ 1e5. */
  maxHeight_m: number;
  /** Radius of the surface sphere, m. Default 6 371 000. Allowed 1e5..1e13. */
  earthRadius_m?: number;
  /** Elevation window, rad; default null: chosen automatically (see transfer-window.ts). */
  window?: ElevationWindow | null;
}

/** Defaults of TransferOptions (the fan's in FAN_DEFAULTS). */
export const TRANSFER_DEFAULTS = Object.freeze({ earthRadius_m: EARTH_RADIUS_M, window: null as ElevationWindow | null, ...FAN_DEFAULTS });

/** A fate boundary of the transfer curve. */
export interface TransferBoundary {
  /** Elevation of the boundary (midpoint of its bracket, narrower than the boundary tolerance), rad. */
  elevation_rad: number;
  below_fate: Fate;
  above_fate: Fate;
  /** Height that the rays reaching the target range tend to at the boundary, m; null if neither side does. */
  height_m: number | null;
}

/** The transfer curve and what it shows. */
export interface TransferCurve {
  range_m: number;
  observer_height_m: number;
  max_height_m: number;
  earth_radius_m: number;
  /** The elevation window traced, rad. */
  window: ElevationWindow;
  /** Every ray of the fan, by elevation. */
  rays: RangeSample[];
  folds: Fold[];
  boundaries: TransferBoundary[];
  /** Monotonic pieces of the whole curve (not clipped). */
  pieces: TransferPiece[];
  /** Images within 0..max_height_m (DESIGN.md §6). */
  images: SightImage[];
  /** Lowest height seen at the target range, m; null when no height up to max_height_m is seen. */
  lowest_visible_height_m: number | null;
  hidden_bands: HeightBand[];
  /** Rays traced in all (window, fan, bisections, folds, clips). */
  rays_traced: number;
  warnings: string[];
}

/** Largest maxHeight_m accepted, m. */
export const MAX_HEIGHT_LIMIT_M = 100_000;

/**
 * Computes the transfer curve at a range.
 * @param table the medium n(z).
 * @param observerHeight_m observer height, m (0 ≤ h < table top).
 * @param range_m target range, m (1..1e6).
 * @param options maxHeight_m (required), Earth radius, window, fan density (FanOptions).
 * @returns the curve, its folds, fate boundaries, images, lowest visible height and hidden bands.
 * Accuracy: heights as the tracer (about 2e-5 m at 50 km); image boundaries in elevation to better
 * than 1e-4° (see the module comment). An image end at a fate boundary where the rays just clear a
 * corner of n·r (a duct top on a profile node) is good to about 1 mm only: there the height at the
 * target range grows like the square root of the distance from the boundary, so the 1e-12 rad
 * bracket leaves L·√(2·sin α·1e-12) of height (L the remaining range). Elevations are limited to
 * the tracer's ±80°: a warning says when heights below maxHeight_m lie beyond that.
 * Validity: a stratified atmosphere over a sphere.
 * @throws InputRangeError naming observerHeight_m, range_m, maxHeight_m, earthRadius_m, rays,
 *   heightStep_m, minSpacing_rad, boundaryTolerance_rad, maxRays or window.
 * Reference: DESIGN.md §6–7; images and folds as in Young & Kattawar (1998), Appl. Opt. 37
 * (REFERENCES.md §6.4, abstract only).
 */
export function transferCurve(table: IndexTable, observerHeight_m: number, range_m: number, options: TransferOptions): TransferCurve {
  const o = validate(table, observerHeight_m, range_m, options);
  const probe = new RangeProbe(table, observerHeight_m, range_m, o.earthRadius_m);
  const window = o.window ?? transferWindow(probe, o.maxHeight_m);
  const fan = refinedFan(probe, window, o.maxHeight_m, o);
  const { folds, pieces } = transferPieces(probe, fan.samples, fan.boundaries);
  const images = imagesOf(probe, pieces, o.maxHeight_m);
  const boundaries = fan.boundaries.map((b) => ({
    elevation_rad: 0.5 * (b.below.elevation_rad + b.above.elevation_rad),
    below_fate: b.below.fate,
    above_fate: b.above.fate,
    height_m: boundaryHeight_m(b),
  }));
  const warnings = [...fan.warnings];
  const top = fan.samples[fan.samples.length - 1];
  if (top.fate === 'target' && top.height_m !== null && top.height_m <= o.maxHeight_m) {
    warnings.push('the highest ray of the window reaches the target range below the maximum height: heights above it were not traced');
  }
  return {
    range_m,
    observer_height_m: observerHeight_m,
    max_height_m: o.maxHeight_m,
    earth_radius_m: o.earthRadius_m,
    window,
    rays: fan.samples,
    folds,
    boundaries,
    pieces,
    images,
    lowest_visible_height_m: lowestVisibleHeight_m(images),
    hidden_bands: hiddenBands(images, o.maxHeight_m),
    rays_traced: probe.count,
    warnings,
  };
}

function validate(table: IndexTable, h: number, D: number, o: TransferOptions) {
  requireInRange('observerHeight_m', h, 0, table.top_m, 'm');
  if (h >= table.top_m) throw new InputRangeError('observerHeight_m', h, `0 <= h < ${table.top_m} m`);
  requireInRange('range_m', D, 1, 1e6, 'm');
  const maxHeight_m = requireInRange('maxHeight_m', o.maxHeight_m, 0, MAX_HEIGHT_LIMIT_M, 'm');
  if (maxHeight_m === 0) throw new InputRangeError('maxHeight_m', 0, `(0, ${MAX_HEIGHT_LIMIT_M}] m`);
  const earthRadius_m = requireInRange('earthRadius_m', o.earthRadius_m ?? TRANSFER_DEFAULTS.earthRadius_m, 1e5, 1e13, 'm');
  const rays = o.rays ?? FAN_DEFAULTS.rays;
  if (!Number.isInteger(rays) || rays < 3 || rays > 100_000) throw new InputRangeError('rays', rays, 'integers 3..100000');
  if (o.heightStep_m !== undefined && o.heightStep_m !== null) requireInRange('heightStep_m', o.heightStep_m, 1e-6, 1e5, 'm');
  requireInRange('minSpacing_rad', o.minSpacing_rad ?? FAN_DEFAULTS.minSpacing_rad, 1e-12, 1e-2, 'rad');
  requireInRange('boundaryTolerance_rad', o.boundaryTolerance_rad ?? FAN_DEFAULTS.boundaryTolerance_rad, 1e-14, 1e-4, 'rad');
  const maxRays = o.maxRays ?? FAN_DEFAULTS.maxRays;
  if (!Number.isInteger(maxRays) || maxRays < rays || maxRays > 1_000_000) throw new InputRangeError('maxRays', maxRays, `integers ${rays}..1000000`);
  const window = o.window ?? null;
  if (window !== null) {
    requireInRange('window.from_rad', window.from_rad, -WINDOW_LIMIT_RAD, WINDOW_LIMIT_RAD, 'rad (±80°)');
    requireInRange('window.to_rad', window.to_rad, -WINDOW_LIMIT_RAD, WINDOW_LIMIT_RAD, 'rad (±80°)');
    if (!(window.to_rad > window.from_rad)) throw new InputRangeError('window.to_rad', window.to_rad, `> window.from_rad (${window.from_rad})`);
  }
  return { ...o, maxHeight_m, earthRadius_m, window };
}
