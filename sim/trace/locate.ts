/**
 * Event location by re-integration: the integrator goes back to the state saved at the start of a
 * step and integrates afresh, in one short step, to a trial range; a safeguarded Newton iteration on
 * that range (bisection whenever Newton leaves the bracket) finds where the height reaches a level
 * or the elevation angle reaches zero. The located point is therefore on the integrated ray, to
 * integrator accuracy, not on an interpolant.
 */
import type { RayEquations } from './equations.js';
import type { OdeState, OdeStepper } from './ode.js';

/** Which state component an event concerns. */
export const HEIGHT = 0;
export const ELEVATION = 1;

/**
 * Height events are located to |z − level| ≤ max(this, 8 ulp(level)), m: far below the 1e-9 m the
 * tests demand of a surface hit and below any physical meaning, yet reachable in double precision
 * at the top of the atmosphere (ulp(86 km) ≈ 1.5e-11 m).
 */
export const EVENT_HEIGHT_TOLERANCE_M = 1e-11;

/** How close to a level (m) the ray must come to count as on it: EVENT_HEIGHT_TOLERANCE_M or 8 ulp of the level. */
export function heightTolerance(level_m: number): number {
  return Math.max(EVENT_HEIGHT_TOLERANCE_M, 8 * Number.EPSILON * Math.abs(level_m));
}

/** Turning points are located to |α| ≤ this, rad; the height there is then exact to ~1e-20 m. */
export const EVENT_ELEVATION_TOLERANCE_RAD = 1e-14;

/** Newton / bisection iterations before giving up (bisection alone needs about 60). */
const MAX_ITERATIONS = 80;

/** Relative width of the range bracket below which the search stops. */
const RANGE_RESOLUTION = 4e-16;

/**
 * Finds the range in [a, b] where y[component] = level on the ray integrated from start, and leaves
 * the stepper there.
 * @param stepper the integrator (its state is overwritten).
 * @param equations the ray equations (for the slope at a trial point).
 * @param start state at the start of the step, start.t ≤ a.
 * @param component HEIGHT or ELEVATION.
 * @param level the height (m) or elevation (rad) sought.
 * @param a lower end of the bracket, m of range, where y[component] − level = ga.
 * @param b upper end, where y[component] − level = gb (of the other sign, or zero).
 * @param guess first trial range in (a, b), e.g. from a cubic Hermite interpolant.
 * Newton steps that leave the bracket are replaced by a secant step between its ends, and that by
 * bisection if it fails to move inside.
 */
export function locateEvent(
  stepper: OdeStepper, equations: RayEquations, start: OdeState,
  component: number, level: number, a: number, ga: number, b: number, gb: number, guess: number,
): void {
  const signA = ga > 0 ? 1 : -1;
  const y = stepper.y;
  const tolerance = component === HEIGHT ? heightTolerance(level) : EVENT_ELEVATION_TOLERANCE_RAD;
  let s = guess > a && guess < b ? guess : 0.5 * (a + b);
  let bestS = b;
  let bestG = Infinity;
  for (let k = 0; k < MAX_ITERATIONS; k++) {
    integrateFrom(stepper, start, s);
    const g = y[component] - level;
    const size = Math.abs(g);
    if (size < bestG) {
      bestG = size;
      bestS = s;
    }
    if (size <= tolerance) return;
    if ((g > 0 ? 1 : -1) === signA) {
      a = s;
      ga = g;
    } else {
      b = s;
      gb = g;
    }
    if (b - a <= RANGE_RESOLUTION * Math.max(1, Math.abs(b))) break;
    const slope = component === HEIGHT
      ? equations.heightRate(y[0], y[1])
      : equations.elevationRate(y[0], y[1] < 0);
    let next = s - g / slope;
    if (!(next > a && next < b)) next = a - (ga * (b - a)) / (gb - ga);
    if (!(next > a && next < b)) next = 0.5 * (a + b);
    s = next;
  }
  if (bestS !== stepper.t) integrateFrom(stepper, start, bestS);
}

/** Restores start and integrates to exactly s (≥ start.t), trying the whole way in one step. */
export function integrateFrom(stepper: OdeStepper, start: OdeState, s: number): void {
  stepper.restore(start);
  if (s > start.t) {
    stepper.dt = s - start.t;
    stepper.advanceTo(s);
  }
}
