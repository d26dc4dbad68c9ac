/**
 * From a scenario to the medium the tracer reads: the resolved air column and its index table,
 * with soft problems as warnings.
 */
import { buildIndexTable } from '../refractivity/build-table.js';
import { vacuumTable, type IndexTable } from '../refractivity/index-table.js';
import { INDEX_MODEL_VALIDITY, checkOpticalOptions, refractivityModel } from '../refractivity/models.js';
import type { Scenario } from '../scenario.js';
import type { AirColumn } from './column.js';
import { resolveAirColumn } from './resolve.js';
import { resolveBulkColumn } from './surface-column.js';
import { US1976_TOP_M } from './us1976.js';

/** The medium of a scenario. */
export interface Medium {
  /** The resolved air (temperature, pressure, vapour; kinks; top). */
  column: AirColumn;
  /** n(z) tabulated from 0 to column.top_m (n ≡ 1 for index_model 'none'). */
  table: IndexTable;
  /** Soft problems in plain sentences (e.g. the air ends below 86 km); empty when none. */
  warnings: string[];
}

/**
 * Resolves a scenario's atmosphere and tabulates its refractive index.
 *
 * - 'profile' and 'standard' atmospheres: resolveAirColumn; 'bulk': the surface-layer module.
 * - index_model 'none': a vacuum table (n ≡ 1) to the column's top; otherwise buildIndexTable with
 *   refractivityModel(index_model, optics).
 * Warnings: the modelled air ends below 86 km (a constant-lapse continuation left 150..400 K);
 * column temperatures or pressures outside the index model's accepted range (INDEX_MODEL_VALIDITY),
 * checked where p ≥ 1 % of the surface pressure (below about 31 km; higher, n − 1 < 3e-6 and the
 * models are in their ideal-gas limit); the extremes of T are at the surface, the kinks or that
 * height, as T is monotone between kinks.
 *
 * Validates the atmosphere (see resolveAirColumn) and the optics (checkOpticalOptions, fields
 * `optics.wavelength_um`, `optics.co2_ppm`): throws InputRangeError / InputError naming the field.
 * @param scenario the SI scenario.
 * @returns column, table and warnings.
 * Reference: DESIGN.md §1 and §4.
 */
export function buildMedium(scenario: Scenario): Medium {
  const atmosphere = scenario.atmosphere;
  const optics = scenario.optics;
  checkOpticalOptions(optics.index_model, optics, 'optics.');
  let column: AirColumn;
  let surfaceWarnings: string[] = [];
  switch (atmosphere.kind) {
    case 'profile':
    case 'standard':
      column = resolveAirColumn(atmosphere);
      break;
    case 'bulk': {
      const bulk = resolveBulkColumn(atmosphere);
      column = bulk.column;
      surfaceWarnings = bulk.warnings;
      break;
    }
    default:
      throw new Error(`unknown atmosphere kind ${JSON.stringify((atmosphere as { kind: unknown }).kind)}`);
  }
  const warnings = [...surfaceWarnings, ...columnWarnings(column, optics.index_model)];
  const table = optics.index_model === 'none' ? vacuumTable(column.top_m) : buildIndexTable(column, refractivityModel(optics.index_model, optics));
  return { column, table, warnings };
}

/** Warnings about a column: a low top, and states outside the index model's accepted ranges. */
export function columnWarnings(column: AirColumn, index_model: Scenario['optics']['index_model']): string[] {
  const warnings: string[] = [];
  if (column.top_m < US1976_TOP_M) {
    warnings.push(
      `the modelled air ends at ${column.top_m.toFixed(0)} m, where the constant lapse above the last node reaches ` +
        `${column.temperature_K(column.top_m).toFixed(1)} K; rays that climb higher count as escaped`,
    );
  }
  const validity = INDEX_MODEL_VALIDITY[index_model];
  const ceiling = lowPressureHeight_m(column);
  const heights = [0, ...column.kinks_m.filter((z) => z < ceiling), ceiling];
  if (validity.temperature_K) {
    const [low, high] = validity.temperature_K;
    const outside = heights.filter((z) => column.temperature_K(z) < low || column.temperature_K(z) > high);
    if (outside.length > 0) {
      const z = outside[0];
      warnings.push(
        `the air temperature leaves the ${low}..${high} K accepted by the "${index_model}" index model ` +
          `(${column.temperature_K(z).toFixed(1)} K at ${z.toFixed(0)} m); n there is extrapolated`,
      );
    }
  }
  if (validity.pressure_Pa && column.pressure_Pa(0) > validity.pressure_Pa[1]) {
    warnings.push(
      `the surface pressure ${column.pressure_Pa(0).toFixed(0)} Pa is above the ${validity.pressure_Pa[1]} Pa accepted by the "${index_model}" index model`,
    );
  }
  return warnings;
}

/**
 * Fraction of the surface pressure above which a model's temperature range is not checked: there
 * n − 1 is below 3e-6 and every model is in its ideal-gas limit, n − 1 ∝ density.
 */
const CHECKED_PRESSURE_FRACTION = 0.01;

/** Height where the pressure falls to CHECKED_PRESSURE_FRACTION of the surface value (about 31 km), or the top. */
function lowPressureHeight_m(column: AirColumn): number {
  const limit = CHECKED_PRESSURE_FRACTION * column.pressure_Pa(0);
  if (column.pressure_Pa(column.top_m) >= limit) return column.top_m;
  let lo = 0;
  let hi = column.top_m;
  for (let i = 0; i < 40; i++) {
    const mid = 0.5 * (lo + hi);
    if (column.pressure_Pa(mid) >= limit) lo = mid;
    else hi = mid;
  }
  return lo;
}
