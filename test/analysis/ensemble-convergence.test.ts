/**
 * Convergence of ensemble probabilities: over many independent seeds, the spread of the estimated
 * probability falls as 1/sqrt(N) and matches the binomial standard error the summary reports.
 * The member outcome here is an exact indicator (range beyond a fixed threshold), so the only
 * error is sampling error.
 */
import { describe, expect, it } from 'vitest';
import { sampleInputs, type SamplingMethod } from '../../sim/analysis/ensemble-sampling.js';
import { summariseEnsemble, type MemberRecord } from '../../sim/analysis/ensemble-summary.js';

/** Uniform range 15..25 km; "hidden" beyond 19.27 km: exact probability (25 − 19.27)/10 = 0.573. */
const RANGE = { kind: 'uniform', min: 15_000, max: 25_000 } as const;
const THRESHOLD_M = 19_270;
const P_EXACT = (RANGE.max - THRESHOLD_M) / (RANGE.max - RANGE.min);
const REPLICATES = 300;

function record(range_m: number): MemberRecord {
  const hidden = range_m > THRESHOLD_M;
  return {
    values: [range_m],
    findings: { status: hidden ? 'hidden' : 'partly-hidden', hidden_height_m: hidden ? 5 : 1, visible_fraction: hidden ? 0 : 0.8, image_count: hidden ? 0 : 1, horizon_elevation_rad: -0.001, top_elevation_rad: null },
  };
}

/** Estimates of P(hidden) and their reported standard errors over independent seeds. */
function replicate(n: number, method: SamplingMethod): { spread: number; meanSe: number; mean: number } {
  const estimates: number[] = [];
  const ses: number[] = [];
  for (let seed = 0; seed < REPLICATES; seed++) {
    const s = summariseEnsemble(sampleInputs([RANGE], n, 1000 * n + seed, method).map((v) => record(v[0])), 1);
    estimates.push(s.probabilities.hidden);
    ses.push(s.standard_errors.hidden);
  }
  const mean = estimates.reduce((a, b) => a + b, 0) / REPLICATES;
  const spread = Math.sqrt(estimates.reduce((a, b) => a + (b - mean) ** 2, 0) / (REPLICATES - 1));
  return { spread, meanSe: ses.reduce((a, b) => a + b, 0) / REPLICATES, mean };
}

describe('ensemble probabilities', () => {
  it('have a spread over seeds that falls as 1/sqrt(N) and equals the reported standard error', () => {
    const small = replicate(25, 'monte-carlo');
    const large = replicate(100, 'monte-carlo');
    // Binomial: sd(p̂) = sqrt(p(1 − p)/N) (any statistics text). With 300 replicates the sample sd
    // has a relative standard error of about 1/sqrt(2·299) ≈ 4 %; 15 % is more than three of them.
    const SPREAD_REL = 0.15;
    const want = (n: number) => Math.sqrt((P_EXACT * (1 - P_EXACT)) / n);
    expect(Math.abs(small.spread / want(25) - 1)).toBeLessThan(SPREAD_REL);
    expect(Math.abs(large.spread / want(100) - 1)).toBeLessThan(SPREAD_REL);
    // Quadrupling N halves the spread: ratio 2 within the combined relative error (≈ 6 %; allow 20 %).
    const RATIO_REL = 0.2;
    expect(Math.abs(small.spread / large.spread / 2 - 1)).toBeLessThan(RATIO_REL);
    // The reported standard error agrees with the observed spread on average.
    expect(Math.abs(large.meanSe / large.spread - 1)).toBeLessThan(SPREAD_REL);
    // And the estimates centre on the exact probability: standard error of the mean of 300 estimates
    // at N = 100 is want(100)/sqrt(300) ≈ 0.0029; four of them.
    expect(Math.abs(large.mean - P_EXACT)).toBeLessThan(4 * want(100) / Math.sqrt(REPLICATES));
  });

  it('spread less with a Latin hypercube than with Monte Carlo for a one-input outcome', () => {
    // With one input every stratum but the one holding the threshold is wholly on one side of it, so
    // p̂ takes one of two neighbouring values k/N, (k + 1)/N and sd(p̂) ≤ 1/(2N) (derivation from the
    // construction; McKay, Beckman & Conover 1979 show the variance is never larger for monotone outputs).
    const lhs = replicate(100, 'latin-hypercube');
    expect(lhs.spread).toBeLessThanOrEqual(1 / (2 * 100));
    expect(lhs.spread).toBeLessThan(replicate(100, 'monte-carlo').spread / 5);
  });
});
