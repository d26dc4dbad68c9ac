import { describe, expect, it } from 'vitest';
import { PROFILE_TEMPERATURE_RANGE_K, profileTemperature, standardTemperature } from '../../sim/atmosphere/temperature-profile.js';
import { US1976_KINKS_M, US1976_TOP_M, us1976Temperature_K, us1976TemperatureGradient_K_per_m } from '../../sim/atmosphere/us1976.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';

/** K. Linear interpolation and the US 1976 shift lose only rounding on values near 300 K. */
const T_ABS_K = 1e-12;
/** K/m. Slopes from differences of node values: rounding only. */
const GRADIENT_ABS_K_PER_M = 1e-14;

const inversion = [
  { height_m: 0, temperature_K: 275.15 },
  { height_m: 30, temperature_K: 285.15 },
  { height_m: 100, temperature_K: 284.7 },
];

describe('a layered temperature profile', () => {
  it('is linear between nodes', () => {
    const profile = profileTemperature(inversion, { kind: 'us1976' });
    expectClose(profile.temperature_K(15), 280.15, { abs: T_ABS_K });
    expectClose(profile.temperature_K(65), 0.5 * (285.15 + 284.7), { abs: T_ABS_K });
    expectClose(profile.temperatureGradient_K_per_m(10, 1), 10 / 30, { abs: GRADIENT_ABS_K_PER_M });
  });

  it('gives one-sided gradients at a node, different across it', () => {
    const profile = profileTemperature(inversion, { kind: 'us1976' });
    expectClose(profile.temperatureGradient_K_per_m(30, -1), 10 / 30, { abs: GRADIENT_ABS_K_PER_M });
    expectClose(profile.temperatureGradient_K_per_m(30, 1), -0.45 / 70, { abs: GRADIENT_ABS_K_PER_M });
    expect(profile.kinks_m.slice(0, 2)).toEqual([30, 100]);
  });

  it('continues above the last node with the US 1976 lapse rates, T = T_last + T76(z) − T76(z_last)', () => {
    // DESIGN.md §5 `above: "us1976"`.
    const profile = profileTemperature(inversion, { kind: 'us1976' });
    for (const z of [100, 500, 11_000, 11_100, 30_000, 85_000]) {
      expectClose(profile.temperature_K(z), 284.7 + us1976Temperature_K(z) - us1976Temperature_K(100), { abs: T_ABS_K });
    }
    expectClose(profile.temperatureGradient_K_per_m(100, 1), us1976TemperatureGradient_K_per_m(100, 1), { abs: GRADIENT_ABS_K_PER_M });
    expect(profile.kinks_m.slice(2)).toEqual(US1976_KINKS_M);
    expect(profile.top_m).toBe(US1976_TOP_M);
  });

  it('continues above the last node with a constant lapse', () => {
    const profile = profileTemperature(inversion, { kind: 'lapse', lapse_K_per_m: -0.0065 });
    expectClose(profile.temperature_K(1100), 284.7 - 6.5, { abs: T_ABS_K });
    expect(profile.temperatureGradient_K_per_m(5000, -1)).toBe(-0.0065);
    expect(profile.kinks_m).toEqual([30, 100]);
  });

  it('ends a constant-lapse continuation where the temperature would leave the allowed range', () => {
    const cooling = profileTemperature(inversion, { kind: 'lapse', lapse_K_per_m: -0.0065 });
    expectClose(cooling.top_m, 100 + (284.7 - PROFILE_TEMPERATURE_RANGE_K.min) / 0.0065, { rel: 1e-15 });
    expectClose(cooling.temperature_K(cooling.top_m), PROFILE_TEMPERATURE_RANGE_K.min, { abs: 1e-9 });
    const warming = profileTemperature(inversion, { kind: 'lapse', lapse_K_per_m: 0.01 });
    expectClose(warming.temperature_K(warming.top_m), PROFILE_TEMPERATURE_RANGE_K.max, { abs: 1e-9 });
    expect(profileTemperature(inversion, { kind: 'lapse', lapse_K_per_m: 0 }).top_m).toBe(US1976_TOP_M);
  });

  it('holds the first node temperature below it when the first node is above the surface', () => {
    const profile = profileTemperature([{ height_m: 50, temperature_K: 280 }, { height_m: 60, temperature_K: 282 }], { kind: 'us1976' });
    expect(profile.temperature_K(0)).toBe(280);
    expect(profile.temperature_K(49.9)).toBe(280);
    expect(profile.temperatureGradient_K_per_m(50, -1)).toBe(0);
    expectClose(profile.temperatureGradient_K_per_m(50, 1), 0.2, { abs: GRADIENT_ABS_K_PER_M });
    expect(profile.kinks_m.slice(0, 2)).toEqual([50, 60]);
  });

  it('extends the first gradient linearly below the surface when the first node is at 0 m', () => {
    const profile = profileTemperature(inversion, { kind: 'us1976' });
    expectClose(profile.temperature_K(-3), 275.15 - 1, { abs: T_ABS_K });
    expect(profile.kinks_m).not.toContain(0);
  });
});

describe('the standard atmosphere of a scenario', () => {
  it('is the US 1976 profile shifted to the surface temperature', () => {
    const profile = standardTemperature(273.15);
    for (const z of [0, 5000, 11_019.07, 50_000, 86_000]) {
      expectClose(profile.temperature_K(z), us1976Temperature_K(z) - 15, { abs: T_ABS_K });
    }
    expect(profile.kinks_m).toEqual(US1976_KINKS_M);
  });

  it('equals the US 1976 temperatures at 15 °C', () => {
    const profile = standardTemperature(288.15);
    expectClose(profile.temperature_K(11_019.067832), 216.65, { abs: 1e-6 });
  });
});

describe('profile validation', () => {
  const fails = (f: () => unknown, field: string) => {
    expect(f).toThrow(InputRangeError);
    expect(f).toThrow(field);
  };

  it('rejects heights that do not increase, lie below 0 or reach 86 km', () => {
    fails(() => profileTemperature([{ height_m: 0, temperature_K: 280 }, { height_m: 0, temperature_K: 281 }], { kind: 'us1976' }), 'atmosphere.nodes[1].height_m');
    fails(() => profileTemperature([{ height_m: -1, temperature_K: 280 }], { kind: 'us1976' }), 'atmosphere.nodes[0].height_m');
    fails(() => profileTemperature([{ height_m: 86_000, temperature_K: 280 }], { kind: 'us1976' }), 'atmosphere.nodes[0].height_m');
    fails(() => profileTemperature([{ height_m: Number.NaN, temperature_K: 280 }], { kind: 'us1976' }), 'atmosphere.nodes[0].height_m');
  });

  it('rejects an empty profile, temperatures outside 150..400 K and absurd lapse rates', () => {
    fails(() => profileTemperature([], { kind: 'us1976' }), 'atmosphere.nodes');
    fails(() => profileTemperature([{ height_m: 0, temperature_K: 100 }], { kind: 'us1976' }), 'atmosphere.nodes[0].temperature_K');
    fails(() => profileTemperature([{ height_m: 0, temperature_K: 280 }], { kind: 'lapse', lapse_K_per_m: 2 }), 'atmosphere.above.lapse_K_per_m');
    fails(() => profileTemperature([{ height_m: 0, temperature_K: 150 }], { kind: 'lapse', lapse_K_per_m: -0.001 }), 'atmosphere.above.lapse_K_per_m');
    fails(() => standardTemperature(Number.NaN), 'atmosphere.surface_temperature_K');
  });
});
