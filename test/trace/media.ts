/**
 * Test-only media for the ray tracer, built with tabulateIndex from analytic n(z). They stand
 * apart from sim/atmosphere and sim/refractivity on purpose, so that the tracer's tests check the
 * tracer alone:
 * - layeredMedium: a piecewise-linear temperature profile with hydrostatic pressure (constant g)
 *   and a Gladstone–Dale index n − 1 = K·p/T — a simple test medium, not the project's Ciddor
 *   model; K from the Ciddor value n − 1 = 2.77838e-4 at 288.15 K, 101 325 Pa, 550 nm, dry
 *   (REFERENCES.md §5.1 table, independent computation);
 * - perfectDuct: n = C/r (REFERENCES.md §5.4 item 2);
 * - linearIndex: n = n0 + g·z (REFERENCES.md §5.4 item 3).
 */
import { HYDROSTATIC_K_PER_M } from '../../sim/constants.js';
import { tabulateIndex } from '../../sim/refractivity/index-table.js';
import type { IndexTable } from '../../sim/refractivity/index-table.js';

/** Gladstone–Dale constant of the test medium, K/Pa: 2.77838e-4 × 288.15 K / 101 325 Pa. */
export const GLADSTONE_DALE_K_PER_PA = (2.77838e-4 * 288.15) / 101325;

/** A temperature node, heights in m above the surface. */
export interface Node {
  height_m: number;
  temperature_K: number;
}

/** Description of a layered test atmosphere. */
export interface LayeredSpec {
  surfacePressure_Pa: number;
  /** Temperature nodes from height 0 up, linear in between (kinks at every node above 0). */
  nodes: Node[];
  /** Lapse above the last node, K/m (negative: cooling with height). */
  aboveGradient_K_per_m: number;
  /** Top of the table, m. */
  top_m: number;
  /** Table spacing up to 10 m above the last node, m. Default 1. */
  fine_m?: number;
}

/** Temperature, its gradient and pressure of a layered profile at z (gradient from above at nodes unless below). */
function layeredState(spec: LayeredSpec, z: number, below: boolean): { T: number; G: number; p: number } {
  const nodes = spec.nodes;
  let p = spec.surfacePressure_Pa;
  for (let i = 0; ; i++) {
    const base = nodes[i];
    const next = nodes[i + 1];
    const G = next ? (next.temperature_K - base.temperature_K) / (next.height_m - base.height_m) : spec.aboveGradient_K_per_m;
    const inLayer = !next || z < next.height_m || (below && z === next.height_m);
    const zEnd = inLayer ? z : next.height_m;
    const T = base.temperature_K + G * (zEnd - base.height_m);
    // Hydrostatic pressure across the layer with constant g: p ∝ T^(−H/G), or exp(−H Δz / T).
    p *= G === 0 ? Math.exp((-HYDROSTATIC_K_PER_M * (zEnd - base.height_m)) / T) : Math.pow(T / base.temperature_K, -HYDROSTATIC_K_PER_M / G);
    if (inLayer) return { T, G, p };
  }
}

/** Tabulates a layered Gladstone–Dale atmosphere (kinks at every temperature node above 0). */
export function layeredMedium(spec: LayeredSpec): IndexTable {
  const fine = spec.fine_m ?? 1;
  const kinks = spec.nodes.map((n) => n.height_m).filter((z) => z > 0 && z < spec.top_m);
  const fineTop = Math.min(spec.top_m, (kinks.length ? kinks[kinks.length - 1] : 0) + 10);
  const heights = new Set<number>([0, spec.top_m, ...kinks]);
  for (let z = 0; z < fineTop; z += fine) heights.add(Math.min(z, fineTop));
  let step = fine;
  for (let z = fineTop; z < spec.top_m; z += step) {
    heights.add(z);
    step = Math.min(500, step * 1.5);
  }
  const nodes = [...heights].sort((a, b) => a - b);
  return tabulateIndex(
    {
      nm1: (z) => {
        const s = layeredState(spec, z, false);
        return (GLADSTONE_DALE_K_PER_PA * s.p) / s.T;
      },
      dndz: (z, side) => {
        const s = layeredState(spec, z, side < 0);
        return (-(GLADSTONE_DALE_K_PER_PA * s.p) / s.T) * (HYDROSTATIC_K_PER_M + s.G) / s.T;
      },
    },
    nodes,
    kinks,
  );
}

/**
 * The strong surface inversion of the bench (and the fan tests): 5 °C at the sea rising 10 K over
 * the lowest 30 m, then the standard lapse −6.5 K/km, 1013.25 hPa at the surface, top 20 km.
 */
export function strongInversion(): IndexTable {
  return layeredMedium({
    surfacePressure_Pa: 101325,
    nodes: [
      { height_m: 0, temperature_K: 278.15 },
      { height_m: 30, temperature_K: 288.15 },
    ],
    aboveGradient_K_per_m: -0.0065,
    top_m: 20000,
  });
}

/** A normal atmosphere: 15 °C, standard lapse −6.5 K/km from the surface, top 20 km. */
export function standardLapse(): IndexTable {
  return layeredMedium({
    surfacePressure_Pa: 101325,
    nodes: [{ height_m: 0, temperature_K: 288.15 }],
    aboveGradient_K_per_m: -0.0065,
    top_m: 20000,
  });
}

/** n = C/r with C = n0·R: n·r is constant, a perfect duct (REFERENCES.md §5.4 item 2). */
export function perfectDuct(n0: number, earthRadius_m: number, top_m: number, spacing_m: number): IndexTable {
  const C = n0 * earthRadius_m;
  const nodes: number[] = [];
  for (let z = 0; z < top_m; z += spacing_m) nodes.push(z);
  nodes.push(top_m);
  return tabulateIndex(
    { nm1: (z) => C / (earthRadius_m + z) - 1, dndz: (z) => -C / ((earthRadius_m + z) * (earthRadius_m + z)) },
    nodes,
  );
}

/** n = n0 + g·z, linear (REFERENCES.md §5.4 item 3); the cubic table reproduces it exactly. */
export function linearIndex(n0: number, gradient_per_m: number, top_m: number): IndexTable {
  return tabulateIndex({ nm1: (z) => n0 - 1 + gradient_per_m * z, dndz: () => gradient_per_m }, [0, top_m / 2, top_m]);
}
