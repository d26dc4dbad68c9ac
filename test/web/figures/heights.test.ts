/** web/figures/heights.ts: the transfer curve with images and hidden bands. */
import { describe, expect, it } from 'vitest';
import { heightsFigure } from '../../../web/figures/heights.js';
import type { TransferJson } from '../../../web/types.js';

const TRANSFER: TransferJson = {
  range_m: 28_000,
  rays: [
    { elevation_deg: -0.05, height_m: null, fate: 'surface' },
    { elevation_deg: -0.04, height_m: 2, fate: 'target' },
    { elevation_deg: -0.03, height_m: 5, fate: 'target' },
    { elevation_deg: -0.02, height_m: 3, fate: 'target' },
    { elevation_deg: -0.01, height_m: 9, fate: 'target' },
  ],
  images: [
    { from_height_m: 2, to_height_m: 5, from_elevation_deg: -0.04, to_elevation_deg: -0.03, orientation: 'erect' },
    { from_height_m: 5, to_height_m: 3, from_elevation_deg: -0.03, to_elevation_deg: -0.02, orientation: 'inverted' },
  ],
  lowest_visible_height_m: 2,
  hidden_bands: [{ from_height_m: 6, to_height_m: 7 }],
};

describe('heightsFigure', () => {
  it('plots elevation (arcmin) upward against height, with a gap where no ray reaches the target range', () => {
    const curve = heightsFigure(TRANSFER, { target_height_m: 10 }).data[0] as { x: (number | null)[]; y: (number | null)[] };
    expect(curve.x).toEqual([null, 2, 5, 3, 9]);
    expect(curve.y[0]).toBeNull();
    expect(curve.y.slice(1).map((v) => Number((v as number).toFixed(9)))).toEqual([-2.4, -1.8, -1.2, -0.6]);
  });

  it('shades each image over its elevations and each hidden band over its heights', () => {
    const shapes = heightsFigure(TRANSFER, { target_height_m: 10 }).layout.shapes as { y0: number; y1: number; x0: number; x1: number; fillcolor?: string }[];
    const [erect, inverted, hidden] = shapes;
    expect([erect.y0, erect.y1].map((v) => Number(v.toFixed(9)))).toEqual([-2.4, -1.8]);
    expect([inverted.y0, inverted.y1].map((v) => Number(v.toFixed(9)))).toEqual([-1.8, -1.2]);
    expect(erect.fillcolor).not.toBe(inverted.fillcolor);
    expect([hidden.x0, hidden.x1]).toEqual([6, 7]);
  });

  it('adds legend swatches only for the shadings present', () => {
    const names = heightsFigure({ ...TRANSFER, images: [], hidden_bands: [] }, { target_height_m: 10 }).data.map((d) => (d as { name: string }).name);
    expect(names).toEqual(['height reached at the target range']);
  });
});
