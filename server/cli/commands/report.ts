/**
 * `report <scenario> --out report.html`: one self-contained HTML report (Plotly inlined, works
 * offline) with the ensemble, the single-run figures and the sighting range, plus the members as
 * `<out>.members.json` and `<out>.members.csv`. Files are written atomically; existing ones are
 * kept unless --force (checked before the run, and again when writing).
 */
import { access, readFile } from 'node:fs/promises';
import type { Command } from 'commander';
import { OutputExistsError, writeFileAtomic } from '../../report/write.js';
import { buildReport } from '../../report/build.js';
import { scenarioFromText } from '../../scenario/load.js';
import { ScenarioError } from '../../scenario/errors.js';
import { membersCsv } from '../../service/ensemble.js';
import { printResult, reportError } from '../run.js';
import { ensembleOptionFlags, parseEnsembleFlags, runWithProgress } from './ensemble.js';
import { parseSightingOptions, sightingOptionFlags, type SightingFlags } from './sighting-options.js';

interface ReportCliOptions extends SightingFlags {
  out: string;
  force?: boolean;
  json?: boolean;
  members: string;
  seed: string;
  sampling: string;
  workers?: string;
  progress: boolean;
}

/** The three files a report writes, from the --out name. */
export function reportPaths(out: string): { html: string; json: string; csv: string } {
  const base = out.replace(/\.html?$/i, '');
  return { html: out, json: `${base}.members.json`, csv: `${base}.members.csv` };
}

async function exists(path: string): Promise<boolean> {
  return access(path).then(
    () => true,
    () => false,
  );
}

/** Registers `report <scenario> --out <file>` on the program. */
export function registerReport(program: Command): void {
  const cmd = program
    .command('report')
    .description('write a self-contained HTML incident report (ensemble, figures, methods, cautions) and the members as JSON and CSV')
    .argument('<scenario>', 'scenario JSON file')
    .requiredOption('--out <file>', 'the HTML file to write (members go beside it as .members.json and .members.csv)')
    .option('--force', 'overwrite existing output files')
    .option('--json', 'print a JSON summary (paths and probabilities) instead of text');
  sightingOptionFlags(ensembleOptionFlags(cmd));
  cmd.action(async (path: string, options: ReportCliOptions) => {
    try {
      const paths = reportPaths(options.out);
      if (!options.force) {
        for (const [option, p] of [['--out', paths.html], ['--out', paths.json], ['--out', paths.csv]] as const) if (await exists(p)) throw new OutputExistsError(option, p);
      }
      let text: string;
      try {
        text = await readFile(path, 'utf8');
      } catch (error) {
        throw new ScenarioError('', `cannot read scenario file ${path}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
      }
      const { file, scenario } = scenarioFromText(text, path);
      const flags = parseEnsembleFlags(options);
      const sighting = parseSightingOptions(options, scenario, true)!;
      const perMember = options.sighting ? sighting : null;
      const command = ['loomline report', path, `--out ${options.out}`, `--members ${flags.members}`, `--seed ${flags.seed}`, `--sampling ${flags.sampling}`, ...(options.sighting ? ['--sighting'] : [])].join(' ');
      let output: Awaited<ReturnType<typeof buildReport>> | null = null;
      await runWithProgress(
        async (hooks) => {
          output = await buildReport({ scenarioText: text, scenarioPath: path, file, scenario, ensemble: { ...flags, sighting: perMember }, sighting, command, generated_at: new Date().toISOString() }, hooks);
          return output.ensemble;
        },
        'report',
        flags.members,
        options.progress,
      );
      const done = output as unknown as Awaited<ReturnType<typeof buildReport>>;
      await writeFileAtomic(paths.json, JSON.stringify(done.ensemble, null, 1) + '\n', { force: options.force });
      await writeFileAtomic(paths.csv, membersCsv(done.ensemble), { force: options.force });
      await writeFileAtomic(paths.html, done.html, { force: options.force });
      const result = { report: paths.html, members_json: paths.json, members_csv: paths.csv, members: done.ensemble.members, partial: done.ensemble.partial, probabilities: done.ensemble.probabilities, standard_errors: done.ensemble.standard_errors, figures: done.figures };
      printResult(Boolean(options.json), result, () =>
        [`wrote ${paths.html} (${(done.html.length / 1e6).toFixed(1)} MB, ${done.figures.length} figures)`, `wrote ${paths.json}`, `wrote ${paths.csv}`, ...done.ensemble.summary].join('\n'),
      );
    } catch (error) {
      process.exitCode = reportError(error);
    }
  });
}
