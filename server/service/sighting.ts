/**
 * Sighting range of a scenario's target (single run): visibility against range along the line of
 * sight and the ranges at which its top, its light and its whole height are first (approaching)
 * or last (receding) seen. Shared by the CLI `sighting` command, the report and the HTTP API.
 */
import { rangeVisibility } from '../../sim/analysis/ensemble-member.js';
import { sightingSweep, type SightingOptions, type SightingResult } from '../../sim/analysis/sighting.js';
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { InputRangeError } from '../../sim/errors.js';
import type { Scenario } from '../../sim/scenario.js';
import { SAFETY_CAUTION } from './caution.js';

/** The sighting JSON. */
export interface SightingJson extends SightingResult {
  scenario: string;
  observer_height_m: number;
  caution: string;
  warnings: string[];
}

/**
 * Sweeps the scenario's target over the ranges of `options`.
 * @param scenario the SI scenario (target height > 0).
 * @param options grid, direction, light height, tolerance (sim/analysis/sighting.ts).
 * @param medium the scenario's medium if already built.
 * @throws InputRangeError naming target.height_m when it is 0, or the sighting field at fault.
 */
export function sightingFinding(scenario: Scenario, options: SightingOptions, medium: Medium = buildMedium(scenario)): SightingJson {
  if (!(scenario.target.height_m > 0)) throw new InputRangeError('target.height_m', scenario.target.height_m, '(0, 10000] m: a target with a height to look for');
  const sweep = sightingSweep((r) => rangeVisibility(medium, scenario, r), scenario.target.height_m, options);
  return { scenario: scenario.name, observer_height_m: scenario.observer.height_m, ...sweep, caution: SAFETY_CAUTION, warnings: medium.warnings };
}
