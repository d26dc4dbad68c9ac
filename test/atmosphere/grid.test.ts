import { describe, expect, it } from 'vitest';
import { gradedNodes, spacingLimit_m } from '../../sim/atmosphere/grid.js';

const GRADING = { maxSpacing_m: 1000, growth: 1.5 };

describe('graded height grids', () => {
  it('contains both ends and every break, in strictly increasing order', () => {
    const nodes = gradedNodes(0, 10_000, [7777.7, 30, -5, 20_000, 30], [], GRADING);
    expect(nodes[0]).toBe(0);
    expect(nodes[nodes.length - 1]).toBe(10_000);
    expect(nodes).toContain(30);
    expect(nodes).toContain(7777.7);
    for (let i = 1; i < nodes.length; i++) expect(nodes[i]).toBeGreaterThan(nodes[i - 1]);
  });

  it('keeps every cell within the spacing limit at both of its ends', () => {
    const refinements = [{ from_m: 0, to_m: 0.01, spacing_m: 0.001 }, { from_m: 500, to_m: 520, spacing_m: 0.5 }];
    const nodes = gradedNodes(0, 5000, [], refinements, GRADING);
    for (let i = 1; i < nodes.length; i++) {
      const h = nodes[i] - nodes[i - 1];
      const limit = Math.min(spacingLimit_m(nodes[i - 1], refinements, GRADING), spacingLimit_m(nodes[i], refinements, GRADING));
      // 1e-9 relative slack for rounding of the node heights.
      expect(h).toBeLessThanOrEqual(limit * (1 + 1e-9));
    }
    // Geometric growth from 1 mm to 1 km needs about log(1e6)/log(1.5) ≈ 34 cells each way, not millions.
    expect(nodes.length).toBeLessThan(200);
  });

  it('grows the allowed spacing linearly with distance from a refinement, up to the maximum', () => {
    const refinements = [{ from_m: 100, to_m: 200, spacing_m: 2 }];
    expect(spacingLimit_m(150, refinements, GRADING)).toBe(2);
    expect(spacingLimit_m(300, refinements, GRADING)).toBe(52);
    expect(spacingLimit_m(0, refinements, GRADING)).toBe(52);
    expect(spacingLimit_m(1e6, refinements, GRADING)).toBe(1000);
  });
});
