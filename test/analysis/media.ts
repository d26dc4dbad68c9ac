/**
 * Media for the analysis tests, built through the real chain (scenario → US 1976 / layered
 * temperature profile → hydrostatic pressure → Ciddor → index table): sim/atmosphere/medium.ts.
 */
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { CELSIUS_OFFSET_K, EARTH_RADIUS_M } from '../../sim/constants.js';
import type { IndexTable } from '../../sim/refractivity/index-table.js';
import type { AboveSpec, AtmosphereSpec, OpticsSpec, Scenario } from '../../sim/scenario.js';

/** Default optics of the tests: Ciddor 1996, 550 nm, 450 ppm CO2 (DESIGN.md §5 defaults). */
export const TEST_OPTICS: OpticsSpec = { wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 };

/** Tabulated medium of an atmosphere. */
export function tableOf(atmosphere: AtmosphereSpec, optics: Partial<OpticsSpec> = {}): IndexTable {
  const scenario: Scenario = {
    name: 'Analysis test water (invented)',
    observer: { height_m: 10 },
    target: { range_m: 20_000, height_m: 10 },
    atmosphere,
    optics: { ...TEST_OPTICS, ...optics },
    earth: { radius_m: EARTH_RADIUS_M },
  };
  return buildMedium(scenario).table;
}

/** The US 1976 standard atmosphere shifted to a surface temperature (°C), dry unless told. */
export function standardAtmosphere(surface_C: number, surface_hPa = 1013.25, relative_humidity = 0): AtmosphereSpec {
  return { kind: 'standard', surface_temperature_K: surface_C + CELSIUS_OFFSET_K, surface_pressure_Pa: surface_hPa * 100, relative_humidity };
}

/** A layered profile: [height_m, temperature_C] nodes, then `above`. */
export function layeredAtmosphere(
  nodes: [number, number][],
  above: AboveSpec,
  surface_hPa = 1013.25,
  relative_humidity = 0,
): AtmosphereSpec {
  return {
    kind: 'profile',
    surface_pressure_Pa: surface_hPa * 100,
    relative_humidity,
    nodes: nodes.map(([height_m, t]) => ({ height_m, temperature_K: t + CELSIUS_OFFSET_K })),
    above,
  };
}
