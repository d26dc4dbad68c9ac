/**
 * Hydrostatic pressure of a temperature profile.
 *
 * dp/p = −(g0·M/R)·dH/T on geopotential height H, with dH = (g(z)/g0)·dz = (r0/(r0 + z))²·dz
 * (inverse-square gravity, US 1976 Eq. 17, r0 = 6 356 766 m; DESIGN.md §4 constants). So
 * ln p(z) = ln p(0) − (g0·M/R)·∫₀^z (r0/(r0 + z′))² / T(z′) dz′.
 *
 * Method: the integral is taken by 8-point Gauss–Legendre quadrature on each cell of a grid that
 * has every kink of T as a node (so the integrand is smooth in each cell), cells at most 2 km
 * wide and graded down to the profile's refinements. ln p is stored at the grid nodes; a lookup
 * adds the same quadrature over the part of the cell below z. For temperature linear in z or in H
 * across a cell of 2 km, the quadrature error is below 1e-15 relative (the integrand's Taylor terms
 * fall as (h·|dT/dz|/T)^k ≈ 0.06^k, and 8 points are exact to degree 15); what remains is rounding,
 * about 1e-14 relative at 86 km. The moisture of the air is neglected (dry-air molar mass, as
 * DESIGN.md §4 fixes): at 30 °C and saturation that underestimates −dp/dz by about 1.6 %.
 */
import { HYDROSTATIC_K_PER_M } from '../constants.js';
import { gradedNodes, type Refinement } from './grid.js';
import { gravityRatio } from './us1976.js';

/** Pressure along a column. */
export interface PressureProfile {
  /** Pressure at z, Pa. */
  pressure_Pa(z_m: number): number;
  /** dp/dz at z, Pa/m: −p·(g(z)/g0)·(g0·M/R)/T(z). Continuous (T is continuous). */
  pressureGradient_Pa_per_m(z_m: number): number;
}

/** What the integration needs of a temperature profile. */
export interface HydrostaticInput {
  temperature_K(z_m: number): number;
  readonly kinks_m: readonly number[];
  readonly top_m: number;
}

/** Options of hydrostaticPressure. */
export interface HydrostaticOptions {
  /** g0·M/R, K/m. Default HYDROSTATIC_K_PER_M (CODATA 2018 R, DESIGN.md §4); the standard atmosphere passes US1976_HYDROSTATIC_K_PER_M. */
  hydrostatic_K_per_m?: number;
  /** Ranges wanting fine cells (a logarithmic surface layer). Default none. */
  refinements?: readonly Refinement[];
  /** Widest quadrature cell, m. Default 2000. */
  maxCell_m?: number;
}

/** Defaults of HydrostaticOptions. */
export const HYDROSTATIC_DEFAULTS = {
  hydrostatic_K_per_m: HYDROSTATIC_K_PER_M,
  refinements: [] as readonly Refinement[],
  maxCell_m: 2000,
  /** Growth ratio of the cells away from a refinement. */
  growth: 1.5,
} as const;

/** 8-point Gauss–Legendre abscissae on [−1, 1] (positive half; Abramowitz & Stegun Table 25.4). */
const GL_X = [0.1834346424956498, 0.525532409916329, 0.7966664774136267, 0.9602898564975363];
/** The matching weights (Abramowitz & Stegun Table 25.4). */
const GL_W = [0.362683783378362, 0.3137066458778873, 0.2223810344533745, 0.1012285362903763];

/**
 * Integrates the hydrostatic equation upward from the surface pressure.
 * @param temperature the profile (T > 0 everywhere; its kinks become grid nodes).
 * @param surface_pressure_Pa pressure at z = 0, Pa (> 0).
 * @param options constant, refinements and cell width (HYDROSTATIC_DEFAULTS).
 * @returns pressure and its gradient; defined for any z (the end cells extend below 0 and above the
 *   top). Accuracy about 1e-14 relative for piecewise-smooth T whose kinks are listed.
 * Reference: US 1976 (NOAA/NASA/USAF), Eqs. 17, 18 and the hydrostatic equation it integrates.
 */
export function hydrostaticPressure(temperature: HydrostaticInput, surface_pressure_Pa: number, options: HydrostaticOptions = {}): PressureProfile {
  const k = options.hydrostatic_K_per_m ?? HYDROSTATIC_DEFAULTS.hydrostatic_K_per_m;
  const T = (z: number): number => temperature.temperature_K(z);
  /** ∫_a^b (g/g0)/T dz by 8-point Gauss–Legendre. */
  const integral = (a: number, b: number): number => {
    const half = 0.5 * (b - a);
    const mid = 0.5 * (a + b);
    let sum = 0;
    for (let j = 0; j < 4; j++) {
      const dz = half * GL_X[j];
      sum += GL_W[j] * (gravityRatio(mid - dz) / T(mid - dz) + gravityRatio(mid + dz) / T(mid + dz));
    }
    return sum * half;
  };

  const nodes = Float64Array.from(
    gradedNodes(0, temperature.top_m, temperature.kinks_m, options.refinements ?? HYDROSTATIC_DEFAULTS.refinements, {
      maxSpacing_m: options.maxCell_m ?? HYDROSTATIC_DEFAULTS.maxCell_m,
      growth: HYDROSTATIC_DEFAULTS.growth,
    }),
  );
  const last = nodes.length - 2;
  const lnp = new Float64Array(nodes.length);
  lnp[0] = Math.log(surface_pressure_Pa);
  for (let i = 0; i <= last; i++) lnp[i + 1] = lnp[i] - k * integral(nodes[i], nodes[i + 1]);

  const cell = (z: number): number => {
    if (z <= nodes[0]) return 0;
    if (z >= nodes[last]) return last;
    let lo = 0;
    let hi = last + 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if (nodes[mid] <= z) lo = mid;
      else hi = mid;
    }
    return lo;
  };
  // The last height asked for and its pressure: a column is asked for p, dp/dz and the vapour
  // terms at one height in a row (sim/refractivity/build-table.ts), each needing the same
  // 8-point integral; the answer is a pure function of z, so repeating it is exact.
  let lastZ_m = Number.NaN;
  let lastP_Pa = 0;
  const pressure_Pa = (z_m: number): number => {
    if (z_m === lastZ_m) return lastP_Pa;
    const i = cell(z_m);
    lastP_Pa = Math.exp(lnp[i] - k * integral(nodes[i], z_m));
    lastZ_m = z_m;
    return lastP_Pa;
  };
  return {
    pressure_Pa,
    pressureGradient_Pa_per_m: (z_m: number): number => (-pressure_Pa(z_m) * gravityRatio(z_m) * k) / T(z_m),
  };
}
