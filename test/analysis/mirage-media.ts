/**
 * Test media for the transfer-curve tests: invented inversions like those of the mirage profiles in
 * profiles/ (kept here so the tests do not change when a profile is edited), built through the
 * real chain (layered temperature profile → hydrostatic pressure → Ciddor 550 nm → index table).
 */
import type { IndexTable } from '../../sim/refractivity/index-table.js';
import { layeredAtmosphere, tableOf } from './media.js';

/** A mirage case: the medium, the observer, the target. */
export interface MirageCase {
  table: IndexTable;
  observer_m: number;
  range_m: number;
  top_m: number;
}

/** Hot flats: 48 °C ground under 30 °C air (a superadiabatic layer of 18 K in 10 m); observer 1.6 m, 2.5 km. */
export function inferiorMirage(top_m = 20): MirageCase {
  const air = layeredAtmosphere([[0, 48], [0.1, 41], [0.5, 35], [2, 32], [10, 30]], { kind: 'us1976' }, 1008, 0.2);
  return { table: tableOf(air), observer_m: 1.6, range_m: 2500, top_m };
}

/** Cold sea under a 4 K inversion from 6 to 16 m; observer 3 m inside the duct, target 26 m at 20 km. */
export function superiorMirage(): MirageCase {
  const air = layeredAtmosphere([[0, 1], [6, 1.3], [16, 5.3], [56, 5.8]], { kind: 'us1976' }, 1022, 0.85);
  return { table: tableOf(air), observer_m: 3, range_m: 20_000, top_m: 26 };
}

/** A 4 K inversion from 12 to 22 m just above a 10 m observer; a 30 m beacon at 40 km. */
export function stackedImages(): MirageCase {
  const air = layeredAtmosphere([[0, -1], [12, -0.6], [22, 3.4], [40, 3.8]], { kind: 'us1976' }, 1015, 0.9);
  return { table: tableOf(air), observer_m: 10, range_m: 40_000, top_m: 30 };
}
