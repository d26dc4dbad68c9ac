import { describe, expect, it } from 'vitest';
import { EARTH_RADIUS_M, RAD_PER_DEG } from '../../sim/constants.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { PATH_FIELDS, traceFan } from '../../sim/trace/fan.js';
import { FATES } from '../../sim/trace/kernel.js';
import { traceRay } from '../../sim/trace/ray.js';
import { expectClose } from '../support/close.js';
import { strongInversion } from './media.js';

const R = EARTH_RADIUS_M;

/** Bouguer invariant: relative drift allowed on every ray (DESIGN.md §3 check 1: "far below 1e-9"). */
const INVARIANT_DRIFT_MAX = 1e-9;
/**
 * Resampled path heights against exact straight lines, m: cubic Hermite between the integrator's
 * steps (up to 36 km long in vacuum) is display accuracy; measured 8e-6 m.
 */
const RESAMPLE_TOL_M = 5e-5;

/** Elevations from −0.5° to +0.5°, as the bench traces them. */
function elevations(count: number): Float64Array {
  return Float64Array.from({ length: count }, (_, i) => (-0.5 + i / (count - 1)) * RAD_PER_DEG);
}

describe('traceFan through a strong surface inversion', () => {
  const table = strongInversion();
  const fan = traceFan(table, 10, elevations(201), { stopRange_m: 50000, samplesPerRay: 101 });

  it('keeps the Bouguer invariant on every ray (relative drift below 1e-9)', () => {
    // DESIGN.md §3 check 1, through a 10 K / 30 m inversion with a kink at 30 m.
    let worst = 0;
    for (const d of fan.maxInvariantDrift) worst = Math.max(worst, d);
    expect(worst).toBeLessThan(INVARIANT_DRIFT_MAX);
    expect(fan.maxInvariantDrift.length).toBe(201);
  });

  it('gives each ray the same fate and end as traceRay', () => {
    for (const k of [0, 57, 100, 133, 200]) {
      const ray = traceRay(table, 10, fan.elevation_rad[k], { stopRange_m: 50000 });
      expect(FATES[fan.fate[k]]).toBe(ray.fate);
      expect([fan.endRange_m[k], fan.endHeight_m[k], fan.endElevation_rad[k]]).toEqual([ray.end.range_m, ray.end.height_m, ray.end.elevation_rad]);
      expect(fan.steps[k]).toBe(ray.steps);
    }
  });

  it('sees both fates: rays below the duct top meet the sea, steeper ones reach the target', () => {
    const counts = [0, 0, 0, 0];
    for (const f of fan.fate) counts[f]++;
    expect(counts[FATES.indexOf('surface')]).toBeGreaterThan(0);
    expect(counts[FATES.indexOf('target')]).toBeGreaterThan(0);
    expect(counts[0] + counts[1] + counts[2] + counts[3]).toBe(201);
  });

  it('resamples paths at one uniform spacing, ends each on its end point and repeats it after', () => {
    expect(fan.paths.shape).toEqual([201, 101, 3]);
    expect(PATH_FIELDS).toEqual(['range_m', 'height_m', 'elevation_rad']);
    expect(fan.spacing_m).toBe(500); // the longest ray reaches 50 km: 50 000 / 100
    const data = fan.paths.data;
    const problems: string[] = [];
    for (let k = 0; k < 201; k++) {
      const n = fan.sampleCount[k];
      const base = k * 101 * 3;
      for (let j = 0; j < n - 1; j++) if (data[base + 3 * j] !== j * fan.spacing_m) problems.push(`ray ${k} sample ${j} range`);
      const last = base + 3 * (n - 1);
      const end = [fan.endRange_m[k], fan.endHeight_m[k], fan.endElevation_rad[k]];
      if (data[last] !== end[0] || data[last + 1] !== end[1] || data[last + 2] !== end[2]) problems.push(`ray ${k} last sample`);
      for (let o = last + 3; o < base + 303; o += 3) {
        if (data[o] !== data[last] || data[o + 1] !== data[last + 1] || data[o + 2] !== data[last + 2]) problems.push(`ray ${k} fill at ${o}`);
      }
    }
    expect(problems).toEqual([]);
    expect(data.every((v) => Number.isFinite(v))).toBe(true);
  });
});

describe('traceFan paths in vacuum', () => {
  it('resamples straight rays to display accuracy', () => {
    // n ≡ 1: exact line r = (R + h) cos α0 / cos(s/R + α0) (DESIGN.md §3 check 2).
    const fan = traceFan(vacuumTable(20000), 10, Float64Array.from([0.001, 0.01]), { stopRange_m: 40000, samplesPerRay: 41 });
    for (let k = 0; k < 2; k++) {
      const alpha0 = fan.elevation_rad[k];
      for (let j = 0; j < 41; j++) {
        const s = fan.paths.get(k, j, 0);
        expectClose(fan.paths.get(k, j, 1), ((R + 10) * Math.cos(alpha0)) / Math.cos(s / R + alpha0) - R, { abs: RESAMPLE_TOL_M });
        expectClose(fan.paths.get(k, j, 2), alpha0 + s / R, { abs: 1e-9 });
      }
    }
  });
});

describe('traceFan input checks', () => {
  const table = strongInversion();
  it.each([
    ['observerHeight_m', () => traceFan(table, -2, elevations(3))],
    ['elevations_rad[1]', () => traceFan(table, 10, Float64Array.from([0, NaN, 0]))],
    ['elevations_rad[2]', () => traceFan(table, 10, Float64Array.from([0, 0, 85 * RAD_PER_DEG]))],
    ['elevations_rad.length', () => traceFan(table, 10, new Float64Array(0))],
    ['samplesPerRay', () => traceFan(table, 10, elevations(3), { samplesPerRay: 1 })],
    ['samplesPerRay', () => traceFan(table, 10, elevations(1000), { samplesPerRay: 100000 })],
    ['maxRange_m', () => traceFan(table, 10, elevations(3), { maxRange_m: -1 })],
  ])('rejects a bad %s with a RangeError naming it and the allowed range', (field, call) => {
    expect(call).toThrow(RangeError);
    const escaped = field.replace(/[[\].]/g, (c) => `\\${c}`);
    expect(call).toThrow(new RegExp(`^${escaped} = .* is out of range: allowed `));
  });
});
