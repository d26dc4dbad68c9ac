/**
 * Small statistics for ensembles: percentiles, proportions with their standard errors, ranks and
 * Spearman's rank correlation.
 */

/**
 * Percentile of a sample by linear interpolation between order statistics (Hyndman & Fan type 7,
 * the default of R and NumPy): position h = (n − 1)·p, value x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋+1 − x⌊h⌋).
 * @param sorted values sorted ascending (finite numbers), length ≥ 1; not checked (kernel).
 * @param p fraction 0..1 (0.05 for the 5th percentile).
 * @returns the percentile, in the values' unit; exact for the sample (no estimation error stated).
 * Reference: R. J. Hyndman & Y. Fan 1996, "Sample quantiles in statistical packages", The American
 * Statistician 50(4), 361–365, definition 7.
 */
export function percentileSorted(sorted: ArrayLike<number>, p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(sorted.length - 1, lo + 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

/** The 5th, 50th and 95th percentiles. */
export interface Percentiles {
  p5: number;
  p50: number;
  p95: number;
}

/**
 * 5th, 50th and 95th percentiles of a sample (type 7), ignoring nulls.
 * @param values the sample; null entries are left out.
 * @returns the percentiles, or null when no value is left.
 */
export function percentiles(values: readonly (number | null)[]): Percentiles | null {
  const sorted = values.filter((v): v is number => v !== null).sort((a, b) => a - b);
  if (sorted.length === 0) return null;
  return { p5: percentileSorted(sorted, 0.05), p50: percentileSorted(sorted, 0.5), p95: percentileSorted(sorted, 0.95) };
}

/** A proportion estimated from a sample, with its standard error. */
export interface Proportion {
  /** Estimated probability k/n, 0..1. */
  probability: number;
  /** Standard error sqrt(p(1 − p)/n) of the estimate, 0..0.5. */
  standard_error: number;
}

/**
 * Estimate and standard error of a probability from k successes in n independent members:
 * p = k/n, SE = sqrt(p(1 − p)/n) (the binomial standard error). For a Latin hypercube sample the same
 * formula is an upper bound to within O(1/n) (Stein 1987, Technometrics 29(2), 143–151, Theorem 1).
 * @param k successes, integer 0..n.
 * @param n members, integer ≥ 1.
 * @returns probability and standard error (0 when k is 0 or n: the estimate then says nothing of rare events).
 */
export function proportion(k: number, n: number): Proportion {
  const p = k / n;
  return { probability: p, standard_error: Math.sqrt((p * (1 - p)) / n) };
}

/**
 * Ranks of a sample, 1-based, ties given the average of the ranks they span ("fractional ranking").
 * @param values finite numbers.
 * @returns ranks in the input's order.
 */
export function averageRanks(values: ArrayLike<number>): Float64Array {
  const n = values.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a] - values[b]);
  const ranks = new Float64Array(n);
  for (let start = 0; start < n; ) {
    let end = start + 1;
    while (end < n && values[order[end]] === values[order[start]]) end++;
    const rank = 0.5 * (start + end - 1) + 1;
    for (let k = start; k < end; k++) ranks[order[k]] = rank;
    start = end;
  }
  return ranks;
}

/**
 * Pearson correlation of two equally long samples.
 * @returns r in −1..1, or null when either sample is constant (correlation undefined) or n < 2.
 */
export function pearson(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  const n = x.length;
  if (n < 2) return null;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i];
    my += y[i];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (sxx === 0 || syy === 0) return null;
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}

/**
 * Spearman's rank correlation: the Pearson correlation of the average ranks (correct with ties).
 * @param x first sample (finite numbers).
 * @param y second sample, same length.
 * @returns ρ in −1..1 (+1: y rises with x everywhere), or null when either sample is constant or n < 2.
 * Reference: C. Spearman 1904, "The proof and measurement of association between two things",
 * American Journal of Psychology 15(1), 72–101; ties by average ranks as in Kendall & Gibbons 1990,
 * Rank Correlation Methods, ch. 3.
 */
export function spearman(x: ArrayLike<number>, y: ArrayLike<number>): number | null {
  return pearson(averageRanks(x), averageRanks(y));
}
