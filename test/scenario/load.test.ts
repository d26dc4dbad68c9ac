import { describe, expect, it } from 'vitest';
import { scenarioFromJson, scenarioFromText } from '../../server/scenario/load.js';
import { listUncertainInputs, pointValue } from '../../server/scenario/convert.js';
import { ScenarioError } from '../../server/scenario/errors.js';

const base = {
  name: 'Test scenario (invented)',
  observer: { height_m: 6 },
  target: { range_m: 35000, height_m: 40 },
  atmosphere: {
    relative_humidity: 0.7,
    profile: [
      { height_m: 0, temperature_C: 2 },
      { height_m: 30, temperature_C: 12 },
    ],
    above: 'us1976',
  },
};

function errorOf(value: unknown): ScenarioError {
  try {
    scenarioFromJson(value);
  } catch (error) {
    expect(error).toBeInstanceOf(ScenarioError);
    return error as ScenarioError;
  }
  throw new Error('expected a ScenarioError');
}

describe('scenario loading', () => {
  it('converts file units to SI and fills the documented defaults', () => {
    const { scenario } = scenarioFromJson(base);
    expect(scenario.atmosphere).toEqual({
      kind: 'profile',
      surface_pressure_Pa: 101325,
      relative_humidity: 0.7,
      nodes: [
        { height_m: 0, temperature_K: 275.15 },
        { height_m: 30, temperature_K: 285.15 },
      ],
      above: { kind: 'us1976' },
    });
    expect(scenario.optics).toEqual({ wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 });
    expect(scenario.earth.radius_m).toBe(6_371_000);
  });

  it('names an unknown key', () => {
    expect(errorOf({ ...base, colour: 'blue' }).message).toContain('colour: unknown key');
    expect(errorOf({ ...base, observer: { height_m: 6, eyes: 2 } }).message).toContain('observer.eyes: unknown key');
  });

  it('names the field, the value and the allowed range of an out-of-range number', () => {
    expect(errorOf({ ...base, observer: { height_m: -3 } }).message).toBe('observer.height_m: -3 is out of range: allowed 0..10000 m');
    expect(errorOf({ ...base, optics: { wavelength_nm: 5000 } }).message).toBe('optics.wavelength_nm: 5000 is out of range: allowed 300..1700 nm');
    expect(errorOf({ ...base, atmosphere: { ...base.atmosphere, relative_humidity: 1.5 } }).message).toContain('atmosphere.relative_humidity: 1.5 is out of range: allowed 0..1');
  });

  it('rejects profile heights that do not increase strictly', () => {
    const bad = { ...base, atmosphere: { profile: [{ height_m: 0, temperature_C: 2 }, { height_m: 0, temperature_C: 3 }] } };
    expect(errorOf(bad).field).toBe('atmosphere.profile.1.height_m');
  });

  it('rejects a wrong type with the expected form', () => {
    expect(errorOf({ ...base, target: { range_m: '35 km', height_m: 40 } }).message).toContain('target.range_m');
  });

  it('reports malformed JSON without a stack trace', () => {
    expect(() => scenarioFromText('{ "name": ', 'broken.json')).toThrow(/broken.json is not valid JSON/);
  });

  it('rejects physically impossible marine observations with the field named', () => {
    const bulk = { ...base, atmosphere: { bulk: { sea_temperature_C: 5, air_temperature_C: 9, wind_speed_m_s: -1 } } };
    expect(errorOf(bulk).message).toBe('atmosphere.bulk.wind_speed_m_s: -1 is out of range: allowed 0..40 m/s');
  });

  it('uses the mean, the midpoint or the first choice of a distribution for a single run', () => {
    expect(pointValue({ normal: { mean: 3, sd: 1 } })).toBe(3);
    expect(pointValue({ uniform: { min: 13, max: 15 } })).toBe(14);
    expect(pointValue({ choice: [2, 3, 5] })).toBe(2);
    const uncertain = { ...base, observer: { height_m: { uniform: { min: 5, max: 7 } } } };
    expect(scenarioFromJson(uncertain).scenario.observer.height_m).toBe(6);
    expect(listUncertainInputs(uncertain)).toEqual([{ path: 'observer.height_m', distribution: { uniform: { min: 5, max: 7 } } }]);
  });

  it('checks the parameters of a distribution against the field range', () => {
    expect(errorOf({ ...base, observer: { height_m: { normal: { mean: -1, sd: 1 } } } }).problems.join('\n')).toContain('observer.height_m');
  });

  it('derives the Earth radius from latitude and azimuth on the WGS 84 ellipsoid', () => {
    // Meridional radius at the equator: a(1 − e²) = 6 335 439.327 m (WGS 84, NIMA TR8350.2 Table 3.1 constants; standard geodesy formula).
    const { scenario } = scenarioFromJson({ ...base, earth: { latitude_deg: 0, azimuth_deg: 0 } });
    expect(scenario.earth.radius_m).toBeCloseTo(6_335_439.327, 2);
  });
});
