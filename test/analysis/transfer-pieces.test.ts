import { describe, expect, it } from 'vitest';
import type { RangeSample } from '../../sim/analysis/range-probe.js';
import { boundaryHeight_m } from '../../sim/analysis/transfer-pieces.js';

const D = 28_000;

function sample(fate: RangeSample['fate'], endRange_m: number, height_m: number | null, endElevation_rad: number): RangeSample {
  return { elevation_rad: 0, fate, height_m, endRange_m, endElevation_rad };
}

describe('the height at which a run of rays reaching the target ends at a fate boundary', () => {
  it('is the base (0 m) where the neighbouring rays meet the sea just short of the target, the target-side ray descending', () => {
    expect(boundaryHeight_m({ below: sample('surface', D - 0.4, null, -2e-4), above: sample('target', D, 3e-6, -2e-4) })).toBe(0);
    expect(boundaryHeight_m({ below: sample('target', D, 2e-6, -1e-4), above: sample('surface', D - 0.02, null, -1e-4) })).toBe(0);
  });

  it('is the height of the limiting ray where the neighbours meet the sea kilometres short of the target', () => {
    // A ray grazing the sea at 9.6 km, then turned down again by a duct: it still arrives descending.
    expect(boundaryHeight_m({ below: sample('surface', 9560, null, -1e-7), above: sample('target', D, 6.5641, -6.6e-4) })).toBe(6.5641);
  });

  it('is the height of the limiting ray next to escaped rays, and null between two fates that both miss the target', () => {
    expect(boundaryHeight_m({ below: sample('target', D, 812.5, 0.2), above: sample('escaped', 5000, null, 0.3) })).toBe(812.5);
    expect(boundaryHeight_m({ below: sample('surface', 900, null, -0.1), above: sample('escaped', 9000, null, 0.1) })).toBeNull();
  });
});
