/**
 * Summary of an ensemble: probabilities of each visibility status with standard errors,
 * percentiles of the findings, and a ranking of the inputs by Spearman rank correlation with the
 * hidden fraction of the target, 1 − visible_fraction (or, when that never changes, with the
 * target top's apparent elevation). The fraction rather than the hidden height in metres, so that
 * a taller target does not count as "more hidden" merely because more metres of it are lost.
 */
import { percentiles, proportion, spearman, type Percentiles } from './ensemble-stats.js';
import type { VisibilityStatus } from './visibility.js';

export type { VisibilityStatus };

/** What one finished member found. Angles in rad, heights and ranges in m. */
export interface MemberFindings {
  status: VisibilityStatus;
  /** Height at the target range below which nothing is seen, m. */
  hidden_height_m: number;
  /** Fraction 0..1 of the target's height seen at least once. */
  visible_fraction: number;
  image_count: number;
  /** Apparent elevation of the sea horizon, rad (negative below the horizontal). */
  horizon_elevation_rad: number;
  /** Apparent elevation of the target's top (its highest image), rad; null when the top is not seen. */
  top_elevation_rad: number | null;
  /** Sighting ranges (see sighting.ts), m; null when not asked for or never visible. */
  sighting?: { top_m: number | null; light_m: number | null; whole_m: number | null };
}

/** The sensitivity of the output to one input. */
export interface Sensitivity {
  /** Which input (its index in the input list). */
  input: number;
  /** |ρ|, Spearman's rank correlation magnitude, 0..1 (0 for an input that did not vary). */
  score: number;
  /** Signed ρ: positive when the output rises with the input; null when undefined. */
  rho: number | null;
}

/** Per-member record the summary reads: its input values and its findings (null when it failed). */
export interface MemberRecord {
  values: readonly number[];
  findings: MemberFindings | null;
}

export interface EnsembleSummary {
  /** Members that finished with findings. */
  members: number;
  /** Members that failed (bad sampled input or a numerical failure). */
  failed: number;
  probabilities: { visible: number; partly_hidden: number; hidden: number };
  standard_errors: { visible: number; partly_hidden: number; hidden: number };
  hidden_height_m: Percentiles | null;
  visible_fraction: Percentiles | null;
  horizon_elevation_rad: Percentiles | null;
  /** Over the members that see the top. */
  top_elevation_rad: Percentiles | null;
  sighting_range_m: { top: Percentiles | null; light: Percentiles | null; whole: Percentiles | null } | null;
  /** What the sensitivity ranking correlates the inputs with; null when nothing varied. */
  sensitivity_output: 'hidden_fraction' | 'top_elevation_rad' | null;
  /** Most influential first. */
  sensitivity: Sensitivity[];
}

const NO_PROBABILITIES = { visible: 0, partly_hidden: 0, hidden: 0 };

/**
 * Summarises the members of an ensemble.
 * @param records every member (failed ones with findings null), in member order.
 * @param inputCount number of uncertain inputs (length of each record's values).
 * @returns probabilities (k/n over finished members) with binomial standard errors, 5/50/95th
 *   percentiles (Hyndman & Fan type 7), and the Spearman sensitivity ranking (ties by input order).
 * Validity: probabilities are of the modelled outcome under the stated input distributions; they do
 * not include model error. With no finished member the probabilities are 0 and percentiles null.
 */
export function summariseEnsemble(records: readonly MemberRecord[], inputCount: number): EnsembleSummary {
  const done = records.filter((r): r is MemberRecord & { findings: MemberFindings } => r.findings !== null);
  const n = done.length;
  const count = (status: VisibilityStatus) => done.filter((r) => r.findings.status === status).length;
  const [visible, partly, hidden] = n === 0 ? [null, null, null] : [proportion(count('visible'), n), proportion(count('partly-hidden'), n), proportion(count('hidden'), n)];
  const f = done.map((r) => r.findings);
  const hasSighting = f.some((x) => x.sighting !== undefined);
  const { output, sensitivity } = rankInputs(done, inputCount);
  return {
    members: n,
    failed: records.length - n,
    probabilities: visible && partly && hidden ? { visible: visible.probability, partly_hidden: partly.probability, hidden: hidden.probability } : { ...NO_PROBABILITIES },
    standard_errors: visible && partly && hidden ? { visible: visible.standard_error, partly_hidden: partly.standard_error, hidden: hidden.standard_error } : { ...NO_PROBABILITIES },
    hidden_height_m: percentiles(f.map((x) => x.hidden_height_m)),
    visible_fraction: percentiles(f.map((x) => x.visible_fraction)),
    horizon_elevation_rad: percentiles(f.map((x) => x.horizon_elevation_rad)),
    top_elevation_rad: percentiles(f.map((x) => x.top_elevation_rad)),
    sighting_range_m: hasSighting
      ? {
          top: percentiles(f.map((x) => x.sighting?.top_m ?? null)),
          light: percentiles(f.map((x) => x.sighting?.light_m ?? null)),
          whole: percentiles(f.map((x) => x.sighting?.whole_m ?? null)),
        }
      : null,
    sensitivity_output: output,
    sensitivity,
  };
}

/**
 * Ranks the inputs by |Spearman ρ| with the hidden fraction (1 − visible_fraction); when that is
 * the same in every member, with the top's apparent elevation (over members that see it). Undefined
 * correlations (an input or the output constant) score 0.
 */
function rankInputs(done: readonly { values: readonly number[]; findings: MemberFindings }[], inputCount: number): { output: EnsembleSummary['sensitivity_output']; sensitivity: Sensitivity[] } {
  const byHidden = done.map((r) => 1 - r.findings.visible_fraction);
  const seeTop = done.filter((r) => r.findings.top_elevation_rad !== null);
  const candidates: { output: 'hidden_fraction' | 'top_elevation_rad'; rows: typeof done; y: number[] }[] = [
    { output: 'hidden_fraction', rows: done, y: byHidden },
    { output: 'top_elevation_rad', rows: seeTop, y: seeTop.map((r) => r.findings.top_elevation_rad as number) },
  ];
  const chosen = candidates.find((c) => c.y.length >= 2 && c.y.some((v) => v !== c.y[0])) ?? null;
  const sensitivity = Array.from({ length: inputCount }, (_, j) => {
    const rho = chosen ? spearman(chosen.rows.map((r) => r.values[j]), chosen.y) : null;
    return { input: j, score: rho === null ? 0 : Math.abs(rho), rho };
  });
  sensitivity.sort((a, b) => b.score - a.score || a.input - b.input);
  return { output: chosen ? chosen.output : null, sensitivity };
}
