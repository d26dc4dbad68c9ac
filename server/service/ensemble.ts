/**
 * Ensembles of a scenario file with uncertain inputs (DESIGN.md §5–6 `ensemble`): samples the
 * members, runs them on the worker pool, and summarises probabilities, percentiles and the
 * sensitivity ranking in JSON-ready form. Shared by the CLI, the HTTP server and the report.
 */
import type { MemberOptions } from '../../sim/analysis/ensemble-member.js';
import { MAX_SEED } from '../../sim/analysis/ensemble-random.js';
import { SAMPLING_METHODS, distributionPointValue, sampleInputs, type SamplingMethod } from '../../sim/analysis/ensemble-sampling.js';
import type { Percentiles } from '../../sim/analysis/ensemble-stats.js';
import { summariseEnsemble, type EnsembleSummary, type MemberFindings, type VisibilityStatus } from '../../sim/analysis/ensemble-summary.js';
import type { SightingOptions } from '../../sim/analysis/sighting.js';
import { RAD_PER_DEG } from '../../sim/constants.js';
import { InputError, InputRangeError } from '../../sim/errors.js';
import { ensembleInputs, memberFile } from '../ensemble/inputs.js';
import { runMemberTasks } from '../ensemble/pool.js';
import runMember from '../ensemble/worker.js';
import { toCsv, type CsvRow } from '../ensemble/csv.js';
import { elevationWords, hiddenHeightWords, probabilityWords, sensitivityWords, sightingWords } from '../ensemble/words.js';
import type { ScenarioFile } from '../scenario/schema.js';

/** Defaults of the ensemble options (repeated in each option's doc). */
export const ENSEMBLE_DEFAULTS = Object.freeze({
  members: 200,
  seed: 1,
  sampling: 'monte-carlo' as SamplingMethod,
});

/** Most members in one ensemble. */
export const MAX_MEMBERS = 100_000;

export interface EnsembleOptions {
  /** Members to run, 1..MAX_MEMBERS. Default 200. */
  members?: number;
  /** Seed of the generator, integer 0..2^53 − 1. Default 1. */
  seed?: number;
  /** 'monte-carlo' (default) or 'latin-hypercube'. */
  sampling?: SamplingMethod;
  /** Worker threads (0: this thread). Default: the cores Node reports. */
  workers?: number;
  /** Sighting ranges per member (a range sweep each: costly); default none. */
  sighting?: SightingOptions | null;
}

export interface EnsembleHooks {
  /** Aborting stops the run; the result then holds the finished members and says partial. */
  signal?: AbortSignal;
  /** Called after each finished member. */
  onProgress?: (finished: number, total: number) => void;
}

type Angles = Percentiles | null;

/** A member as reported: its sampled inputs (by path) and what it found. */
export interface MemberRow {
  index: number;
  inputs: Record<string, number>;
  status: VisibilityStatus | null;
  hidden_height_m: number | null;
  visible_fraction: number | null;
  image_count: number | null;
  horizon_elevation_deg: number | null;
  top_elevation_deg: number | null;
  sighting_top_m: number | null;
  sighting_light_m: number | null;
  sighting_whole_m: number | null;
  error: string | null;
}

/** Fields taken over from the sim summary as they are (members: those that finished with findings). */
type SummaryFields = Pick<EnsembleSummary, 'members' | 'failed' | 'probabilities' | 'standard_errors' | 'hidden_height_m' | 'visible_fraction' | 'sighting_range_m' | 'sensitivity_output'>;

/** The ensemble result: DESIGN.md §6's fields, then everything the report and viewer draw. */
export interface EnsembleResult extends SummaryFields {
  scenario: string;
  /** Most influential first: input path, plain label, |ρ| and ρ. */
  sensitivity: { input: string; label: string; score: number; rho: number | null }[];
  requested_members: number;
  /** True when cancelled before every member finished: the statistics cover the finished ones. */
  partial: boolean;
  seed: number;
  sampling: SamplingMethod;
  workers: number;
  horizon_elevation_deg: Angles;
  top_elevation_deg: Angles;
  sensitivity_method: string;
  inputs: { path: string; label: string; unit: string; distribution: unknown }[];
  /** The single run with every input at its point value (mean, midpoint, first choice). */
  point: MemberRow;
  summary: string[];
  member_rows: MemberRow[];
  warnings: string[];
}

export const SENSITIVITY_METHOD =
  "Spearman rank correlation between each input's sampled values and the hidden fraction of the target (1 − visible fraction) over the finished runs " +
  '(the apparent elevation of the target top when the hidden fraction never changes); the score is its magnitude, 0..1. ' +
  'It measures monotone influence one input at a time; it is not a variance-based (Sobol) index.';

/** Validates the options and fills defaults (InputRangeError / InputError naming the option). */
export function resolveEnsembleOptions(options: EnsembleOptions): Required<Omit<EnsembleOptions, 'workers'>> & { workers: number | undefined } {
  const members = options.members ?? ENSEMBLE_DEFAULTS.members;
  if (!Number.isInteger(members) || members < 1 || members > MAX_MEMBERS) throw new InputRangeError('members', members, `integers 1..${MAX_MEMBERS}`);
  const seed = options.seed ?? ENSEMBLE_DEFAULTS.seed;
  if (!Number.isInteger(seed) || seed < 0 || seed > MAX_SEED) throw new InputRangeError('seed', seed, `integers 0..${MAX_SEED}`);
  const sampling = options.sampling ?? ENSEMBLE_DEFAULTS.sampling;
  if (!SAMPLING_METHODS.includes(sampling)) throw new InputError('sampling', `"${String(sampling)}" is not one of ${SAMPLING_METHODS.join(', ')}`);
  return { members, seed, sampling, workers: options.workers, sighting: options.sighting ?? null };
}

const deg = (rad: number | null | undefined) => (rad === null || rad === undefined ? null : rad / RAD_PER_DEG);
const degPercentiles = (p: Percentiles | null): Angles => (p ? { p5: p.p5 / RAD_PER_DEG, p50: p.p50 / RAD_PER_DEG, p95: p.p95 / RAD_PER_DEG } : null);

function memberRow(index: number, inputs: Record<string, number>, findings: MemberFindings | null, error: string | null): MemberRow {
  return {
    index,
    inputs,
    status: findings?.status ?? null,
    hidden_height_m: findings?.hidden_height_m ?? null,
    visible_fraction: findings?.visible_fraction ?? null,
    image_count: findings?.image_count ?? null,
    horizon_elevation_deg: deg(findings?.horizon_elevation_rad),
    top_elevation_deg: deg(findings?.top_elevation_rad),
    sighting_top_m: findings?.sighting?.top_m ?? null,
    sighting_light_m: findings?.sighting?.light_m ?? null,
    sighting_whole_m: findings?.sighting?.whole_m ?? null,
    error,
  };
}

/**
 * Runs an ensemble of a validated scenario file.
 * @param file the scenario file (distributions allowed anywhere DESIGN.md §5 allows numbers).
 * @param options see EnsembleOptions / ENSEMBLE_DEFAULTS.
 * @param hooks cancellation and progress.
 * @returns the result; `partial` when cancelled. Same file, options and seed → identical numbers.
 * @throws InputRangeError / InputError for bad options; ScenarioError when the point scenario is invalid.
 */
export async function runEnsemble(file: ScenarioFile, options: EnsembleOptions = {}, hooks: EnsembleHooks = {}): Promise<EnsembleResult> {
  const settings = resolveEnsembleOptions(options);
  const memberOptions: MemberOptions = { sighting: settings.sighting };
  const point = runMember({ index: -1, file, options: memberOptions });
  const inputs = ensembleInputs(file);
  const values = sampleInputs(inputs.map((i) => i.distribution), settings.members, settings.seed, settings.sampling);
  const tasks = values.map((v, index) => ({ index, file: memberFile(file, inputs, v), options: memberOptions }));
  const run = await runMemberTasks(tasks, {
    workers: settings.workers,
    signal: hooks.signal,
    onResult: (_, finished) => hooks.onProgress?.(finished, tasks.length),
  });
  const finished = run.results.flatMap((r, i) => (r ? [{ values: values[i], result: r }] : []));
  const summary = summariseEnsemble(
    finished.map((m) => ({ values: m.values, findings: m.result.findings })),
    inputs.length,
  );
  const byPath = (v: readonly number[]) => Object.fromEntries(inputs.map((input, j) => [input.path, v[j]]));
  const rows = finished.map((m) => memberRow(m.result.index, byPath(m.values), m.result.findings, m.result.error));
  const sensitivity = summary.sensitivity.map((s) => ({ input: inputs[s.input].path, label: inputs[s.input].label, score: s.score, rho: s.rho }));
  const method = settings.sampling === 'monte-carlo' ? 'Monte Carlo' : 'Latin hypercube';
  const warnings = ensembleWarnings(inputs.length, run.cancelled, finished.length, tasks.length, summary.failed, rows, point.error === null ? point.warnings : [...point.warnings, `the single run with every input at its central value failed: ${point.error}`]);
  return {
    scenario: file.name,
    members: summary.members,
    probabilities: summary.probabilities,
    standard_errors: summary.standard_errors,
    hidden_height_m: summary.hidden_height_m,
    sensitivity,
    requested_members: settings.members,
    failed: summary.failed,
    partial: run.cancelled,
    seed: settings.seed,
    sampling: settings.sampling,
    workers: run.workers,
    visible_fraction: summary.visible_fraction,
    horizon_elevation_deg: degPercentiles(summary.horizon_elevation_rad),
    top_elevation_deg: degPercentiles(summary.top_elevation_rad),
    sighting_range_m: summary.sighting_range_m,
    sensitivity_method: SENSITIVITY_METHOD,
    sensitivity_output: summary.sensitivity_output,
    inputs: inputs.map((i) => ({ path: i.path, label: i.label, unit: i.unit, distribution: i.file_distribution })),
    point: memberRow(-1, byPath(inputs.map((i) => distributionPointValue(i.distribution))), point.findings, point.error),
    summary: [
      probabilityWords(summary.members, method, settings.seed, summary.probabilities, summary.standard_errors),
      hiddenHeightWords(summary.hidden_height_m),
      elevationWords(degPercentiles(summary.horizon_elevation_rad), degPercentiles(summary.top_elevation_rad), rows.filter((r) => r.top_elevation_deg !== null).length, summary.members),
      sightingWords(summary.sighting_range_m),
      ...sensitivityWords(sensitivity, summary.sensitivity_output),
    ].filter((line) => line !== ''),
    member_rows: rows,
    warnings,
  };
}

function ensembleWarnings(inputCount: number, cancelled: boolean, finished: number, total: number, failed: number, rows: readonly MemberRow[], pointWarnings: readonly string[]): string[] {
  const warnings = [...pointWarnings];
  if (inputCount === 0) warnings.push('the scenario has no uncertain inputs: every member is the same single run');
  if (cancelled) warnings.push(`partial: cancelled after ${finished} of ${total} members; the statistics cover the finished ones`);
  if (failed > 0) {
    const first = rows.find((r) => r.error !== null);
    warnings.push(`${failed} member${failed === 1 ? '' : 's'} failed and ${failed === 1 ? 'is' : 'are'} left out of the statistics (first: ${first?.error ?? 'unknown'})`);
  }
  return warnings;
}

/** CSV of the members: index, findings, one column per input (by path), error. */
export function membersCsv(result: EnsembleResult): string {
  const findings = ['index', 'status', 'hidden_height_m', 'visible_fraction', 'image_count', 'horizon_elevation_deg', 'top_elevation_deg', 'sighting_top_m', 'sighting_light_m', 'sighting_whole_m'];
  const inputColumns = result.inputs.map((i) => i.path);
  const rows: CsvRow[] = result.member_rows.map((r) => {
    const { inputs, ...rest } = r;
    return { ...rest, ...inputs };
  });
  return toCsv([...findings, ...inputColumns, 'error'], rows);
}
