/**
 * Target silhouettes for the simulated view: invented outlines of our own (a vessel, a tower, a
 * cliff coast, an ice block, a pole) scaled to the target's height, or a custom outline of
 * [width_m, height_m] pairs. An outline is the top edge of a solid shape standing on the surface:
 * x from the left edge, z the height of the top there; the shape fills 0 ≤ height ≤ z(x).
 */
import { InputError } from '../errors.js';

/** Names of the built-in shapes (the scenario's target.shape, DESIGN.md §5). */
export type ShapeName = 'vessel' | 'tower' | 'cliff' | 'ice' | 'pole' | 'custom';

/** A silhouette in metres: its top edge as a polyline, x increasing (a repeated x is a vertical edge). */
export interface Silhouette {
  shape: ShapeName;
  /** Width, m (last x). */
  width_m: number;
  /** Highest point, m. */
  height_m: number;
  /** Top edge [x_m, z_m], x non-decreasing from 0. */
  outline_m: [number, number][];
}

/**
 * Built-in outlines in units of the target's height (x and z both divided by it). Invented:
 * - vessel: a long low hull with a raised bow, a wheelhouse aft of midships and a mast;
 * - tower: a tapering shaft with a gallery and a lantern on top;
 * - cliff: a coast rising from a beach to an uneven plateau and falling to a headland;
 * - ice: a flat-topped block with steep, slightly rounded sides;
 * - pole: a slender mast, one twentieth as wide as it is tall.
 */
const UNIT_OUTLINES: Record<Exclude<ShapeName, 'custom'>, [number, number][]> = {
  vessel: [
    [0, 0], [0.1, 0.3], [1.4, 0.3], [1.4, 0.52], [1.9, 0.52], [1.9, 0.3], [2.2, 0.3], [2.2, 1], [2.25, 1], [2.25, 0.3],
    [3.3, 0.3], [3.5, 0.42], [3.6, 0.42], [3.7, 0],
  ],
  tower: [[0, 0], [0.03, 0.8], [0.03, 0.86], [0.09, 0.86], [0.09, 1], [0.17, 1], [0.17, 0.86], [0.23, 0.86], [0.23, 0.8], [0.26, 0]],
  cliff: [[0, 0], [0.6, 0.05], [1.2, 0.78], [2, 0.93], [3.5, 0.97], [5, 1], [6.5, 0.9], [8, 0.95], [9.2, 0.88], [10, 0.4], [10.4, 0]],
  ice: [[0, 0], [0.08, 0.75], [0.25, 0.97], [0.5, 1], [3.5, 1], [3.75, 0.97], [3.92, 0.75], [4, 0]],
  pole: [[0, 0], [0, 1], [0.05, 1], [0.05, 0]],
};

/**
 * The silhouette of a target.
 * @param shape a built-in shape, or 'custom' (then outline_m is required).
 * @param height_m the target's height, m (> 0): built-in outlines are scaled to it.
 * @param outline_m custom outline, [width_m, height_m] pairs from the left edge (≥ 2 points).
 * @returns the silhouette in metres; a custom outline is sorted by x (stable for vertical edges).
 * @throws InputError naming target.outline_m when a custom shape has fewer than 2 points.
 */
export function silhouette(shape: ShapeName, height_m: number, outline_m?: readonly [number, number][]): Silhouette {
  let outline: [number, number][];
  if (shape === 'custom') {
    if (!outline_m || outline_m.length < 2) throw new InputError('target.outline_m', 'a custom shape needs at least 2 [width_m, height_m] points');
    outline = outline_m.map(([x, z]) => [x, z] as [number, number]).sort((a, b) => a[0] - b[0]);
  } else {
    outline = UNIT_OUTLINES[shape].map(([x, z]) => [x * height_m, z * height_m] as [number, number]);
  }
  const width = outline[outline.length - 1][0] - outline[0][0];
  const left = outline[0][0];
  return {
    shape,
    width_m: width,
    height_m: Math.max(...outline.map(([, z]) => z)),
    outline_m: outline.map(([x, z]) => [x - left, z]),
  };
}

/**
 * Height of the silhouette's top at a lateral offset from its centre, m; −Infinity outside.
 * Where the outline has a vertical edge (repeated x) the higher value counts.
 * @param s the silhouette.
 * @param offset_m lateral offset from the centre line, m (negative: left).
 */
export function topAt(s: Silhouette, offset_m: number): number {
  const x = offset_m + 0.5 * s.width_m;
  const pts = s.outline_m;
  if (x < pts[0][0] || x > pts[pts.length - 1][0]) return -Infinity;
  let best = -Infinity;
  for (let k = 0; k + 1 < pts.length; k++) {
    const [x0, z0] = pts[k];
    const [x1, z1] = pts[k + 1];
    if (x < x0 || x > x1) continue;
    const z = x1 === x0 ? Math.max(z0, z1) : z0 + ((x - x0) / (x1 - x0)) * (z1 - z0);
    if (z > best) best = z;
  }
  return best;
}
