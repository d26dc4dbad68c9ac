/**
 * Sampling uncertain inputs for an ensemble: a matrix of uniform numbers (plain Monte Carlo or
 * Latin hypercube), turned into input values through each distribution's quantile function.
 */
import { normalCdf, normalQuantile } from './ensemble-normal.js';
import { Xoshiro128 } from './ensemble-random.js';

/**
 * One uncertain input. Values are in the input's own unit (whatever the caller uses).
 * - normal: mean and standard deviation, optionally truncated to [min, max] (the field's allowed
 *   range), so that no member leaves it; sd = 0 gives the mean.
 * - uniform: equally likely anywhere in [min, max]; min = max gives that value.
 * - choice: each listed value equally likely.
 */
export type InputDistribution =
  | { kind: 'normal'; mean: number; sd: number; min?: number; max?: number }
  | { kind: 'uniform'; min: number; max: number }
  | { kind: 'choice'; values: readonly number[] };

/** How the uniform numbers are laid out. */
export type SamplingMethod = 'monte-carlo' | 'latin-hypercube';

export const SAMPLING_METHODS: readonly SamplingMethod[] = ['monte-carlo', 'latin-hypercube'];

/**
 * The value of a distribution at cumulative probability u (its quantile function).
 * @param dist the distribution; parameters not checked here (kernel), callers validate.
 * @param u probability strictly inside (0, 1).
 * @returns the input value, in the distribution's unit; within [min, max] when those are given.
 * Accuracy: that of normalQuantile / normalCdf (about 1e-15 relative). A truncated normal uses
 * x = mean + sd·Φ⁻¹(Φ(a) + u·(Φ(b) − Φ(a))) with a, b the standardised bounds (inversion of the
 * truncated distribution; e.g. Devroye 1986, Non-Uniform Random Variate Generation, §II.2).
 */
export function distributionQuantile(dist: InputDistribution, u: number): number {
  switch (dist.kind) {
    case 'uniform':
      return dist.min + u * (dist.max - dist.min);
    case 'choice':
      return dist.values[Math.min(dist.values.length - 1, Math.floor(u * dist.values.length))];
    case 'normal': {
      if (dist.sd === 0) return dist.mean;
      const lo = dist.min === undefined ? 0 : normalCdf((dist.min - dist.mean) / dist.sd);
      const hi = dist.max === undefined ? 1 : normalCdf((dist.max - dist.mean) / dist.sd);
      const x = dist.mean + dist.sd * normalQuantile(lo + u * (hi - lo));
      // Clamp rounding at the bounds (and ±Infinity when lo + u·(hi − lo) rounds to 0 or 1).
      return Math.min(dist.max ?? Infinity, Math.max(dist.min ?? -Infinity, x));
    }
  }
}

/**
 * The value a single run uses: the mean, the midpoint, or the first choice (DESIGN.md §5).
 * @param dist the distribution.
 * @returns the point value, in the distribution's unit.
 */
export function distributionPointValue(dist: InputDistribution): number {
  if (dist.kind === 'normal') return dist.mean;
  if (dist.kind === 'uniform') return 0.5 * (dist.min + dist.max);
  return dist.values[0];
}

/**
 * A matrix of uniform numbers in (0, 1), row-major: u[i·dims + j] is member i's number for input j.
 *
 * - 'monte-carlo': independent draws in row order, so the first k rows do not depend on the count.
 * - 'latin-hypercube': for each input, the unit interval is cut into `count` equal strata and each
 *   stratum is used exactly once, u = (π(i) + v)/count with π a random permutation (Fisher–Yates)
 *   and v uniform in (0, 1). Every one-dimensional margin is then evenly covered, which lowers the
 *   variance of means of outputs that depend mostly on one input at a time.
 *
 * @param count members, integer ≥ 1.
 * @param dims uncertain inputs, integer ≥ 0.
 * @param seed integer 0..MAX_SEED; the same (count, dims, seed, method) give the same matrix everywhere.
 * @param method sampling method.
 * @returns Float64Array of length count·dims.
 * Reference: McKay, Beckman & Conover 1979, "A comparison of three methods for selecting values of
 * input variables in the analysis of output from a computer code", Technometrics 21(2), 239–245;
 * Fisher–Yates shuffle as in Knuth, TAOCP vol. 2, §3.4.2, Algorithm P.
 */
export function unitSampleMatrix(count: number, dims: number, seed: number, method: SamplingMethod): Float64Array {
  const rng = new Xoshiro128(seed);
  const u = new Float64Array(count * dims);
  if (method === 'monte-carlo') {
    for (let k = 0; k < u.length; k++) u[k] = rng.nextOpen01();
    return u;
  }
  const perm = new Int32Array(count);
  for (let j = 0; j < dims; j++) {
    for (let i = 0; i < count; i++) perm[i] = i;
    for (let i = count - 1; i > 0; i--) {
      const k = Math.floor(rng.nextOpen01() * (i + 1));
      const t = perm[i];
      perm[i] = perm[k];
      perm[k] = t;
    }
    for (let i = 0; i < count; i++) u[i * dims + j] = (perm[i] + rng.nextOpen01()) / count;
  }
  return u;
}

/**
 * Samples every input for every member.
 * @param dists the uncertain inputs.
 * @param count members, integer ≥ 1.
 * @param seed integer 0..MAX_SEED.
 * @param method sampling method.
 * @returns values[i][j]: member i's value of input j, in the input's unit.
 */
export function sampleInputs(dists: readonly InputDistribution[], count: number, seed: number, method: SamplingMethod): number[][] {
  const dims = dists.length;
  const u = unitSampleMatrix(count, dims, seed, method);
  return Array.from({ length: count }, (_, i) => dists.map((d, j) => distributionQuantile(d, u[i * dims + j])));
}
