/**
 * All findings of a scenario in one: horizon, transfer curve with images and hidden bands,
 * looming and towering, visibility with resolvability, and astronomical refraction (the main
 * job's output). The transfer curves are computed once and shared by the transfer and visibility
 * parts; the reference media (straight lines, US 1976) are made once and shared by the transfer,
 * visibility and horizon parts, and the apparent horizon by the horizon and refraction parts. Used by the CLI `findings` command and the HTTP API; the readable text is
 * findingsText (./findings-text.ts).
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { horizon as apparentHorizon } from '../../sim/analysis/dip.js';
import type { Scenario } from '../../sim/scenario.js';
import { SAFETY_CAUTION } from './caution.js';
import { horizonFinding, type HorizonJson } from './horizon.js';
import { referenceMedia, type MediumSource } from './reference-media.js';
import { refractionFinding, type RefractionJson } from './refraction.js';
import { sightCurves } from './sight.js';
import { transferJson, type TransferJson } from './transfer.js';
import { visibilityJson, type VisibilityJson } from './visibility.js';

/** Options of findings. */
export interface FindingsOptions {
  /** Target range override, m (10..1 000 000). */
  range_m?: number;
  /** Target height override (top of the heights reported), m (0 < h ≤ 10 000). */
  max_height_m?: number;
  /** Apparent elevations of the refraction table, degrees (−90..90). Default 0, 1, 5, 10, 45. */
  refraction_elevations_deg?: readonly number[];
  /** True elevations of bodies (Sun, Moon), degrees (−90..90). Default none. */
  bodies_deg?: readonly number[];
  /** Rays of the transfer curve's first fan. */
  rays?: number;
  medium?: Medium;
  /** Where the US 1976 reference medium comes from (a cache in the HTTP workers). Default: built. */
  media?: MediumSource;
}

/** The findings JSON. */
export interface FindingsJson {
  scenario: string;
  description: string | null;
  observer_height_m: number;
  range_m: number;
  target_height_m: number;
  target_shape: string | null;
  index_model: string;
  wavelength_nm: number;
  horizon: HorizonJson;
  transfer: TransferJson;
  visibility: VisibilityJson;
  refraction: RefractionJson;
  /** Shown with every visibility verdict. */
  caution: string;
  warnings: string[];
}

/**
 * Computes every finding of a scenario.
 * @param scenario the SI scenario.
 * @param options range and height overrides, refraction elevations, bodies, rays, a prebuilt
 *   medium, a source of the US 1976 reference medium.
 * @returns the findings JSON (each part as its own command's JSON).
 * @throws InputRangeError naming the field for bad input.
 */
export function findings(scenario: Scenario, options: FindingsOptions = {}): FindingsJson {
  const medium = options.medium ?? buildMedium(scenario);
  const references = referenceMedia(scenario, medium, options.media);
  const curves = sightCurves(scenario, {
    medium,
    referenceMedia: references,
    ...(options.range_m !== undefined ? { range_m: options.range_m } : {}),
    ...(options.max_height_m !== undefined ? { max_height_m: options.max_height_m } : {}),
    ...(options.rays !== undefined ? { rays: options.rays } : {}),
  });
  const found = apparentHorizon(medium.table, scenario.observer.height_m, scenario.earth.radius_m);
  const horizon = horizonFinding(scenario, { medium, horizon: found, referenceMedia: references });
  const refraction = refractionFinding(scenario, {
    medium,
    horizon: found,
    ...(options.refraction_elevations_deg !== undefined ? { elevations_deg: options.refraction_elevations_deg } : {}),
    ...(options.bodies_deg !== undefined ? { bodies_deg: options.bodies_deg } : {}),
  });
  const warnings = [...new Set([...horizon.warnings, ...curves.warnings, ...refraction.warnings])];
  return {
    scenario: scenario.name,
    description: scenario.description ?? null,
    observer_height_m: scenario.observer.height_m,
    range_m: curves.range_m,
    target_height_m: curves.max_height_m,
    target_shape: scenario.target.shape ?? null,
    index_model: scenario.optics.index_model,
    wavelength_nm: scenario.optics.wavelength_um * 1000,
    horizon,
    transfer: transferJson(curves),
    visibility: visibilityJson(curves),
    refraction,
    caution: SAFETY_CAUTION,
    warnings,
  };
}
