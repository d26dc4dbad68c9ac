import { describe, expect, it } from 'vitest';
import { defaultSightingGrid, sightingSweep, type RangeVisibility } from '../../sim/analysis/sighting.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';

const R = 6_371_000;
const OBSERVER_M = 12;
const TARGET_M = 30;

/**
 * Straight-line visibility over a sphere (no air): the sea hides everything below
 * R/cos(θ − θh) − R at central angle θ beyond the horizon angle θh = arccos(R/(R + h)) (DESIGN.md §3 item 2).
 */
function geometricVisibility(range_m: number): RangeVisibility {
  const thetaH = Math.acos(R / (R + OBSERVER_M));
  const beyond = range_m / R - thetaH;
  const hidden = beyond <= 0 ? 0 : R / Math.cos(beyond) - R;
  const hidden_height_m = Math.min(hidden, TARGET_M);
  const visible_fraction = 1 - hidden_height_m / TARGET_M;
  const status = hidden_height_m === 0 ? 'visible' : hidden_height_m >= TARGET_M ? 'hidden' : 'partly-hidden';
  return { hidden_height_m, visible_fraction, status, hidden_bands: [] };
}

/** Range at which a height just clears the straight-line horizon: R(arccos(R/(R+h)) + arccos(R/(R+z))) (DESIGN.md §3 item 2). */
const clearRange = (z: number) => R * (Math.acos(R / (R + OBSERVER_M)) + Math.acos(R / (R + z)));

/** The bisection stops when the bracket is narrower than the tolerance: the midpoint is within half of it. */
const TOLERANCE_M = 5;

describe('sightingSweep', () => {
  it('finds the straight-line ranges at which the top, a light and the whole height are first seen', () => {
    const grid = defaultSightingGrid(OBSERVER_M, TARGET_M, R);
    const result = sightingSweep(geometricVisibility, TARGET_M, { ...grid, count: 20, light_height_m: 8, tolerance_m: TOLERANCE_M });
    expectClose(result.top.range_m, clearRange(TARGET_M), { abs: TOLERANCE_M / 2 });
    expectClose(result.light?.range_m, clearRange(8), { abs: TOLERANCE_M / 2 });
    expectClose(result.whole.range_m, clearRange(0), { abs: TOLERANCE_M / 2 });
    expect(result.top.beyond_grid).toBe(false);
    expect(result.rows).toHaveLength(20);
    expect(result.top.visible_ranges).toEqual([{ from_m: grid.from_m, to_m: result.rows.filter((r) => r.top_visible).at(-1)?.range_m }]);
  });

  it('says when the target is still seen at the farthest range of the grid', () => {
    const result = sightingSweep(geometricVisibility, TARGET_M, { from_m: 1000, to_m: 5000, count: 3 });
    expect(result.top).toEqual({ range_m: 5000, beyond_grid: true, visible_ranges: [{ from_m: 1000, to_m: 5000 }] });
    expect(result.evaluations).toBe(3);
  });

  it('treats a light inside a hidden band as unseen', () => {
    const banded = (): RangeVisibility => ({ hidden_height_m: 2, visible_fraction: 0.5, status: 'partly-hidden', hidden_bands: [{ from_height_m: 5, to_height_m: 12 }] });
    const inBand = sightingSweep(banded, TARGET_M, { from_m: 1000, to_m: 2000, count: 2, light_height_m: 8 });
    const above = sightingSweep(banded, TARGET_M, { from_m: 1000, to_m: 2000, count: 2, light_height_m: 20 });
    expect(inBand.light?.range_m).toBeNull();
    expect(above.light?.range_m).toBe(2000);
  });

  it('rejects a grid whose far end is not beyond its near end, naming the field', () => {
    expect(() => sightingSweep(geometricVisibility, TARGET_M, { from_m: 5000, to_m: 4000 })).toThrow(InputRangeError);
    expect(() => sightingSweep(geometricVisibility, TARGET_M, { from_m: 5000, to_m: 4000 })).toThrow(/sighting\.to_m/);
  });
});
