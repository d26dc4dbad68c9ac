/** server/http/validate.ts: naming sim/ fields by their place in a request body. */
import { describe, expect, it } from 'vitest';
import { scenarioField } from '../../server/http/validate.js';

describe('scenarioField', () => {
  it('puts scenario fields under "scenario." in the file\'s own units and structure', () => {
    expect(scenarioField('observerHeight_m')).toBe('scenario.observer.height_m');
    expect(scenarioField('atmosphere.nodes[2].temperature_K')).toBe('scenario.atmosphere.profile.2.temperature_C');
    expect(scenarioField('atmosphere.surface_pressure_Pa')).toBe('scenario.atmosphere.surface_pressure_hPa');
    expect(scenarioField('optics.wavelength_um')).toBe('scenario.optics.wavelength_nm');
    expect(scenarioField('atmosphere.bulk.sea_temperature_K')).toBe('scenario.atmosphere.bulk.sea_temperature_C');
    expect(scenarioField('target.outline_m')).toBe('scenario.target.outline');
  });

  it('keeps fields that are not part of a scenario, unless told they are', () => {
    expect(scenarioField('fan.count')).toBe('fan.count');
    expect(scenarioField('elevations_deg[3]')).toBe('elevations_deg[3]');
    expect(scenarioField('foo', 'scenario', true)).toBe('scenario.foo');
  });
});
