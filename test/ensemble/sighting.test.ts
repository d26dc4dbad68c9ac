/**
 * The sighting service and command with the real visibility verdict: with straight lines of sight
 * (index_model "none") the ranges at which the top, a light and the whole height are first seen
 * are the exact geometric ones.
 */
import { describe, expect, it } from 'vitest';
import { scenarioFromJson } from '../../server/scenario/load.js';
import { sightingFinding } from '../../server/service/sighting.js';
import { expectClose } from '../support/close.js';

const R = 6_371_000;
const { scenario } = scenarioFromJson({
  name: 'Sighting test (invented)',
  observer: { height_m: 9 },
  target: { range_m: 20000, height_m: 16, light_height_m: 4 },
  atmosphere: { profile: [{ height_m: 0, temperature_C: 10 }] },
  optics: { index_model: 'none' },
});

/** Range at which a height clears the straight-line horizon from 9 m: R(arccos(R/(R+9)) + arccos(R/(R+z))) (DESIGN.md §3 item 2). */
const clear_m = (z: number) => R * (Math.acos(R / (R + 9)) + Math.acos(R / (R + z)));
/** Bisection to 20 m leaves the midpoint within 10 m; the transfer curve's heights add far less (about 1e-5 m). */
const EVENT_TOLERANCE_M = 10;

describe('sightingFinding', () => {
  it('finds the straight-line ranges of top, light and whole height', () => {
    const r = sightingFinding(scenario, { from_m: 5000, to_m: 30000, count: 6, light_height_m: 4, tolerance_m: 20 });
    expectClose(r.top.range_m, clear_m(16), { abs: EVENT_TOLERANCE_M });
    expectClose(r.light?.range_m, clear_m(4), { abs: EVENT_TOLERANCE_M });
    expectClose(r.whole.range_m, clear_m(0), { abs: EVENT_TOLERANCE_M });
    // Horizon at 10.71 km, top clears at 24.98 km: 5 and 10 km whole, 15 and 20 km partly, 25 and 30 km hidden.
    expect(r.rows.map((x) => x.status)).toEqual(['visible', 'visible', 'partly-hidden', 'partly-hidden', 'hidden', 'hidden']);
    expect(r.caution).toMatch(/Defer to official observations/);
  });

  it('names the field of a bad grid', () => {
    expect(() => sightingFinding(scenario, { from_m: 5000, to_m: 30000, count: 1 })).toThrow(/sighting\.count = 1 is out of range/);
  });
});
