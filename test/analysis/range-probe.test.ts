import { describe, expect, it } from 'vitest';
import { FINE_PROBE_TOLERANCE_M, PROBE_TOLERANCE_M, RangeProbe, isVacuum } from '../../sim/analysis/range-probe.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { traceRay } from '../../sim/trace/ray.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';
import { stackedImages } from './mirage-media.js';

const R = 6_371_000;

describe('the range probe', () => {
  it('gives every ray exactly as traceRay alone would, in any order and with both tolerances', () => {
    // One kernel serves all rays: nothing of one ray may leak into the next (bit-for-bit equality).
    const c = stackedImages();
    const probe = new RangeProbe(c.table, c.observer_m, c.range_m, R);
    const elevations = [0.004, -0.002, 0.0011, -0.0004, 0.0003, 0.004, 0.0];
    for (const [i, e] of elevations.entries()) {
      const fine = i % 3 === 2;
      const sample = probe.probe(e, fine);
      const alone = traceRay(c.table, c.observer_m, e, { earthRadius_m: R, stopRange_m: c.range_m, maxRange_m: c.range_m, tolerance_m: fine ? FINE_PROBE_TOLERANCE_M : PROBE_TOLERANCE_M });
      expect(sample.fate).toBe(alone.fate);
      expect(sample.endRange_m).toBe(alone.end.range_m);
      expect(sample.endElevation_rad).toBe(alone.end.elevation_rad);
      expect(sample.height_m).toBe(alone.fate === 'target' ? Math.max(0, alone.end.height_m) : null);
    }
    expect(probe.count).toBe(elevations.length);
  });

  it('follows straight lines in closed form when n ≡ 1, matching the tracer (independent computation: sim/trace/ray.ts)', () => {
    // The tracer in n ≡ 1 at the fine tolerance is good to about 1e-9 m (sight-geometry.test.ts).
    const HEIGHT_TOLERANCE_M = 1e-8;
    const table = vacuumTable(86_000);
    const probe = new RangeProbe(table, 6, 35_000, R);
    expect(probe.straight).toBe(true);
    for (const e of [-0.01, -0.0015, -0.001, 0, 0.002, 0.5]) {
      const sample = probe.probe(e, true);
      const traced = traceRay(table, 6, e, { earthRadius_m: R, stopRange_m: 35_000, maxRange_m: 35_000, tolerance_m: FINE_PROBE_TOLERANCE_M });
      expect(sample.fate).toBe(traced.fate);
      expectClose(sample.endRange_m, traced.end.range_m, { abs: HEIGHT_TOLERANCE_M });
      if (traced.fate === 'target') expectClose(sample.height_m!, traced.end.height_m, { abs: HEIGHT_TOLERANCE_M });
    }
  });

  it('knows a refracting table from one without refraction', () => {
    expect(isVacuum(vacuumTable(1000))).toBe(true);
    expect(isVacuum(stackedImages().table)).toBe(false);
  });

  it('rejects an observer above the table top and a too steep elevation at the first ray, naming the field', () => {
    const table = vacuumTable(1000);
    expect(() => new RangeProbe(table, 2000, 10_000, R).probe(0)).toThrow(InputRangeError);
    expect(() => new RangeProbe(table, 2000, 10_000, R).probe(0)).toThrow(/observerHeight_m/);
    expect(() => new RangeProbe(table, 10, 10_000, R).probe(1.5)).toThrow(/elevation_rad/);
    const c = stackedImages();
    expect(() => new RangeProbe(c.table, 10, 10_000, R).probe(1.5)).toThrow(/elevation_rad/);
  });
});
