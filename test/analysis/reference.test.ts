import { describe, expect, it } from 'vitest';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { referenceScenario } from '../../sim/analysis/reference.js';
import type { Scenario } from '../../sim/scenario.js';
import { layeredAtmosphere, TEST_OPTICS } from './media.js';

const scenario: Scenario = {
  name: 'Reference test water (invented)',
  observer: { height_m: 3 },
  target: { range_m: 20_000, height_m: 26 },
  atmosphere: layeredAtmosphere([[0, 1], [6, 1.3], [16, 5.3]], { kind: 'us1976' }, 1022, 0.85),
  optics: TEST_OPTICS,
  earth: { radius_m: 6_371_000 },
};

describe('reference scenarios', () => {
  const column = buildMedium(scenario).column;

  it('put the US 1976 atmosphere over the same surface air: temperature, pressure and humidity at 0 m', () => {
    const ref = referenceScenario(scenario, column, 'standard');
    expect(ref.atmosphere).toEqual({ kind: 'standard', surface_temperature_K: column.temperature_K(0), surface_pressure_Pa: column.pressure_Pa(0), relative_humidity: 0.85 });
    const refColumn = buildMedium(ref).column;
    expect(refColumn.temperature_K(0)).toBeCloseTo(274.15, 9);
    expect(refColumn.pressure_Pa(0)).toBeCloseTo(102_200, 6);
    expect(ref.observer).toEqual(scenario.observer);
  });

  it('keep the air but draw straight lines for pure geometry, leaving the scenario untouched', () => {
    const ref = referenceScenario(scenario, column, 'geometry');
    expect(ref.optics.index_model).toBe('none');
    expect(ref.atmosphere).toBe(scenario.atmosphere);
    expect(scenario.optics.index_model).toBe('ciddor');
  });

  it('run the US 1976 reference of marine observations through the observed air temperature, not the sea skin', () => {
    const bulk: Scenario = {
      ...scenario,
      atmosphere: {
        kind: 'bulk',
        sea_temperature_K: 276.15,
        air_temperature_K: 281.65,
        air_temperature_height_m: 10,
        wind_speed_m_s: 4,
        wind_height_m: 10,
        relative_humidity: 0.85,
        surface_pressure_Pa: 102_100,
        cool_skin: false,
        nodes: [],
        above: { kind: 'us1976' },
      },
    };
    const ref = referenceScenario(bulk, buildMedium(bulk).column, 'standard');
    const refColumn = buildMedium(ref).column;
    // The reference passes through the observation: 8.5 °C at 10 m (and so 6.5 K/km × ~10 m warmer at the sea).
    expect(refColumn.temperature_K(10)).toBeCloseTo(281.65, 9);
    expect(refColumn.temperature_K(0) - 281.65).toBeCloseTo(0.065, 3);
  });
});
