/**
 * The reference scenes a finding is measured against (DESIGN.md §7): the US Standard Atmosphere
 * 1976 at the scenario's own surface temperature, pressure and humidity, and pure geometry
 * (index_model "none": straight lines of sight).
 */
import type { AirColumn } from '../atmosphere/column.js';
import { us1976Temperature_K } from '../atmosphere/us1976.js';
import { STANDARD_TEMPERATURE_K } from '../constants.js';
import type { Scenario } from '../scenario.js';

/**
 * Surface temperature of the US 1976 reference for a scenario, K. For marine observations (bulk)
 * it is the standard atmosphere passing through the observed air temperature at its measurement
 * height (the air above the surface layer, not the sea skin), the same rule the outlook uses
 * (sim/analysis/outlook.ts referenceAtmosphere); otherwise the resolved column's value at 0 m.
 */
export function referenceSurfaceTemperature_K(scenario: Scenario, column: AirColumn): number {
  const atm = scenario.atmosphere;
  if (atm.kind === 'bulk') return atm.air_temperature_K + STANDARD_TEMPERATURE_K - us1976Temperature_K(atm.air_temperature_height_m);
  return column.temperature_K(0);
}

/** Which reference: the standard atmosphere, or straight lines (no refraction). */
export type ReferenceKind = 'standard' | 'geometry';

/**
 * A copy of the scenario with its air replaced by a reference.
 * - 'standard': atmosphere { kind: 'standard' } with the surface pressure of the resolved column,
 *   the scenario's relative humidity, and the surface temperature of referenceSurfaceTemperature_K
 *   (the column's value at 0 m for layered air, so it is compared with the standard atmosphere
 *   that starts from the same surface air; for marine observations the standard atmosphere
 *   through the observed air temperature).
 * - 'geometry': the same scenario with optics.index_model 'none' (n ≡ 1).
 * @param scenario the SI scenario.
 * @param column its resolved air column (sim/atmosphere/medium.ts), for the surface values.
 * @param kind which reference.
 * @returns the reference scenario (plain data; the input is not modified).
 * Reference: US Standard Atmosphere 1976 (NOAA/NASA/USAF), as implemented in sim/atmosphere/us1976.ts.
 */
export function referenceScenario(scenario: Scenario, column: AirColumn, kind: ReferenceKind): Scenario {
  if (kind === 'geometry') return { ...scenario, optics: { ...scenario.optics, index_model: 'none' } };
  return {
    ...scenario,
    name: `${scenario.name} — US 1976 reference`,
    atmosphere: {
      kind: 'standard',
      surface_temperature_K: referenceSurfaceTemperature_K(scenario, column),
      surface_pressure_Pa: column.pressure_Pa(0),
      relative_humidity: scenario.atmosphere.relative_humidity,
    },
  };
}
