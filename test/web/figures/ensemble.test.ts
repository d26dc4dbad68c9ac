import { describe, expect, it } from 'vitest';
import { ensembleFigure } from '../../../web/figures/ensemble.js';

describe('ensembleFigure', () => {
  it('draws the probabilities in percent with their standard errors, and the hidden heights of finished runs', () => {
    const figure = ensembleFigure({
      probabilities: { visible: 0.25, partly_hidden: 0.5, hidden: 0.25 },
      standard_errors: { visible: 0.1, partly_hidden: 0.125, hidden: 0.1 },
      member_rows: [{ hidden_height_m: 0 }, { hidden_height_m: 2.5 }, { hidden_height_m: null }, { hidden_height_m: 7 }],
    });
    const [bars, histogram] = figure.data as { x: unknown[]; y?: number[]; error_y?: { array: number[] } }[];
    expect(bars.y).toEqual([25, 50, 25]);
    expect(bars.error_y?.array).toEqual([10, 12.5, 10]);
    expect(histogram.x).toEqual([0, 2.5, 7]);
  });
});
