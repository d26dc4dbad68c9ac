/**
 * The media of the two reference scenes a finding is compared with (sim/analysis/reference.ts),
 * built once per request and shared by the transfer, visibility and horizon parts:
 * - straight lines: n ≡ 1 up to the scenario's own column top (what buildMedium makes of the
 *   scenario with index_model 'none', without resolving the same air a second time);
 * - the US 1976 atmosphere at the scenario's surface air, taken from a medium source (a cache in
 *   the HTTP workers, so that edits which keep the surface air keep its table).
 */
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { referenceScenario } from '../../sim/analysis/reference.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import type { Scenario } from '../../sim/scenario.js';

/** Gives the medium of a scenario (builds it, or takes it from a cache); throws what buildMedium throws. */
export interface MediumSource {
  get(scenario: Scenario): Medium;
}

/** Builds every medium afresh. */
export const BUILD_MEDIUM: MediumSource = { get: buildMedium };

/** The reference media of one scenario. */
export interface ReferenceMedia {
  /** Straight lines of sight (n ≡ 1) over the scenario's own column. */
  geometry: Medium;
  /** The US 1976 atmosphere at the same surface air; null when it cannot be built. */
  standard: Medium | null;
  /** Why there is no standard medium (a warning sentence), else null. */
  standardWarning: string | null;
}

/**
 * The reference media of a scenario.
 * @param scenario the SI scenario.
 * @param medium its medium (the column gives the surface air and the top).
 * @param source where the US 1976 medium comes from. Default: built here.
 * @returns both media; a surface air outside the US 1976 model's range gives standard null and a warning.
 * Reference: DESIGN.md §7; sim/analysis/reference.ts.
 */
export function referenceMedia(scenario: Scenario, medium: Medium, source: MediumSource = BUILD_MEDIUM): ReferenceMedia {
  const geometry: Medium = { column: medium.column, table: vacuumTable(medium.column.top_m), warnings: [] };
  try {
    return { geometry, standard: source.get(referenceScenario(scenario, medium.column, 'standard')), standardWarning: null };
  } catch (error) {
    return { geometry, standard: null, standardWarning: standardWarning(error) };
  }
}

/**
 * The warning for a US 1976 reference that could not be made or used (a RangeError: the surface
 * air is outside the model's range); any other error is thrown again.
 */
export function standardWarning(error: unknown): string {
  if (!(error instanceof RangeError)) throw error;
  return `no US 1976 reference for this surface air: ${error.message}`;
}
