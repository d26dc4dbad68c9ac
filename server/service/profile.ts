/** The resolved air of a scenario at chosen heights: shared by the CLI `profile` command and the HTTP API. */
import { CELSIUS_OFFSET_K } from '../../sim/constants.js';
import { buildMedium, type Medium } from '../../sim/atmosphere/medium.js';
import { evaluateIndex } from '../../sim/refractivity/index-table.js';
import { modifiedRefractivity_M } from '../../sim/refractivity/radio.js';
import { InputRangeError } from '../../sim/errors.js';
import type { Scenario } from '../../sim/scenario.js';

export const DEFAULT_PROFILE_HEIGHTS_M = [0, 1, 2, 5, 10, 20, 50, 100, 200, 500, 1000];

export interface ProfileLevel {
  height_m: number;
  temperature_C: number;
  pressure_hPa: number;
  vapour_pressure_hPa: number;
  refractive_index: number;
  refractivity_N: number;
  modified_refractivity_M: number;
  dn_dz_per_m: number;
  temperature_gradient_K_per_m: number;
}

/** The resolved air of a scenario at the given heights, as the tracer sees it (from the index table). */
export function profileLevels(scenario: Scenario, heights_m: readonly number[], medium: Medium = buildMedium(scenario)): { levels: ProfileLevel[]; warnings: string[]; top_m: number } {
  const top = medium.table.top_m;
  const out = new Float64Array(2);
  const levels = heights_m.map((z, i) => {
    if (z < 0 || z > top) throw new InputRangeError(`--heights[${i}]`, z, `0..${top} m`);
    evaluateIndex(medium.table, z, out);
    const N = out[0] * 1e6;
    return {
      height_m: z,
      temperature_C: medium.column.temperature_K(z) - CELSIUS_OFFSET_K,
      pressure_hPa: medium.column.pressure_Pa(z) / 100,
      vapour_pressure_hPa: medium.column.vapour_pressure_Pa(z) / 100,
      refractive_index: 1 + out[0],
      refractivity_N: N,
      modified_refractivity_M: modifiedRefractivity_M(N, z),
      dn_dz_per_m: out[1],
      temperature_gradient_K_per_m: medium.column.temperatureGradient_K_per_m(z, 1),
    };
  });
  return { levels, warnings: medium.warnings, top_m: top };
}

