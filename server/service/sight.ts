/**
 * The sight-line analysis of a scenario, computed once and shared by the `transfer`,
 * `visibility` and `findings` services: the transfer curve at the target range in the scenario's
 * air, in the US 1976 reference atmosphere at the same surface air, and in pure geometry.
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { InputRangeError, requireInRange } from '../../sim/errors.js';
import { transferCurve, type TransferCurve } from '../../sim/analysis/transfer.js';
import type { Scenario } from '../../sim/scenario.js';
import { referenceMedia, standardWarning, type MediumSource, type ReferenceMedia } from './reference-media.js';

/** Options of sightCurves. */
export interface SightOptions {
  /** The scenario's medium, if already built (saves rebuilding it). */
  medium?: Medium;
  /** Target range override, m (10..1 000 000, the scenario file's range). Default: target.range_m. */
  range_m?: number;
  /** Top of the heights reported, m (0 < h ≤ 10 000). Default: the target's height. */
  max_height_m?: number;
  /** Rays of the first fan (3..100 000). Default: the fan's (sim/analysis/transfer-fan.ts). */
  rays?: number;
  /** Also compute the two reference curves. Default true. */
  references?: boolean;
  /** The reference media, if already made (saves making them again; ./reference-media.ts). */
  referenceMedia?: ReferenceMedia;
  /** Where the US 1976 reference medium comes from when referenceMedia is not given. Default: built. */
  media?: MediumSource;
}

/** The curves of one scenario at one range. */
export interface SightCurves {
  scenario: Scenario;
  medium: Medium;
  range_m: number;
  max_height_m: number;
  actual: TransferCurve;
  /** In the US 1976 atmosphere at the same surface air; null when not asked for or not possible. */
  standard: TransferCurve | null;
  /** With straight lines of sight (index_model 'none'); null when not asked for. */
  geometry: TransferCurve | null;
  warnings: string[];
}

/** Ranges of the overrides, with units (the scenario file's own limits, server/scenario/schema.ts). */
export const SIGHT_LIMITS = { range_m: [10, 1_000_000], max_height_m: [0, 10_000] } as const;

/**
 * The transfer curves of a scenario.
 * @param scenario the SI scenario.
 * @param options medium, range and maximum-height overrides, fan rays, references.
 * @returns the curves and the medium's warnings.
 * @throws InputRangeError naming range_m, max_height_m (or target.height_m when the target's height
 *   is 0 and no maximum height is given) or rays.
 */
export function sightCurves(scenario: Scenario, options: SightOptions = {}): SightCurves {
  const range_m = requireInRange('range_m', options.range_m ?? scenario.target.range_m, SIGHT_LIMITS.range_m[0], SIGHT_LIMITS.range_m[1], 'm');
  const max_height_m = options.max_height_m ?? scenario.target.height_m;
  const field = options.max_height_m === undefined ? 'target.height_m' : 'max_height_m';
  requireInRange(field, max_height_m, SIGHT_LIMITS.max_height_m[0], SIGHT_LIMITS.max_height_m[1], 'm');
  if (!(max_height_m > 0)) throw new InputRangeError(field, max_height_m, `(0, ${SIGHT_LIMITS.max_height_m[1]}] m: a height above the surface to look for`);
  const medium = options.medium ?? buildMedium(scenario);
  const curve = (m: Medium): TransferCurve =>
    transferCurve(m.table, scenario.observer.height_m, range_m, {
      maxHeight_m: max_height_m,
      earthRadius_m: scenario.earth.radius_m,
      ...(options.rays !== undefined ? { rays: options.rays } : {}),
    });
  const actual = curve(medium);
  const warnings = [...medium.warnings, ...actual.warnings];
  let standard: TransferCurve | null = null;
  let geometry: TransferCurve | null = null;
  if (options.references ?? true) {
    const references = options.referenceMedia ?? referenceMedia(scenario, medium, options.media);
    geometry = curve(references.geometry);
    if (references.standard) {
      try {
        standard = curve(references.standard);
      } catch (error) {
        warnings.push(standardWarning(error));
      }
    } else if (references.standardWarning) warnings.push(references.standardWarning);
  }
  return { scenario, medium, range_m, max_height_m, actual, standard, geometry, warnings };
}
