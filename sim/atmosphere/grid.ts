/**
 * Graded height grids: every break height is a node, spacing is fine where a refinement asks for
 * it and grows geometrically away from it, up to a maximum. Used by the hydrostatic integration
 * and as the starting grid of the index table.
 */
import type { AirColumn } from './column.js';

/** A height range wanting a node spacing of at most spacing_m (AirColumn.refinements). */
export type Refinement = AirColumn['refinements'][number];

/** How a graded grid grows. */
export interface GradingOptions {
  /** Largest spacing anywhere, m. */
  maxSpacing_m: number;
  /** Ratio of neighbouring cell sizes away from a refinement (> 1), e.g. 1.5. */
  growth: number;
}

/**
 * Largest spacing allowed at z: min(maxSpacing, min over refinements of spacing + (growth − 1)·d),
 * d the distance from z to the refinement's range. Cells that follow this grow by the factor
 * `growth` from one to the next.
 */
export function spacingLimit_m(z_m: number, refinements: readonly Refinement[], options: GradingOptions): number {
  let limit = options.maxSpacing_m;
  for (const r of refinements) {
    const d = z_m < r.from_m ? r.from_m - z_m : z_m > r.to_m ? z_m - r.to_m : 0;
    const s = r.spacing_m + (options.growth - 1) * d;
    if (s < limit) limit = s;
  }
  return limit;
}

/**
 * Node heights from bottom_m to top_m (both included), with every break strictly between them
 * included and no cell wider than spacingLimit_m at either of its ends (to within the last split
 * of an interval, which halves a remainder shorter than two cells).
 * @param bottom_m lowest node, m.
 * @param top_m highest node, m (> bottom_m).
 * @param breaks_m heights that must be nodes, m (any order; those outside (bottom, top) ignored).
 * @param refinements ranges wanting fine spacing (spacing_m > 0).
 * @param options maximum spacing and growth ratio.
 * @returns strictly increasing node heights, m.
 */
export function gradedNodes(
  bottom_m: number,
  top_m: number,
  breaks_m: readonly number[],
  refinements: readonly Refinement[],
  options: GradingOptions,
): number[] {
  const fixed = [bottom_m, ...breaks_m.filter((z) => z > bottom_m && z < top_m), top_m].sort((a, b) => a - b);
  const nodes: number[] = [bottom_m];
  for (let k = 1; k < fixed.length; k++) {
    const b = fixed[k];
    if (!(b > nodes[nodes.length - 1])) continue;
    let z = nodes[nodes.length - 1];
    for (;;) {
      let h = spacingLimit_m(z, refinements, options);
      // A refinement ahead lowers the limit at the far end of the step: shrink until both ends agree.
      for (let iteration = 0; iteration < 4; iteration++) h = Math.min(h, spacingLimit_m(z + h, refinements, options));
      const remaining = b - z;
      if (remaining <= h) break;
      const next = remaining < 2 * h ? z + remaining / 2 : z + h;
      if (!(next > z)) throw new RangeError(`grid spacing ${h} m is too small to advance from ${z} m`);
      z = next;
      nodes.push(z);
    }
    nodes.push(b);
  }
  return nodes;
}
