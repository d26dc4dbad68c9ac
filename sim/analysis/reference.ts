/**
 * The reference scenes a finding is measured against (DESIGN.md §7): the US Standard Atmosphere
 * 1976 at the scenario's own surface temperature, pressure and humidity, and pure geometry
 * (index_model "none": straight lines of sight).
 */
import type { AirColumn } from '../atmosphere/column.js';
import type { Scenario } from '../scenario.js';

/** Which reference: the standard atmosphere, or straight lines (no refraction). */
export type ReferenceKind = 'standard' | 'geometry';

/**
 * A copy of the scenario with its air replaced by a reference.
 * - 'standard': atmosphere { kind: 'standard' } with the surface temperature and pressure of the
 *   resolved column (its values at 0 m, so a bulk or layered atmosphere is compared with the
 *   standard one that starts from the same surface air) and the scenario's relative humidity.
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
      surface_temperature_K: column.temperature_K(0),
      surface_pressure_Pa: column.pressure_Pa(0),
      relative_humidity: scenario.atmosphere.relative_humidity,
    },
  };
}
