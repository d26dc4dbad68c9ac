import { describe, expect, it } from 'vitest';
import { CELSIUS_OFFSET_K, RAD_PER_DEG } from '../../sim/constants.js';
import { InputRangeError } from '../../sim/errors.js';
import { resolveBulkColumn } from '../../sim/atmosphere/surface-column.js';
import { surfaceLayerProfile } from '../../sim/atmosphere/surface-profile.js';
import { saturationVapourPressureBuck_Pa, specificHumidity } from '../../sim/atmosphere/surface-thermo.js';
import { buildIndexTable, indexAt } from '../../sim/refractivity/build-table.js';
import { evaluateIndex } from '../../sim/refractivity/index-table.js';
import { refractivityModel } from '../../sim/refractivity/models.js';
import type { BulkAtmosphere } from '../../sim/scenario.js';
import { expectClose } from '../support/close.js';

const K = CELSIUS_OFFSET_K;
/** Closed-form evaluation in double precision, K. */
const ROUNDING_ABS_K = 1e-9;
/** One-sided difference with h = 1e-6 m at a join: truncation of order h·d²T/dz², K/m. */
const JOIN_SLOPE_ABS = 1e-5;

/** REFERENCES.md §7.5 inputs as a scenario block (common inputs, lat 45°, no cool skin). */
function bulk(sea_C: number, patch: Partial<BulkAtmosphere> = {}): BulkAtmosphere {
  return {
    kind: 'bulk',
    sea_temperature_K: sea_C + K,
    air_temperature_K: 15 + K,
    air_temperature_height_m: 10,
    wind_speed_m_s: 5,
    wind_height_m: 10,
    relative_humidity: 0.8,
    surface_pressure_Pa: 101_300,
    cool_skin: false,
    nodes: [],
    above: { kind: 'us1976' },
    ...patch,
  };
}
const OPTIONS = { latitude_rad: 45 * RAD_PER_DEG, shortwave_down_W_per_m2: 0, longwave_down_W_per_m2: 370 };

describe('bulk atmosphere resolved to an air column', () => {
  it('follows the surface-layer profile below the blending height and passes through the observed air temperature', () => {
    const r = resolveBulkColumn(bulk(20), OPTIONS);
    const profile = surfaceLayerProfile(r.flux);
    for (const z of [0, 1e-3, 0.1, 3, 10, r.blending_height_m]) {
      expectClose(r.column.temperature_K(z), profile.temperature_K(z), { abs: ROUNDING_ABS_K });
    }
    expectClose(r.column.temperature_K(10), 15 + K, { abs: ROUNDING_ABS_K });
    // REFERENCES.md §7.5 unstable T(0.01 m) = 17.7460 °C (independent computation with the reference code), 4 decimals.
    expectClose(r.column.temperature_K(0.01) - K, 17.746, { abs: 1e-4 });
  });
  it('is continuous in T and e at the blending height and continues with the US 1976 lapse above it', () => {
    const r = resolveBulkColumn(bulk(10), OPTIONS);
    const c = r.column;
    const zb = r.blending_height_m;
    const h = 1e-6;
    expectClose(c.temperature_K(zb + h), c.temperature_K(zb), { abs: 1e-8 });
    expectClose(c.vapour_pressure_Pa(zb + h), c.vapour_pressure_Pa(zb), { abs: 1e-5 });
    // US 1976 first layer: −6.5 K per geopotential km (Table 4), ×(r0/(r0+z))² per geometric metre.
    expectClose(c.temperatureGradient_K_per_m(zb, 1), -0.0065, { rel: 1e-4 });
    expect(c.temperatureGradient_K_per_m(zb, -1)).toBeGreaterThan(0);
    expectClose((c.temperature_K(zb) - c.temperature_K(zb - h)) / h, c.temperatureGradient_K_per_m(zb, -1), { abs: JOIN_SLOPE_ABS });
  });
  it('continues with a constant lapse when asked', () => {
    const r = resolveBulkColumn(bulk(20, { above: { kind: 'lapse', lapse_K_per_m: -0.008 } }), OPTIONS);
    const zb = r.blending_height_m;
    expectClose(r.column.temperature_K(zb + 500) - r.column.temperature_K(zb), -4, { abs: 1e-9 });
  });
  it('passes through nodes of an elevated inversion above the surface layer', () => {
    const nodes = [
      { height_m: 150, temperature_K: 12 + K },
      { height_m: 200, temperature_K: 18 + K },
    ];
    const r = resolveBulkColumn(bulk(20, { nodes }), OPTIONS);
    expect(r.blending_height_m).toBe(60);
    expect(r.column.temperature_K(150)).toBe(12 + K);
    expect(r.column.temperature_K(200)).toBe(18 + K);
    expect(r.column.kinks_m).toEqual(expect.arrayContaining([60, 150, 200]));
  });
  it('shortens the surface layer to half the height of a low first node, with a warning', () => {
    const r = resolveBulkColumn(bulk(20, { nodes: [{ height_m: 30, temperature_K: 16 + K }] }), OPTIONS);
    expect(r.blending_height_m).toBe(15);
    expect(r.warnings.join(' ')).toMatch(/first profile node/);
  });
  it('starts at the surface pressure and has vapour pressure q·p/(ε + (1 − ε)q) with the observed humidity at the sensor', () => {
    const r = resolveBulkColumn(bulk(20), OPTIONS);
    expectClose(r.column.pressure_Pa(0), 101_300, { rel: 1e-14 }); // exp(ln p) rounding
    const p10 = r.column.pressure_Pa(10);
    // The observed specific humidity is fixed at the surface pressure (COARE qair); the column holds q at 10 m.
    const q = specificHumidity(0.8 * saturationVapourPressureBuck_Pa(15 + K, 101_300), 101_300);
    const want = (q * p10) / (0.62197 + 0.37803 * q);
    expectClose(r.column.vapour_pressure_Pa(10), want, { rel: 2e-5 });
  });
  it('asks for millimetre spacing near the sea and marks z_ot and the blending height as kinks', () => {
    const r = resolveBulkColumn(bulk(20), OPTIONS);
    expect(r.column.refinements).toContainEqual({ from_m: 0, to_m: 0.01, spacing_m: 0.001 });
    expect(r.column.kinks_m[0]).toBe(r.flux.roughness_heat_m);
    expect(r.column.kinks_m).toContain(r.blending_height_m);
    expect(r.column.top_m).toBe(86_000);
  });
  it('has vapour-pressure gradients equal to central differences inside the surface layer', () => {
    const c = resolveBulkColumn(bulk(10), OPTIONS).column;
    for (const z of [0.002, 0.3, 5, 20]) {
      const h = z * 1e-5;
      const numeric = (c.vapour_pressure_Pa(z + h) - c.vapour_pressure_Pa(z - h)) / (2 * h);
      // h = 1e-5 z: truncation ~1e-10 relative; rounding of e (~1e3 Pa, 1e-16 relative) over 2h.
      expectClose(c.vapourGradient_Pa_per_m(z, 1), numeric, { rel: 1e-6, abs: 1e-9 / z });
    }
  });
});

describe('index table of a bulk atmosphere', () => {
  it('resolves the logarithmic layer from a fraction of a millimetre up: table and direct evaluation agree', () => {
    // The accuracy asked of every index table (sim/refractivity/build-table.ts): 1e-12 in n − 1,
    // 1e-3 relative in dn/dz.
    for (const sea_C of [20, 10]) {
      const column = resolveBulkColumn(bulk(sea_C), OPTIONS).column;
      const model = refractivityModel('ciddor');
      const table = buildIndexTable(column, model);
      const out = new Float64Array(2);
      for (let z = 2e-4; z < 60; z *= 1.13) {
        evaluateIndex(table, z, out);
        const direct = indexAt(column, model, z);
        expectClose(out[0], direct.nm1, { abs: 1e-12 });
        expectClose(out[1], direct.dndzAbove, { rel: 1e-3 });
      }
    }
  });
});

describe('bulk atmosphere: warnings', () => {
  it('says when stable air ends the surface layer early', () => {
    const r = resolveBulkColumn(bulk(10), OPTIONS);
    expect(r.blending_limited_by).toBe('stability');
    expect(r.warnings.join(' ')).toMatch(/stable air/);
  });
  it('warns of fog when warm humid air over cold water mixes to supersaturation', () => {
    const r = resolveBulkColumn(bulk(2, { air_temperature_K: 16 + K, relative_humidity: 0.97 }), OPTIONS);
    expect(r.warnings.join(' ')).toMatch(/supersaturated/);
  });
  it('gives no warnings for a plain unstable case', () => {
    expect(resolveBulkColumn(bulk(20), OPTIONS).warnings).toEqual([]);
  });
});

describe('bulk atmosphere: impossible input', () => {
  it('names the field of a negative wind speed', () => {
    const call = () => resolveBulkColumn(bulk(15, { wind_speed_m_s: -1 }));
    expect(call).toThrow(InputRangeError);
    expect(call).toThrow('atmosphere.bulk.wind_speed_m_s = -1 is out of range: allowed 0..40 m/s');
  });
  it('names the field of a humidity above 1', () => {
    expect(() => resolveBulkColumn(bulk(15, { relative_humidity: 1.5 }))).toThrow(/^atmosphere\.bulk\.relative_humidity = 1\.5 is out of range/);
  });
  it('rejects a first node at or below the air temperature sensor', () => {
    const call = () => resolveBulkColumn(bulk(15, { nodes: [{ height_m: 8, temperature_K: 290 }] }));
    expect(call).toThrow(InputRangeError);
    expect(call).toThrow(/^atmosphere\.nodes\[0\]\.height_m = 8 is out of range: allowed above the air temperature height \(10 m\)$/);
  });
  it('rejects nodes that do not increase, naming the node', () => {
    const nodes = [
      { height_m: 100, temperature_K: 290 },
      { height_m: 90, temperature_K: 292 },
    ];
    expect(() => resolveBulkColumn(bulk(15, { nodes }))).toThrow(/atmosphere\.nodes\[1\]\.height_m = 90/);
  });
});
