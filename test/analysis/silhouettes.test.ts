import { describe, expect, it } from 'vitest';
import { InputError } from '../../sim/errors.js';
import { silhouette, topAt } from '../../sim/analysis/silhouettes.js';

describe('target silhouettes', () => {
  it('scale every built-in shape to the target height, standing on the surface', () => {
    for (const shape of ['vessel', 'tower', 'cliff', 'ice', 'pole'] as const) {
      const s = silhouette(shape, 20);
      expect(s.height_m).toBe(20);
      expect(s.width_m).toBeGreaterThan(0);
      expect(s.outline_m[0][0]).toBe(0);
      for (let k = 1; k < s.outline_m.length; k++) expect(s.outline_m[k][0]).toBeGreaterThanOrEqual(s.outline_m[k - 1][0]);
    }
  });

  it('give the pole its full height across its width, nothing outside, and the higher side of a vertical edge', () => {
    const pole = silhouette('pole', 30);
    expect(pole.width_m).toBeCloseTo(1.5, 12);
    expect(topAt(pole, 0)).toBe(30);
    expect(topAt(pole, -0.75)).toBe(30);
    expect(topAt(pole, 0.76)).toBe(-Infinity);
  });

  it('interpolate a custom outline of [width, height] pairs linearly', () => {
    const s = silhouette('custom', 10, [[0, 0], [4, 8], [10, 2]]);
    expect(s.width_m).toBe(10);
    expect(s.height_m).toBe(8);
    expect(topAt(s, -5 + 2)).toBeCloseTo(4, 12);
    expect(topAt(s, -5 + 7)).toBeCloseTo(5, 12);
  });

  it('reject a custom shape without an outline, naming target.outline_m', () => {
    expect(() => silhouette('custom', 10)).toThrow(InputError);
    expect(() => silhouette('custom', 10)).toThrow(/target\.outline_m/);
  });
});
