/**
 * `ensemble <scenario> --members N --seed S`: probabilities that the target is visible, partly
 * hidden or hidden, with standard errors, percentiles and the inputs that mattered most
 * (DESIGN.md §6). Ctrl-C stops the workers and prints what finished, labelled partial (exit 130).
 */
import type { Command } from 'commander';
import { MAX_SEED } from '../../../sim/analysis/ensemble-random.js';
import { InputError } from '../../../sim/errors.js';
import { EXIT_INTERRUPTED, withInterrupt } from '../../ensemble/interrupt.js';
import { MAX_WORKERS } from '../../ensemble/pool.js';
import { startProgressBar } from '../../ensemble/progress.js';
import { writeFileAtomic } from '../../report/write.js';
import { ENSEMBLE_DEFAULTS, MAX_MEMBERS, membersCsv, runEnsemble, type EnsembleResult } from '../../service/ensemble.js';
import { parseInteger } from '../parse.js';
import { renderPairs, renderTable } from '../table.js';
import { SAFETY_CAUTION, scenarioCommand, type CommonOptions } from './shared.js';
import { parseSightingOptions, sightingOptionFlags, type SightingFlags } from './sighting-options.js';

interface EnsembleCliOptions extends CommonOptions, SightingFlags {
  members: string;
  seed: string;
  sampling: string;
  workers?: string;
  csv?: string;
  saveJson?: string;
  force?: boolean;
  progress: boolean;
}

/** Options shared by `ensemble` and `report`: members, seed, sampling, workers, progress. */
export function ensembleOptionFlags(cmd: Command): Command {
  return cmd
    .option('--members <n>', `members (runs) in the ensemble, 1..${MAX_MEMBERS}`, String(ENSEMBLE_DEFAULTS.members))
    .option('--seed <s>', `seed of the random generator, 0..${MAX_SEED}; the same seed gives the same numbers`, String(ENSEMBLE_DEFAULTS.seed))
    .option('--sampling <method>', 'monte-carlo or latin-hypercube', ENSEMBLE_DEFAULTS.sampling)
    .option('--workers <n>', `worker threads, 0..${MAX_WORKERS} (0: no pool; default: one per core)`)
    .option('--no-progress', 'no progress bar on stderr');
}

/** Parses the shared ensemble flags (errors name the option). */
export function parseEnsembleFlags(options: { members: string; seed: string; sampling: string; workers?: string }) {
  const sampling = options.sampling;
  if (sampling !== 'monte-carlo' && sampling !== 'latin-hypercube') throw new InputError('--sampling', `"${sampling}" is not one of monte-carlo, latin-hypercube`);
  return {
    members: parseInteger('members', options.members, 1, MAX_MEMBERS),
    seed: parseInteger('seed', options.seed, 0, MAX_SEED),
    sampling: sampling as 'monte-carlo' | 'latin-hypercube',
    workers: options.workers === undefined ? undefined : parseInteger('workers', options.workers, 0, MAX_WORKERS),
  };
}

/** Runs an ensemble with a progress bar and Ctrl-C handling; sets exit code 130 when interrupted. */
export async function runWithProgress(run: (hooks: { signal: AbortSignal; onProgress: (finished: number, total: number) => void }) => Promise<EnsembleResult>, label: string, total: number, progress: boolean): Promise<EnsembleResult> {
  const bar = progress ? startProgressBar(total, label) : null;
  try {
    const { value, interrupted } = await withInterrupt(
      (signal) => run({ signal, onProgress: (finished) => bar?.update(finished) }),
      () => process.stderr.write('\nloomline: stopping (Ctrl-C again to quit at once); finished runs are kept\n'),
    );
    if (interrupted) process.exitCode = EXIT_INTERRUPTED;
    return value;
  } finally {
    bar?.stop();
  }
}

const pct = (p: number) => `${(100 * p).toFixed(1)} %`;
const band = (p: { p5: number; p50: number; p95: number } | null, digits: number) => (p ? `${p.p50.toFixed(digits)} (5–95 %: ${p.p5.toFixed(digits)} … ${p.p95.toFixed(digits)})` : '—');

/** The readable rendering of an ensemble result. */
export function ensembleText(r: EnsembleResult): string {
  return [
    `${r.scenario} — ensemble of ${r.members} runs${r.partial ? ' (PARTIAL: cancelled)' : ''}`,
    '',
    ...r.summary,
    '',
    renderTable(
      [
        { outcome: 'fully visible', p: r.probabilities.visible, se: r.standard_errors.visible },
        { outcome: 'partly hidden', p: r.probabilities.partly_hidden, se: r.standard_errors.partly_hidden },
        { outcome: 'hidden', p: r.probabilities.hidden, se: r.standard_errors.hidden },
      ],
      [
        { header: 'outcome', value: (x) => x.outcome },
        { header: 'probability', value: (x) => pct(x.p) },
        { header: 'std error', value: (x) => pct(x.se) },
      ],
    ),
    '',
    renderPairs([
      ['hidden height m', band(r.hidden_height_m, 2)],
      ['horizon elevation °', band(r.horizon_elevation_deg, 4)],
      ['target top elevation °', band(r.top_elevation_deg, 4)],
      ...(r.sighting_range_m
        ? ([
            ['top first seen km', band(r.sighting_range_m.top && { p5: r.sighting_range_m.top.p5 / 1000, p50: r.sighting_range_m.top.p50 / 1000, p95: r.sighting_range_m.top.p95 / 1000 }, 2)],
            ['whole first seen km', band(r.sighting_range_m.whole && { p5: r.sighting_range_m.whole.p5 / 1000, p50: r.sighting_range_m.whole.p50 / 1000, p95: r.sighting_range_m.whole.p95 / 1000 }, 2)],
          ] as [string, string][])
        : []),
      ['seed / sampling', `${r.seed} / ${r.sampling}`],
      ['failed runs', r.failed],
    ]),
    '',
    renderTable(r.sensitivity, [
      { header: 'input', value: (s) => s.label },
      { header: 'field', value: (s) => s.input },
      { header: '|ρ|', value: (s) => s.score, decimals: 3 },
      { header: 'ρ', value: (s) => s.rho, decimals: 3 },
    ]),
    ...r.warnings.map((w) => `warning: ${w}`),
    '',
    SAFETY_CAUTION,
  ].join('\n');
}

/** Registers `ensemble <scenario>` (DESIGN.md §6) on the program. */
export function registerEnsemble(program: Command): void {
  scenarioCommand<EnsembleCliOptions>(
    program,
    'ensemble',
    'probabilities that the target is visible, partly hidden or hidden over the uncertain inputs',
    (cmd) =>
      sightingOptionFlags(ensembleOptionFlags(cmd))
        .option('--csv <file>', 'also write the members as CSV')
        .option('--save-json <file>', 'also write the full result (with every member) as JSON')
        .option('--force', 'overwrite the --csv / --save-json files if they exist'),
    async (_scenario, options, file) => {
      const flags = parseEnsembleFlags(options);
      const sighting = parseSightingOptions(options, _scenario);
      const result = await runWithProgress((hooks) => runEnsemble(file, { ...flags, sighting }, hooks), 'ensemble', flags.members, options.progress);
      if (options.csv) await writeFileAtomic(options.csv, membersCsv(result), { force: options.force, option: '--csv' });
      if (options.saveJson) await writeFileAtomic(options.saveJson, JSON.stringify(result, null, 1) + '\n', { force: options.force, option: '--save-json' });
      return { result, text: () => ensembleText(result) };
    },
  );
}
