/** web/figures/air.ts: temperature and refractivity against height, trapping layers shaded. */
import { describe, expect, it } from 'vitest';
import { airFigure, trappingLayers } from '../../../web/figures/air.js';
import type { ProfileLevel, ProfileResult } from '../../../web/types.js';

function level(height_m: number, M: number): ProfileLevel {
  return { height_m, temperature_C: 10, pressure_hPa: 1000, refractive_index: 1.0003, refractivity_N: M - 0.157 * height_m, modified_refractivity_M: M, dn_dz_per_m: 0, temperature_gradient_K_per_m: 0 };
}

function profile(model: string, Ms: [number, number][]): ProfileResult {
  return { scenario: 't', index_model: model, wavelength_nm: 550, top_m: 1e5, duct_threshold_dN_dz_per_m: -0.157, levels: Ms.map(([z, M]) => level(z, M)), warnings: [] };
}

describe('trappingLayers', () => {
  it('merges adjacent intervals where M falls with height and keeps separate ones apart', () => {
    const p = profile('ciddor', [[0, 300], [1, 299], [2, 298], [3, 299], [4, 300], [5, 299.5], [6, 300]]);
    expect(trappingLayers(p)).toEqual([[0, 2], [4, 5]]);
  });

  it('finds none where M grows with height', () => {
    expect(trappingLayers(profile('ciddor', [[0, 300], [10, 301.5], [20, 303]]))).toEqual([]);
  });
});

describe('airFigure', () => {
  it('draws N with the threshold line through the surface value at dN/dz = −0.157 per m for optical models', () => {
    const f = airFigure(profile('ciddor', [[0, 300], [100, 315.7]]));
    const threshold = f.data[2] as { x: number[]; y: number[] };
    expect(threshold.y).toEqual([0, 100]);
    expect(threshold.x[0]).toBeCloseTo(300, 12);
    expect(threshold.x[1]).toBeCloseTo(300 - 15.7, 12);
  });

  it('draws M with a vertical threshold for the radio model', () => {
    const f = airFigure(profile('radio', [[0, 350], [100, 365]]));
    expect((f.data[1] as { x: number[] }).x).toEqual([350, 365]);
    expect((f.data[2] as { x: number[] }).x).toEqual([350, 350]);
  });
});
