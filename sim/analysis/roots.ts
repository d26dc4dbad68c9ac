/**
 * Small one-dimensional searches used by the transfer curve: a bracketed root of a monotone
 * function (Illinois false position) and the extremum of a unimodal function (golden section).
 * Kernels: no argument checks.
 */

/** Golden-section ratio (√5 − 1)/2. */
const INVERSE_GOLDEN = (Math.sqrt(5) - 1) / 2;

/** Most iterations of either search (each halves the bracket at worst, so 200 is far beyond 1e-300). */
const MAX_ITERATIONS = 200;

/**
 * Root of f in [a, b] where f(a) and f(b) have opposite signs, by the Illinois variant of false
 * position (superlinear for smooth f, never leaves the bracket).
 * @param f the function (called at most MAX_ITERATIONS times); NaN is treated as "same side as a".
 * @param a, b bracket ends, a < b; fa = f(a), fb = f(b) with fa·fb ≤ 0.
 * @param tolerance stop when the bracket is narrower than this (same unit as a, b).
 * @returns [x, fx] at the bracket end with the smaller |f|.
 * Reference: Dowell & Jarratt (1971), BIT 11, 168 (the Illinois method), from memory.
 */
export function illinoisRoot(f: (x: number) => number, a: number, b: number, fa: number, fb: number, tolerance: number): [number, number] {
  if (fa === 0) return [a, fa];
  if (fb === 0) return [b, fb];
  let side = 0;
  for (let i = 0; i < MAX_ITERATIONS && b - a > tolerance; i++) {
    let x = (a * fb - b * fa) / (fb - fa);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const fx = f(x);
    if (fx === 0) return [x, 0];
    if (fx > 0 === fa > 0 || Number.isNaN(fx)) {
      a = x;
      fa = fx;
      if (side === -1) fb *= 0.5;
      side = -1;
    } else {
      b = x;
      fb = fx;
      if (side === 1) fa *= 0.5;
      side = 1;
    }
  }
  return Math.abs(fa) <= Math.abs(fb) ? [a, fa] : [b, fb];
}

/**
 * Maximum of a unimodal function on [a, b] by golden-section search (to find a minimum, pass −f).
 * @param f the function.
 * @param a, b bracket, a < b.
 * @param tolerance stop when the bracket is narrower than this.
 * @returns [x, f(x)], the best point evaluated.
 * Reference: Kiefer (1953), Proc. Am. Math. Soc. 4, 502 (golden-section search), from memory.
 */
export function goldenMaximum(f: (x: number) => number, a: number, b: number, tolerance: number): [number, number] {
  let x1 = b - INVERSE_GOLDEN * (b - a);
  let x2 = a + INVERSE_GOLDEN * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  for (let i = 0; i < MAX_ITERATIONS && b - a > tolerance; i++) {
    if (f1 >= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - INVERSE_GOLDEN * (b - a);
      f1 = f(x1);
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + INVERSE_GOLDEN * (b - a);
      f2 = f(x2);
    }
  }
  return f1 >= f2 ? [x1, f1] : [x2, f2];
}
