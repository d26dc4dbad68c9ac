/**
 * Analytic media tabulated with tabulateIndex, for exact checks of the invariant searches and the
 * quadrature (the cubic Hermite table reproduces a polynomial n(z) of degree ≤ 3 exactly).
 */
import { tabulateIndex, type IndexTable } from '../../sim/refractivity/index-table.js';

/** Earth radius of the analytic tests, m (DESIGN.md §2 default). */
export const R_TEST_M = 6_371_000;

/** Nodes every `step_m` from 0 to top_m. */
export function evenNodes(top_m: number, step_m: number): number[] {
  const nodes: number[] = [];
  for (let z = 0; z < top_m - 1e-9; z += step_m) nodes.push(z);
  nodes.push(top_m);
  return nodes;
}

/**
 * Quadratic refractivity n − 1 = a − b z + q z² (tabulated exactly). With b·R > 1 + a near the
 * surface, n·r decreases with height there (a duct) and has a smooth minimum where
 * 3q z² + (2qR − 2b) z + (1 + a − bR) = 0.
 */
export function quadraticMedium(a: number, b: number, q: number, top_m: number, step_m: number): IndexTable {
  return tabulateIndex({ nm1: (z) => a - b * z + q * z * z, dndz: (z) => -b + 2 * q * z }, evenNodes(top_m, step_m));
}

/** Height of the smooth minimum of n·r in quadraticMedium, m (the root of g′ nearest the surface). */
export function quadraticMediumMinimum_m(a: number, b: number, q: number, R: number): number {
  const A = 3 * q;
  const B = 2 * q * R - 2 * b;
  const C = 1 + a - b * R;
  const disc = Math.sqrt(B * B - 4 * A * C);
  return (2 * C) / (-B - disc); // stable form of (−B + disc)/(2A)
}

/**
 * Power-law medium n(r) = n0·(R/r)^k (r = R + z). Then n·r = n0 R^k r^(1−k) and the invariant
 * quadratures have closed forms (substitute w = r^(1−k)):
 *   θ = [arccos(c/f(r₂)) − arccos(c/f(r₁))]/(1 − k),  τ = k·θ  (since dθ − dτ = dα = (1 − k) dθ).
 */
export function powerLawMedium(n0: number, k: number, R: number, top_m: number, step_m: number): IndexTable {
  // n − 1 = expm1(ln n0 − k·ln(1 + z/R)): n − 1 computed as n minus 1 would lose 1e-16, i.e. 6e-10 m of n·r.
  const nm1 = (z: number): number => Math.expm1(Math.log(n0) - k * Math.log1p(z / R));
  return tabulateIndex({ nm1, dndz: (z) => (-k * (1 + nm1(z))) / (R + z) }, evenNodes(top_m, step_m));
}
