/** web/figures/paths.ts: the fan drawn as one polyline per fate. */
import { describe, expect, it } from 'vitest';
import { fateTrace, pathsFigure } from '../../../web/figures/paths.js';
import type { TraceResult } from '../../../web/types.js';

const TRACE: TraceResult = {
  scenario: 'test',
  range_m: 10_000,
  observer_height_m: 5,
  target_height_m: 20,
  earth_radius_m: 6_371_000,
  fates: { target: 2, surface: 1, escaped: 0, trapped: 0 },
  fan: null,
  warnings: [],
  rays: [
    { elevation_deg: -0.1, fate: 'surface', height_at_target_m: null, end_range_m: 2000, end_height_m: 0, path: [[0, 5], [2000, 0]] },
    { elevation_deg: 0, fate: 'target', height_at_target_m: 12, end_range_m: 10_000, end_height_m: 12, path: [[0, 5], [5000, 7], [10_000, 12]] },
    { elevation_deg: 0.1, fate: 'target', height_at_target_m: 30, end_range_m: 10_000, end_height_m: 30, path: [[0, 5], [5000, 15], [10_000, 30]] },
  ],
};

describe('fateTrace', () => {
  it('joins the rays of one fate with a gap after each, ranges in km', () => {
    const t = fateTrace(TRACE, 'target');
    expect(t.count).toBe(2);
    expect(t.x).toEqual([0, 5, 10, null, 0, 5, 10, null]);
    expect(t.y).toEqual([5, 7, 12, null, 5, 15, 30, null]);
  });
});

describe('pathsFigure', () => {
  it('draws one trace per fate present, the target at its range and the eye', () => {
    const figure = pathsFigure(TRACE);
    const names = figure.data.map((d) => (d as { name: string }).name);
    expect(names).toEqual(['meets the surface (1)', 'reaches the target range (2)', 'target', 'eye']);
    const target = figure.data[2] as { x: number[]; y: number[] };
    expect(target.x).toEqual([10, 10]);
    expect(target.y).toEqual([0, 20]);
  });

  it('frames heights up to 1.25 × the highest height reached at the target', () => {
    const y = (pathsFigure(TRACE).layout.yaxis as { range: number[] }).range;
    expect(y[1]).toBeCloseTo(1.25 * 30, 12);
  });
});
