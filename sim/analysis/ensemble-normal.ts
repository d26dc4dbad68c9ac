/**
 * The standard normal distribution for ensembles: its quantile (inverse cumulative distribution),
 * used to turn uniform numbers into normal ones, and its cumulative distribution, used to truncate
 * a normal to a field's allowed range.
 *
 * Normal deviates are made by inversion, x = Φ⁻¹(u), rather than Box–Muller or a ziggurat: one
 * uniform gives one normal, so Latin hypercube strata carry over exactly and a stream never depends
 * on how many normals came before.
 */

/** Wichura (1988) AS241 PPND16, central region |p − 0.5| ≤ 0.425: numerator coefficients of r = 0.180625 − q². */
const A = [
  3.387132872796366608, 133.14166789178437745, 1971.5909503065514427, 13731.693765509461125, 45921.953931549871457,
  67265.770927008700853, 33430.575583588128105, 2509.0809287301226727,
];
/** AS241 central region, denominator. */
const B = [
  1, 42.313330701600911252, 687.1870074920579083, 5394.1960214247511077, 21213.794301586595867, 39307.89580009271061,
  28729.085735721942674, 5226.495278852854561,
];
/** AS241 intermediate tail, r = sqrt(−ln min(p, 1−p)) − 1.6 for r ≤ 5: numerator. */
const C = [
  1.42343711074968357734, 4.6303378461565452959, 5.7694972214606914055, 3.64784832476320460504, 1.27045825245236838258,
  0.24178072517745061177, 0.0227238449892691845833, 7.7454501427834140764e-4,
];
/** AS241 intermediate tail, denominator. */
const D = [
  1, 2.05319162663775882187, 1.6763848301838038494, 0.68976733498510000455, 0.14810397642748007459,
  0.0151986665636164571966, 5.475938084995344946e-4, 1.05075007164441684324e-9,
];
/** AS241 far tail, r − 5 for r > 5: numerator. */
const E = [
  6.6579046435011037772, 5.4637849111641143699, 1.7848265399172913358, 0.29656057182850489123, 0.026532189526576123093,
  0.0012426609473880784386, 2.71155556874348757815e-5, 2.01033439929228813265e-7,
];
/** AS241 far tail, denominator. */
const F = [
  1, 0.59983220655588793769, 0.13692988092273580531, 0.0148753612908506148525, 7.868691311456132591e-4,
  1.8463183175100546818e-5, 1.4215117583164458887e-7, 2.04426310338993978564e-15,
];

function poly(c: readonly number[], x: number): number {
  let v = c[7];
  for (let i = 6; i >= 0; i--) v = v * x + c[i];
  return v;
}

/**
 * Quantile of the standard normal distribution, Φ⁻¹(p).
 * @param p probability, 0 < p < 1 (0 → −Infinity, 1 → +Infinity; outside [0, 1] → NaN: callers validate).
 * @returns x with Φ(x) = p, dimensionless.
 * Accuracy: relative error about 1e-16 (Wichura's stated accuracy for PPND16) over 1e-300 < p < 1 − 1e-16.
 * Reference: M. J. Wichura 1988, "Algorithm AS 241: The percentage points of the normal
 * distribution", Applied Statistics 37(3), 477–484 (PPND16, rational approximations of degree 7).
 */
export function normalQuantile(p: number): number {
  const q = p - 0.5;
  if (Math.abs(q) <= 0.425) {
    const r = 0.180625 - q * q;
    return (q * poly(A, r)) / poly(B, r);
  }
  if (p <= 0) return p === 0 ? -Infinity : NaN;
  if (p >= 1) return p === 1 ? Infinity : NaN;
  let r = Math.sqrt(-Math.log(q < 0 ? p : 1 - p));
  let x: number;
  if (r <= 5) {
    r -= 1.6;
    x = poly(C, r) / poly(D, r);
  } else {
    r -= 5;
    x = poly(E, r) / poly(F, r);
  }
  return q < 0 ? -x : x;
}

/** ½·ln(2π), the log of the normal density's normalisation (0.5 × ln 6.283185307179586). */
const HALF_LN_TWO_PI = 0.9189385332046727;

/** Beyond |x| = 8 the cumulative distribution is 0 or 1 to double precision in absolute terms (Φ(−8) ≈ 6e-16). */
const CDF_CUTOFF = 8;

/**
 * Cumulative distribution of the standard normal, Φ(x) = P(X ≤ x).
 * @param x dimensionless.
 * @returns probability 0..1.
 * Accuracy: absolute error below 1e-15 (the Taylor series is summed until its terms stop changing
 * the sum); relative accuracy is lost in the far lower tail, which is all that truncation needs.
 * Reference: G. Marsaglia 2004, "Evaluating the normal distribution", Journal of Statistical
 * Software 11(4): Φ(x) = 1/2 + φ(x)·(x + x³/3 + x⁵/(3·5) + x⁷/(3·5·7) + …).
 */
export function normalCdf(x: number): number {
  if (x <= -CDF_CUTOFF) return 0;
  if (x >= CDF_CUTOFF) return 1;
  let sum = x;
  let term = x;
  const x2 = x * x;
  for (let i = 3; sum + term !== sum; i += 2) {
    term *= x2 / i;
    sum += term;
  }
  return 0.5 + sum * Math.exp(-0.5 * x2 - HALF_LN_TWO_PI);
}
