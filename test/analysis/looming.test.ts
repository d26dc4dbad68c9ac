import { describe, expect, it } from 'vitest';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { compareScenes, primaryImage, TOWERING_THRESHOLD } from '../../sim/analysis/looming.js';
import { transferCurve } from '../../sim/analysis/transfer.js';
import { standardAtmosphere, tableOf } from './media.js';
import { inferiorMirage, stackedImages, superiorMirage, type MirageCase } from './mirage-media.js';

const curve = (c: MirageCase) => transferCurve(c.table, c.observer_m, c.range_m, { maxHeight_m: c.top_m });

describe('looming and towering against a reference', () => {
  const standard = transferCurve(tableOf(standardAtmosphere(15)), 12, 30_000, { maxHeight_m: 40 });
  const geometry = transferCurve(vacuumTable(86_000), 12, 30_000, { maxHeight_m: 40 });

  it('finds no shift and no change of size when a scene is compared with itself', () => {
    const c = compareScenes(standard, standard);
    expect(c).toMatchObject({ top_shift_rad: 0, magnification_ratio: 1, looming: 'none', towering: 'none' });
  });

  it('finds ordinary air looming over straight lines without towering (uniform ray curvature shifts, it does not stretch)', () => {
    const c = compareScenes(standard, geometry);
    expect(c.looming).toBe('looming');
    expect(c.top_shift_rad).toBe(c.top_elevation_rad! - c.reference_top_elevation_rad!);
    // With a constant ray curvature κ a point at (D, z) is raised by κD/2 whatever z: d elevation / d height
    // is unchanged to order D/R, so the ratio stays within 1 % of 1 (far inside the 5 % threshold).
    expect(Math.abs(c.magnification_ratio! - 1)).toBeLessThan(0.01);
    expect(c.towering).toBe('none');
  });

  it('finds an inferior mirage sinking and towering against the same surface air in the US 1976 atmosphere', () => {
    const m = inferiorMirage(4);
    const reference = transferCurve(tableOf(standardAtmosphere(48, 1008, 0.2)), m.observer_m, m.range_m, { maxHeight_m: 4 });
    const c = compareScenes(curve(m), reference);
    expect(c.looming).toBe('sinking');
    expect(c.top_shift_rad!).toBeLessThan(0);
    expect(c.towering).toBe('towering');
    expect(c.magnification_ratio!).toBeGreaterThan(1 + TOWERING_THRESHOLD);
  });
});

describe('the primary image', () => {
  it('is the one whose top is seen highest: the direct view of the masthead above a superior mirage', () => {
    const c = curve(superiorMirage());
    const primary = primaryImage(c)!;
    expect(primary).toBe(c.images[2]);
    expect(primary.to_height_m).toBe(c.max_height_m);
  });

  it('does not exist when no image reaches the top', () => {
    expect(primaryImage(curve(stackedImages()))).toBeNull();
  });
});
