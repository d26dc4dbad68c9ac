/**
 * Ducts of a stratified medium, read from Bouguer's invariant f(z) = n(z)·(R + z).
 *
 * A ray with invariant c can exist only where f ≥ c (c = f cos α). Where f decreases with height
 * (a trapping layer: dn/dz < −n/r, the ray curvature exceeds the Earth's) f has a local minimum at
 * the layer's top; rays with c just above that minimum, launched below it, turn back down under it,
 * and turn up again where f falls back to c below: they are trapped. The duct therefore spans from
 * the local minimum (its top) down to the highest height where f equals that minimum again (its
 * bottom), or to the surface when f stays above it (a surface-based duct). This is the
 * modified-refractivity picture of radio propagation (M = N + 10⁶ z/R ≈ 10⁶ (f − R)/R; a
 * trapping layer is where dM/dz < 0: REFERENCES.md §2.2, ITU-R P.453 as transcribed there)
 * applied to the exact f, and it is how A. T. Young locates the bottom of his duct models
 * (REFERENCES.md §6.1).
 */
import type { InvariantProfile } from './invariant.js';

/** Local minima of f shallower than this are rounding noise, m of n·r (1e-9 m is 1.6e-10 M-units). */
const MIN_DUCT_DEPTH_M = 1e-9;

/** One duct of the medium. Heights in m above the surface. */
export interface Duct {
  /** Bottom: highest height below the top where n·r equals its value at the top; 0 if surface-based. */
  bottom_m: number;
  /** Top: the local minimum of n·r (top of the trapping layer). */
  top_m: number;
  /** Bottom of the trapping layer (the local maximum of n·r below the top, or 0), m. */
  trapping_layer_bottom_m: number;
  /** True when n·r stays above its minimum all the way down to the surface. */
  surface_based: boolean;
  /** Depth of the trapping layer: n·r at its bottom minus at its top, m (× 10⁶/R gives M-units). */
  depth_m: number;
}

/**
 * The duct whose top (a local minimum of n·r, or any height taken as one) is top_m.
 * @param profile invariant profile of the medium.
 * @param top_m height of the duct's top, m (0..table top).
 * @returns the duct; trapping layer and depth from the nearest local maximum of n·r below top_m.
 */
export function ductWithTop(profile: InvariantProfile, top_m: number): Duct {
  const gTop = profile.offset_m(top_m);
  const crossing = top_m > 0 ? profile.crossingBelow(gTop, top_m) : null;
  const maxima = profile.extrema(0, top_m).filter((e) => e.kind === 'max' && e.height_m < top_m);
  const layerBottom = maxima.length > 0 ? maxima[maxima.length - 1].height_m : 0;
  return {
    bottom_m: crossing ?? 0,
    top_m,
    trapping_layer_bottom_m: layerBottom,
    surface_based: crossing === null,
    depth_m: profile.offset_m(layerBottom) - gTop,
  };
}

/**
 * Every duct of the medium between the surface and to_m: one per local minimum of n·r.
 * @param profile invariant profile of the medium.
 * @param to_m highest height searched, m (default: the table top).
 * @returns ducts ordered by height of their tops. Exact for the tabulated medium (extrema of the
 *   cell polynomials found to machine precision; see InvariantProfile).
 */
export function findDucts(profile: InvariantProfile, to_m: number = profile.table.top_m): Duct[] {
  const ducts: Duct[] = [];
  for (const extremum of profile.extrema(0, to_m)) {
    if (extremum.kind !== 'min') continue;
    const duct = ductWithTop(profile, extremum.height_m);
    if (duct.depth_m > MIN_DUCT_DEPTH_M) ducts.push(duct);
  }
  return ducts;
}
