import { describe, expect, it } from 'vitest';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { InputRangeError } from '../../sim/errors.js';
import { refractivityModel } from '../../sim/refractivity/models.js';
import type { AtmosphereSpec, OpticsSpec, Scenario } from '../../sim/scenario.js';
import { expectClose } from '../support/close.js';

const OPTICS: OpticsSpec = { wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 };

function scenario(atmosphere: AtmosphereSpec, optics: Partial<OpticsSpec> = {}): Scenario {
  return {
    name: 'Test strait (invented)',
    observer: { height_m: 6 },
    target: { range_m: 20_000, height_m: 30 },
    atmosphere,
    optics: { ...OPTICS, ...optics },
    earth: { radius_m: 6_371_000 },
  };
}

const standard = (surface_temperature_K: number): AtmosphereSpec => ({ kind: 'standard', surface_temperature_K, surface_pressure_Pa: 101_325, relative_humidity: 0 });

describe('the medium of a scenario', () => {
  it('tabulates the chosen model from the surface to 86 km without warnings for the standard atmosphere', () => {
    const medium = buildMedium(scenario(standard(288.15)));
    expect(medium.warnings).toEqual([]);
    expect(medium.table.top_m).toBe(86_000);
    const surface = refractivityModel('ciddor', OPTICS)({ temperature_K: 288.15, pressure_Pa: 101_325, vapour_pressure_Pa: 0 });
    expectClose(medium.table.nm1[0], surface, { rel: 1e-15 });
  });

  it('uses the radio refractivity when asked: N = 272.872 at 15 °C, 1013.25 hPa, dry', () => {
    // REFERENCES.md §2.1 worked values (ITU-R P.453): independent computation; the fixture prints 3 decimals.
    const medium = buildMedium(scenario(standard(288.15), { index_model: 'radio' }));
    expectClose(medium.table.nm1[0] * 1e6, 272.872, { abs: 5e-4 });
  });

  it('gives a vacuum table (n ≡ 1) for index model "none"', () => {
    const medium = buildMedium(scenario(standard(288.15), { index_model: 'none' }));
    expect(Array.from(medium.table.nm1)).toEqual([0, 0]);
    expect(medium.table.top_m).toBe(medium.column.top_m);
  });

  it('resolves bulk atmospheres with the surface-layer module, passing its warnings on', () => {
    const bulk: AtmosphereSpec = {
      kind: 'bulk',
      sea_temperature_K: 283.15,
      air_temperature_K: 288.15,
      air_temperature_height_m: 10,
      wind_speed_m_s: 5,
      wind_height_m: 10,
      relative_humidity: 0.8,
      surface_pressure_Pa: 101_300,
      cool_skin: false,
      nodes: [],
      above: { kind: 'us1976' },
    };
    const medium = buildMedium(scenario(bulk));
    // The surface-layer profile passes through the observed air temperature at its height (identity of the construction).
    expectClose(medium.column.temperature_K(10), 288.15, { abs: 1e-9 });
    // Warm air over cold water with L ≈ 6.4 m: the stable cap ends the surface layer (sim/atmosphere/surface-profile.ts).
    expect(medium.warnings.join(' ')).toMatch(/stable air/);
    expect(medium.table.top_m).toBe(86_000);
  });

  it('warns when a constant lapse ends the air below 86 km', () => {
    const lapse: AtmosphereSpec = {
      kind: 'profile',
      surface_pressure_Pa: 101_325,
      relative_humidity: 0.5,
      nodes: [{ height_m: 0, temperature_K: 288.15 }],
      above: { kind: 'lapse', lapse_K_per_m: -0.0065 },
    };
    const medium = buildMedium(scenario(lapse));
    expectClose(medium.table.top_m, (288.15 - 150) / 0.0065, { rel: 1e-12 });
    // (288.15 − 150)/0.0065 = 21 254 m; the lapse also takes the air below the model's 180 K on the way.
    expect(medium.warnings).toHaveLength(2);
    expect(medium.warnings[0]).toContain('ends at 21254 m');
    expect(medium.warnings[1]).toContain('180..340 K');
  });

  it("warns when the air is colder than the model's accepted range where it matters, and not for a 0 °C standard atmosphere", () => {
    expect(buildMedium(scenario(standard(273.15))).warnings).toEqual([]);
    const cold = buildMedium(scenario(standard(213.15)));
    expect(cold.warnings).toHaveLength(1);
    expect(cold.warnings[0]).toContain('180..340 K');
  });

  it('rejects optics outside the model range, naming the field', () => {
    expect(() => buildMedium(scenario(standard(288.15), { wavelength_um: 3 }))).toThrow(InputRangeError);
    expect(() => buildMedium(scenario(standard(288.15), { wavelength_um: 3 }))).toThrow('optics.wavelength_um');
  });
});
