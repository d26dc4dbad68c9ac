import { describe, expect, it } from 'vitest';
import { InputRangeError } from '../../sim/errors.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { silhouette } from '../../sim/analysis/silhouettes.js';
import { transferCurve } from '../../sim/analysis/transfer.js';
import { beyondTarget, DUCT, SEA, simulatedView, SKY, TARGET } from '../../sim/analysis/view.js';
import { layeredAtmosphere, tableOf } from './media.js';
import { inferiorMirage, stackedImages, superiorMirage } from './mirage-media.js';

const R = 6_371_000;
const VACUUM = vacuumTable(86_000);

/** Rows of one column whose cells are the target. */
function targetRows(classes: number[][], column: number): number[] {
  return classes.map((row, i) => (row[column] === TARGET ? i : -1)).filter((i) => i >= 0);
}

/** Number of times the sequence changes direction (ignoring equal neighbours). */
function reversals(values: number[]): number {
  let count = 0;
  let dir = 0;
  for (let i = 1; i < values.length; i++) {
    const d = Math.sign(values[i] - values[i - 1]);
    if (d !== 0 && dir !== 0 && d !== dir) count++;
    if (d !== 0) dir = d;
  }
  return count;
}

describe('what lies beyond the target range', () => {
  const profile = new InvariantProfile(VACUUM, R);
  it('is the sea for a straight descending line whose closest approach to the centre is below the surface, else the sky (exact geometry)', () => {
    // A straight line through radius R + z at elevation α (< 0) comes closest to the centre at (R + z)·cos α.
    for (const [z, alpha] of [
      [10, -1e-3],
      [10, -1e-4],
      [50, -4e-3],
      [50, -3.9e-3],
      [5, 2e-4],
    ]) {
      const perigee = alpha < 0 ? (R + z) * Math.cos(alpha) : R + z;
      expect(beyondTarget(profile, z, alpha)).toBe(perigee <= R ? SEA : SKY);
    }
  });

  it('is a duct for a ray trapped between two heights of an elevated inversion, the sea for one below its bottom', () => {
    // 4.3 K from 50 to 60 m: n·r falls by about 20 m across the layer, more than it rises from the
    // sea to 50 m (about 40 m × 0.8), so the duct below 60 m ends well above the sea.
    const table = tableOf(layeredAtmosphere([[0, 10], [50, 9.7], [60, 14]], { kind: 'us1976' }));
    const profile = new InvariantProfile(table, R);
    expect(beyondTarget(profile, 55, 0)).toBe(DUCT);
    expect(beyondTarget(profile, 55, 1e-3)).toBe(DUCT); // 1e-3 rad lowers c by f·α²/2 ≈ 3 m: still trapped
    expect(beyondTarget(profile, 55, 3e-3)).toBe(SKY); // 29 m lower: clears the layer top (about 10 m lower than f(55))
    expect(beyondTarget(profile, 5, -1e-3)).toBe(SKY); // turns above the sea (f falls 4 m over the last 5 m) and climbs out
    expect(beyondTarget(profile, 5, -3e-3)).toBe(SEA);
  });
});

describe('the simulated view', () => {
  it('draws a pole with straight lines of sight: target where the row reaches 0..H at the pole, sea below the horizon, sky above', () => {
    const shape = silhouette('pole', 20);
    const view = simulatedView(VACUUM, 30, 5000, shape, { rows: 81, columns: 21 });
    const centre = 10;
    view.heights_at_target_m.forEach((z, row) => {
      const expected = z !== null && z <= 20 ? TARGET : view.background[row];
      expect(view.classes[row][centre]).toBe(expected);
      expect(view.classes[row][0]).toBe(view.background[row]);
      if (view.fates[row] === 'surface') expect(view.background[row]).toBe(SEA);
    });
    expect(view.classes[0][0]).toBe(SEA);
    expect(view.classes[80][0]).toBe(SKY);
    expect(view.false_horizon).toBe(false);
    expect(view.false_horizon_elevation_rad).toBeNull();
    expect(view.horizon_elevation_rad).toBeCloseTo(-Math.acos(R / (R + 30)), 12);
  });

  it('shows the inverted image of an inferior mirage below the vanishing line and the erect image above it', () => {
    const m = inferiorMirage(4);
    const view = simulatedView(m.table, m.observer_m, m.range_m, silhouette('tower', 4), { rows: 301, columns: 41 });
    const rows = targetRows(view.classes, 20);
    const heights = rows.map((r) => view.heights_at_target_m[r]!);
    const lowest = heights.indexOf(Math.min(...heights));
    // Heights fall with elevation up to the vanishing line (inverted), then rise (erect).
    expect(reversals(heights)).toBe(1);
    expect(lowest).toBeGreaterThan(0);
    expect(lowest).toBeLessThan(heights.length - 1);
    const fold = transferCurve(m.table, m.observer_m, m.range_m, { maxHeight_m: 4 }).folds[0];
    const spacing = view.elevations_rad[1] - view.elevations_rad[0];
    expect(Math.abs(view.elevations_rad[rows[lowest]] - fold.elevation_rad)).toBeLessThanOrEqual(spacing);
  });

  it('shows the stacked images of a strong shallow inversion as repeated reversals along the beacon', () => {
    const m = stackedImages();
    const view = simulatedView(m.table, m.observer_m, m.range_m, silhouette('pole', 30), { rows: 601, columns: 21 });
    const heights = targetRows(view.classes, 10).map((r) => view.heights_at_target_m[r]!);
    expect(reversals(heights)).toBe(6);
  });

  it('raises the sea above the horizontal behind a superior mirage, up to the false horizon', () => {
    const m = superiorMirage();
    const view = simulatedView(m.table, m.observer_m, m.range_m, silhouette('vessel', 26), { rows: 201, columns: 41 });
    expect(view.false_horizon).toBe(true);
    expect(view.false_horizon_elevation_rad!).toBeGreaterThan(0);
    const below = view.elevations_rad.filter((e) => e < view.false_horizon_elevation_rad!).length - 1;
    expect(view.classes[below][0]).toBe(SEA);
    expect(view.classes[below + 1][0]).not.toBe(SEA);
  });

  it('rejects a grid of one row, naming rows', () => {
    expect(() => simulatedView(VACUUM, 10, 1000, silhouette('pole', 5), { rows: 1 })).toThrow(InputRangeError);
    expect(() => simulatedView(VACUUM, 10, 1000, silhouette('pole', 5), { rows: 1 })).toThrow(/rows/);
  });
});
