import { describe, expect, it } from 'vitest';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { transferCurve } from '../../sim/analysis/transfer.js';
import { targetVisibility, visibilityVerdict } from '../../sim/analysis/visibility.js';
import { expectClose } from '../support/close.js';
import { superiorMirage } from './mirage-media.js';

const R = 6_371_000;
const VACUUM = vacuumTable(86_000);
/** The eye's limit, rad: 1 arcmin (common practice, no source; REFERENCES.md §8). */
const ARCMIN = Math.PI / 180 / 60;
/** Straight-line hidden height (exact geometry, independent of sim/), m. */
const hidden = (h: number, D: number): number => R / Math.cos(D / R - Math.acos(R / (R + h))) - R;

describe('the visibility verdict (DESIGN.md §6 definitions)', () => {
  it('is partly-hidden with the straight-line hidden height when the base is below the horizon', () => {
    const v = visibilityVerdict(transferCurve(VACUUM, 12, 30_000, { maxHeight_m: 40 }));
    expect(v.status).toBe('partly-hidden');
    expect(v.image_count).toBe(1);
    // 1e-4 m: the boundary bisection with straight rays (see test/analysis/transfer.test.ts).
    expectClose(v.hidden_height_m, hidden(12, 30_000), { abs: 1e-4 });
    expectClose(v.visible_fraction, 1 - hidden(12, 30_000) / 40, { abs: 1e-4 / 40 });
  });

  it('is visible, with nothing hidden and the whole height seen, when the target is nearer than the horizon', () => {
    expect(visibilityVerdict(transferCurve(VACUUM, 30, 5000, { maxHeight_m: 10 }))).toEqual({
      hidden_height_m: 0,
      visible_fraction: 1,
      image_count: 1,
      status: 'visible',
    });
  });

  it('is hidden, with the hidden height equal to the top, when the whole target is below the horizon', () => {
    // From 2 m the straight-line hidden height at 40 km is about 96 m, far above a 20 m target.
    expect(hidden(2, 40_000)).toBeGreaterThan(20);
    expect(visibilityVerdict(transferCurve(VACUUM, 2, 40_000, { maxHeight_m: 20 }))).toEqual({
      hidden_height_m: 20,
      visible_fraction: 0,
      image_count: 0,
      status: 'hidden',
    });
  });

  it('counts the hidden band of a superior mirage out of the visible fraction', () => {
    const m = superiorMirage();
    const curve = transferCurve(m.table, m.observer_m, m.range_m, { maxHeight_m: m.top_m });
    const v = visibilityVerdict(curve);
    const band = curve.hidden_bands[0];
    expect(v).toMatchObject({ hidden_height_m: 0, image_count: 3, status: 'partly-hidden' });
    expectClose(v.visible_fraction, 1 - (band.to_height_m - band.from_height_m) / m.top_m, { abs: 1e-12 });
  });
});

describe('resolvability of what is seen', () => {
  // A 0.75 m target 5 km away subtends about 0.75/5000 rad = 0.52 arcmin.
  const curve = transferCurve(VACUUM, 30, 5000, { maxHeight_m: 0.75 });

  it('finds a half-arcminute target below the unaided eye’s 1 arcmin (common practice, no source)', () => {
    const v = targetVisibility(curve, { wavelength_um: 0.55 });
    expect(v.resolved_by).toBe('eye');
    expectClose(v.resolving_limit_rad, ARCMIN, { rel: 1e-15 });
    expectClose(v.visible_extent_rad, 0.75 / 5000, { rel: 0.01 });
    expect(v.visible_resolvable).toBe(false);
    expect(v.images[0].resolvable).toBe(false);
    expect(v.resolvable_image_count).toBe(0);
  });

  it('resolves it with a 100 mm aperture, whose Rayleigh limit at 550 nm is 1.384″ (REFERENCES.md §8, read-2nd + computed)', () => {
    const v = targetVisibility(curve, { wavelength_um: 0.55, aperture_m: 0.1 });
    expect(v.resolved_by).toBe('aperture');
    // 1.384″ as tabulated (3 decimals of arcsec): 5e-4″ = 2.4e-9 rad.
    expectClose(v.resolving_limit_rad, (1.384 / 3600) * (Math.PI / 180), { abs: 2.5e-9 });
    expect(v.visible_resolvable).toBe(true);
    expect(v.resolvable_image_count).toBe(1);
  });
});
