/**
 * Cubic Hermite interpolation over one step [s0, s1] from values and slopes at both ends: the
 * guesses for event location, the turning point of a step, and path resampling for display.
 * Accuracy: O(h⁴) in the value for a smooth function (h = s1 − s0); only guesses and display
 * samples come from here, never an event's final position.
 */

/** Value at s of the cubic through (s0, v0, slope d0) and (s1, v1, slope d1). */
export function hermiteValue(s0: number, v0: number, d0: number, s1: number, v1: number, d1: number, s: number): number {
  const h = s1 - s0;
  const t = (s - s0) / h;
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * v0 + (t3 - 2 * t2 + t) * h * d0 + (3 * t2 - 2 * t3) * v1 + (t3 - t2) * h * d1;
}

/** Slope at s of the same cubic. */
export function hermiteSlope(s0: number, v0: number, d0: number, s1: number, v1: number, d1: number, s: number): number {
  const h = s1 - s0;
  const t = (s - s0) / h;
  const t2 = t * t;
  return ((6 * t2 - 6 * t) * (v0 - v1)) / h + (3 * t2 - 4 * t + 1) * d0 + (3 * t2 - 2 * t) * d1;
}

/** Bisection steps that bring a unit bracket below double-precision resolution. */
const BISECTION_STEPS = 60;

/**
 * The point in (s0, s1) where the cubic's slope vanishes, given slopes of opposite sign at the ends
 * (exactly one such point then). Returns s0 + (s1 − s0)/2 if the slopes do not differ in sign.
 */
export function hermiteExtremum(s0: number, v0: number, d0: number, s1: number, v1: number, d1: number): number {
  let a = s0;
  let b = s1;
  if (!(d0 * d1 < 0)) return 0.5 * (a + b);
  const rising = d0 < 0; // slope goes from negative to positive
  for (let k = 0; k < BISECTION_STEPS && b - a > 0; k++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    const slope = hermiteSlope(s0, v0, d0, s1, v1, d1, m);
    if (slope < 0 === rising) a = m;
    else b = m;
  }
  return 0.5 * (a + b);
}

/**
 * The point in [a, b] ⊂ [s0, s1] where the cubic equals level, given that (value − level) differs
 * in sign at a and b; found by bisection on the cubic (no integration).
 */
export function hermiteCrossing(
  s0: number, v0: number, d0: number, s1: number, v1: number, d1: number,
  level: number, a: number, b: number,
): number {
  const aAbove = hermiteValue(s0, v0, d0, s1, v1, d1, a) > level;
  for (let k = 0; k < BISECTION_STEPS; k++) {
    const m = 0.5 * (a + b);
    if (m === a || m === b) break;
    if (hermiteValue(s0, v0, d0, s1, v1, d1, m) > level === aAbove) a = m;
    else b = m;
  }
  return 0.5 * (a + b);
}
