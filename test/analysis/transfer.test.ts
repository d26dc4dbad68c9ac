import { describe, expect, it } from 'vitest';
import { RAD_PER_DEG } from '../../sim/constants.js';
import { InputRangeError } from '../../sim/errors.js';
import { vacuumTable } from '../../sim/refractivity/index-table.js';
import { angleBelowEye } from '../../sim/analysis/dip.js';
import { InvariantProfile } from '../../sim/analysis/invariant.js';
import { transferCurve, type TransferCurve } from '../../sim/analysis/transfer.js';
import { quadratureRange } from '../../sim/trace/quadrature.js';
import { expectClose } from '../support/close.js';
import { standardAtmosphere, tableOf } from './media.js';
import { inferiorMirage, stackedImages, superiorMirage, type MirageCase } from './mirage-media.js';
import { grazingHeightAt, quadratureHeightAt } from './quadrature-path.js';

const R = 6_371_000;

/**
 * Agreement of heights at the target range between the transfer curve (ray integrator, local
 * tolerance 2e-6 m) and the invariant quadrature, m: the tracer's documented error is about 2e-5 m
 * at 50 km (sim/trace/options.ts); measured here 1e-7..2e-6 m at 2.5–40 km.
 */
const HEIGHT_TOLERANCE_M = 2e-5;
/** With n ≡ 1 the rays are straight and the only error is the boundary bisection (1e-10 rad × D): 1e-4 m is ample. */
const GEOMETRY_HEIGHT_TOLERANCE_M = 1e-4;
/**
 * Height of an image end at a boundary where rays just clear a corner of n·r, m. There the height
 * at the target range grows like the square root of the elevation's distance from the boundary
 * (the ray crosses the corner at an angle ∝ √Δc), so the 1e-12 rad to which the boundary is
 * bisected leaves about L·√(2·sin α·Δα) ≈ 1e4 m × 7e-8 ≈ 0.7 mm; 2 mm allows for that.
 */
const BOUNDARY_HEIGHT_TOLERANCE_M = 2e-3;
/** Image boundaries must be located to 1e-4° (the findings issue); a fold checked at ± half of that. */
const FOLD_PROBE_RAD = 0.5e-4 * RAD_PER_DEG;

/** Exact straight-line geometry (independent of sim/): elevation of a point at (range, height) seen from height h. */
function straightElevation(h: number, range: number, height: number): number {
  const theta = range / R;
  const dx = (R + height) * Math.sin(theta);
  const dy = (R + height) * Math.cos(theta) - (R + h);
  return Math.atan2(dy, dx);
}

/** Exact hidden height with straight lines: the line grazing the sphere at the horizon, extended to range D. */
function straightHiddenHeight(h: number, range: number): number {
  const beyond = range / R - Math.acos(R / (R + h));
  return beyond > 0 ? R / Math.cos(beyond) - R : 0;
}

function curveOf(c: MirageCase, top_m = c.top_m): TransferCurve {
  return transferCurve(c.table, c.observer_m, c.range_m, { maxHeight_m: top_m });
}

/** Checks a fold against the quadrature: its height, and that it is the extremum within ±FOLD_PROBE_RAD. */
function expectFoldConfirmed(c: MirageCase, fold: TransferCurve['folds'][number]): void {
  const [below, at, above] = [-FOLD_PROBE_RAD, 0, FOLD_PROBE_RAD].map((d) => quadratureHeightAt(c.table, c.observer_m, fold.elevation_rad + d, c.range_m)!);
  expectClose(fold.height_m, at, { abs: HEIGHT_TOLERANCE_M });
  const sign = fold.kind === 'max' ? 1 : -1;
  expect(sign * (at - below)).toBeGreaterThan(0);
  expect(sign * (at - above)).toBeGreaterThan(0);
}

describe('the transfer curve with straight lines of sight (n ≡ 1)', () => {
  const table = vacuumTable(86_000);
  for (const [h, D, H] of [
    [12, 30_000, 40],
    [2, 20_000, 50],
    [100, 60_000, 300],
  ]) {
    it(`hides exactly the straight-line hidden height for h = ${h} m at ${D / 1000} km (DESIGN.md §3 item 2, exact geometry)`, () => {
      const c = transferCurve(table, h, D, { maxHeight_m: H });
      expectClose(c.lowest_visible_height_m, straightHiddenHeight(h, D), { abs: GEOMETRY_HEIGHT_TOLERANCE_M });
      expect(c.images).toHaveLength(1);
      expect(c.images[0].orientation).toBe('erect');
      expect(c.hidden_bands).toEqual([]);
      // The lowest visible point is seen along the ray that grazes the sea: the dip arccos(R/(R+h)).
      expectClose(c.images[0].from_elevation_rad, -Math.acos(R / (R + h)), { abs: 1e-9 });
      expectClose(c.images[0].to_elevation_rad, straightElevation(h, D, H), { abs: 1e-10 });
      expectClose(c.images[0].relative_magnification, 1, { abs: 1e-6 });
    });
  }

  it('sees the whole of a target nearer than the horizon, its base at the straight-line elevation', () => {
    const c = transferCurve(table, 30, 5000, { maxHeight_m: 10 });
    expect(c.lowest_visible_height_m).toBe(0);
    expect(c.images).toHaveLength(1);
    expectClose(c.images[0].from_elevation_rad, straightElevation(30, 5000, 0), { abs: 1e-9 });
    expectClose(c.images[0].to_elevation_rad, straightElevation(30, 5000, 10), { abs: 1e-10 });
  });
});

describe('the transfer curve in the US 1976 atmosphere', () => {
  const table = tableOf(standardAtmosphere(15));
  const c = transferCurve(table, 12, 30_000, { maxHeight_m: 40 });

  it('hides what lies below the ray grazing the sea, as the invariant quadrature gives it (DESIGN.md §3 item 4)', () => {
    expectClose(c.lowest_visible_height_m, grazingHeightAt(table, 12, 30_000)!, { abs: HEIGHT_TOLERANCE_M });
    expect(c.images.map((i) => i.orientation)).toEqual(['erect']);
    expect(c.folds).toEqual([]);
  });

  it('gives every ray the height the quadrature gives at the target range', () => {
    const targets = c.rays.filter((r) => r.fate === 'target');
    for (const ray of [targets[3], targets[Math.floor(targets.length / 2)], targets[targets.length - 4]]) {
      expectClose(ray.height_m, quadratureHeightAt(table, 12, ray.elevation_rad, 30_000)!, { abs: HEIGHT_TOLERANCE_M });
    }
  });

  it('sees the target top higher than straight lines would, by about k·D/(2R) with k = 0.170 (REFERENCES.md §5.1, independent computation)', () => {
    const dry = transferCurve(tableOf(standardAtmosphere(15, 1013.25, 0)), 12, 30_000, { maxHeight_m: 40 });
    const shift = dry.images[0].to_elevation_rad - straightElevation(12, 30_000, 40);
    // k = 0.1699 at 15 °C, 1013.25 hPa, dry, standard lapse; the constant-curvature (parabolic) path
    // raises a point at range D by κD²/2, seen from the observer as κD/2. 2 %: k varies by about 1 %
    // over the 0–40 m the rays cross, and the parabolic form drops terms of order D/R.
    expectClose(shift, (0.1699 * 30_000) / (2 * R), { rel: 0.02 });
  });
});

describe('an inferior mirage over heated ground', () => {
  const m = inferiorMirage(20);
  const c = curveOf(m);

  it('shows an inverted image below the vanishing line and the erect image above it', () => {
    expect(c.images.map((i) => i.orientation)).toEqual(['inverted', 'erect']);
    expect(c.folds).toHaveLength(1);
    const fold = c.folds[0];
    expect(fold.kind).toBe('min');
    const [inverted, erect] = c.images;
    // The vanishing line is the fold: the inverted image lies wholly below it, the erect one above.
    expect(Math.max(inverted.from_elevation_rad, inverted.to_elevation_rad)).toBeCloseTo(fold.elevation_rad, 15);
    expect(inverted.to_elevation_rad).toBeLessThan(fold.elevation_rad);
    expect(erect.from_elevation_rad).toBeCloseTo(fold.elevation_rad, 15);
    // Heights below the fold are seen nowhere: the base of the target sinks below the vanishing line.
    expect(c.lowest_visible_height_m).toBe(fold.height_m);
    expect(fold.height_m).toBeGreaterThan(0.5);
    expect(c.hidden_bands).toEqual([]);
  });

  it('places the vanishing line where the invariant quadrature has its minimum, to better than 1e-4°', () => {
    expectFoldConfirmed(m, c.folds[0]);
  });

  it('ends the inverted image at the height of the ray grazing the ground, as the quadrature gives it', () => {
    const grazing = grazingHeightAt(m.table, m.observer_m, m.range_m)!;
    expect(grazing).toBeLessThan(m.top_m);
    expectClose(c.images[0].to_height_m, grazing, { abs: HEIGHT_TOLERANCE_M });
    expect(c.boundaries.map((b) => [b.below_fate, b.above_fate])).toEqual([['surface', 'target']]);
  });

  it('cuts the images at the top of a 4 m target where the quadrature reaches 4 m', () => {
    const low = curveOf(m, 4);
    expect(low.images.map((i) => [i.orientation, i.clipped])).toEqual([
      ['inverted', true],
      ['erect', true],
    ]);
    for (const image of low.images) {
      expect(image.to_height_m).toBe(4);
      expectClose(quadratureHeightAt(m.table, m.observer_m, image.to_elevation_rad, m.range_m), 4, { abs: HEIGHT_TOLERANCE_M });
    }
  });
});

describe('a superior mirage over a cold sea', () => {
  const m = superiorMirage();
  const c = curveOf(m);

  it('shows an erect image, an inverted image above it and an erect image above a hidden band', () => {
    expect(c.images.map((i) => i.orientation)).toEqual(['erect', 'inverted', 'erect']);
    expect(c.hidden_bands).toHaveLength(1);
    const band = c.hidden_bands[0];
    // The band runs from the top of the lower pair (their shared fold) to the bottom of the top image.
    expect(band.from_height_m).toBe(c.folds[0].height_m);
    expect(band.to_height_m).toBe(c.images[2].from_height_m);
    expect(band.to_height_m - band.from_height_m).toBeGreaterThan(10);
    expect(c.lowest_visible_height_m).toBe(0);
  });

  it('puts the top of the lower pair where the quadrature has its maximum, to better than 1e-4°', () => {
    expect(c.folds.map((f) => f.kind)).toEqual(['max']);
    expectFoldConfirmed(m, c.folds[0]);
  });

  it('starts the lower erect image at the height of the ray grazing the sea, as the quadrature gives it', () => {
    expect(c.boundaries[0]).toMatchObject({ below_fate: 'surface', above_fate: 'target' });
    expectClose(c.images[0].from_height_m, grazingHeightAt(m.table, m.observer_m, m.range_m)!, { abs: HEIGHT_TOLERANCE_M });
  });

  it('reaches down to the base in the inverted image, where the next rays meet the sea just short of the target', () => {
    const inverted = c.images[1];
    expect(inverted.from_height_m).toBe(0);
    expect(c.boundaries[1]).toMatchObject({ below_fate: 'target', above_fate: 'surface', height_m: 0 });
    // Just inside the image (1e-9 rad lower) the quadrature's ray reaches the target within a
    // fraction of a millimetre of its base (its height there changes by about D·1e-9 rad = 2e-5 m).
    const justInside = quadratureHeightAt(m.table, m.observer_m, inverted.from_elevation_rad - 1e-9, m.range_m)!;
    expect(justInside).toBeGreaterThanOrEqual(0);
    expect(justInside).toBeLessThan(HEIGHT_TOLERANCE_M + m.range_m * 1e-9 * 2);
  });

  it('starts the top image at the ray that just clears the duct top, as the invariant and the quadrature give it', () => {
    // The limiting ray is horizontal at the duct top (16 m, the minimum of n·r): c = n(16)·(R + 16).
    // It leaves the eye at arccos(c / f(3)), rises to 16 m over Q(3 → 16), then climbs: Q(16 → z) = D − Q(3 → 16).
    const profile = new InvariantProfile(m.table, R);
    const gEye = profile.offset_m(m.observer_m);
    const limit = angleBelowEye(gEye - profile.offset_m(16), R + gEye);
    const top = c.images[2];
    expectClose(top.from_elevation_rad, limit, { abs: 1e-11 });
    // The quadrature places the turning height itself; stop a hair below 16 m (the range lost is far below 1 mm).
    const rise = quadratureRange(m.table, m.observer_m, limit, 16 * (1 - 1e-12))!;
    let lo = 16;
    let hi = m.top_m;
    for (let i = 0; i < 80; i++) {
      const mid = 0.5 * (lo + hi);
      if (rise + quadratureRange(m.table, 16, 0, mid)! < m.range_m) lo = mid;
      else hi = mid;
    }
    expectClose(top.from_height_m, lo, { abs: BOUNDARY_HEIGHT_TOLERANCE_M });
    expectClose(quadratureHeightAt(m.table, m.observer_m, top.to_elevation_rad, m.range_m), m.top_m, { abs: HEIGHT_TOLERANCE_M });
  });
});

describe('stacked images in a strong shallow inversion', () => {
  const m = stackedImages();
  const c = curveOf(m);

  it('stacks seven images, alternately inverted and erect, each sharing a fold with the next', () => {
    expect(c.images.map((i) => i.orientation)).toEqual(['inverted', 'erect', 'inverted', 'erect', 'inverted', 'erect', 'inverted']);
    expect(c.folds).toHaveLength(6);
    for (let i = 0; i + 1 < c.images.length; i++) {
      const shared = c.folds[i];
      const a = c.images[i];
      const b = c.images[i + 1];
      expect([a.from_height_m, a.to_height_m]).toContain(shared.height_m);
      expect([b.from_height_m, b.to_height_m]).toContain(shared.height_m);
    }
  });

  it('places every fold where the quadrature has its extremum', () => {
    for (const fold of c.folds) expectFoldConfirmed(m, fold);
  });
});

describe('the fan', () => {
  const m = superiorMirage();
  const c = curveOf(m);

  it('keeps its rays sorted by elevation, with a height exactly when the ray reaches the target', () => {
    for (let i = 1; i < c.rays.length; i++) expect(c.rays[i].elevation_rad).toBeGreaterThan(c.rays[i - 1].elevation_rad);
    for (const r of c.rays) expect(r.height_m === null).toBe(r.fate !== 'target');
    expect(c.rays_traced).toBeGreaterThanOrEqual(c.rays.length);
  });

  it('pins every fate boundary to within 1e-12 rad', () => {
    for (const b of c.boundaries) {
      const i = c.rays.findIndex((r) => r.elevation_rad > b.elevation_rad);
      expect(c.rays[i].elevation_rad - c.rays[i - 1].elevation_rad).toBeLessThanOrEqual(1e-12);
      expect([c.rays[i - 1].fate, c.rays[i].fate]).toEqual([b.below_fate, b.above_fate]);
    }
  });
});

describe('input checks', () => {
  const table = vacuumTable(86_000);
  it('rejects a maximum height of 0, naming maxHeight_m', () => {
    expect(() => transferCurve(table, 10, 10_000, { maxHeight_m: 0 })).toThrow(InputRangeError);
    expect(() => transferCurve(table, 10, 10_000, { maxHeight_m: 0 })).toThrow(/maxHeight_m/);
  });
  it('rejects a range of 0 and a NaN observer height, naming the field', () => {
    expect(() => transferCurve(table, 10, 0, { maxHeight_m: 5 })).toThrow(/range_m/);
    expect(() => transferCurve(table, Number.NaN, 1000, { maxHeight_m: 5 })).toThrow(/observerHeight_m/);
  });
  it('rejects a fan of two rays and a reversed window', () => {
    expect(() => transferCurve(table, 10, 1000, { maxHeight_m: 5, rays: 2 })).toThrow(/rays/);
    expect(() => transferCurve(table, 10, 1000, { maxHeight_m: 5, window: { from_rad: 0.01, to_rad: -0.01 } })).toThrow(/window.to_rad/);
  });
});
