import { describe, expect, it } from 'vitest';
import { hiddenBands, lowestVisibleHeight_m, type SightImage } from '../../sim/analysis/images.js';

/** A synthetic image covering heights lo..hi (angles irrelevant to the band logic). */
function image(lo: number, hi: number, orientation: 'erect' | 'inverted' = 'erect'): SightImage {
  return {
    from_height_m: lo,
    to_height_m: hi,
    from_elevation_rad: 0,
    to_elevation_rad: 1e-4,
    orientation,
    angular_extent_rad: 1e-4,
    magnification_rad_per_m: 1e-4 / Math.max(hi - lo, 1e-9),
    relative_magnification: 1,
    clipped: false,
  };
}

describe('hidden bands', () => {
  it('are the gaps between the images above the lowest visible height, up to the maximum height (DESIGN.md §6)', () => {
    const images = [image(2, 5), image(3, 4, 'inverted'), image(9, 12), image(11, 15)];
    expect(lowestVisibleHeight_m(images)).toBe(2);
    expect(hiddenBands(images, 20)).toEqual([
      { from_height_m: 5, to_height_m: 9 },
      { from_height_m: 15, to_height_m: 20 },
    ]);
  });

  it('are none when the images cover everything from the lowest visible height to the top', () => {
    expect(hiddenBands([image(0, 6.9), image(6.9, 10, 'inverted')], 10)).toEqual([]);
  });

  it('are none, with no lowest visible height, when nothing is seen', () => {
    expect(hiddenBands([], 10)).toEqual([]);
    expect(lowestVisibleHeight_m([])).toBeNull();
  });
});
