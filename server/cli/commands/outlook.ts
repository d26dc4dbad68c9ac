/**
 * `outlook <series.csv> --site <site.json>`: an hour-by-hour mirage outlook from routine marine
 * observations (DESIGN.md §6). Prints a table, `--csv` or `--json`; `--html FILE` also writes a
 * standalone chart. A progress bar goes to stderr when the series takes more than a moment.
 */
import { readFile } from 'node:fs/promises';
import type { Command } from 'commander';
import { InputError } from '../../../sim/errors.js';
import { parseSeriesCsv } from '../../outlook/csv.js';
import { outlookHtml } from '../../outlook/html.js';
import { createProgress } from '../../outlook/progress.js';
import { outlookCsv, outlookText } from '../../outlook/render.js';
import { loadSiteFile } from '../../outlook/site.js';
import { writeFileAtomic } from '../../report/write.js';
import { computeOutlook } from '../../service/outlook.js';
import { parseInteger } from '../parse.js';
import { printResult, reportError } from '../run.js';
import { SAFETY_CAUTION } from './shared.js';

interface OutlookCliOptions {
  site: string;
  json?: boolean;
  csv?: boolean;
  html?: string;
  force?: boolean;
  skipBadRows?: boolean;
  workers: string;
  progress: boolean;
}

/** Most worker threads accepted by --workers. */
const MAX_WORKERS = 64;

/** Reads the series file's text; InputError naming the argument when it cannot be read. */
async function readSeries(path: string): Promise<string> {
  try {
    return await readFile(path, 'utf8');
  } catch (error) {
    throw new InputError('<series.csv>', `cannot read ${path}: ${(error as NodeJS.ErrnoException).code ?? (error as Error).message}`);
  }
}

export function registerOutlook(program: Command): void {
  program
    .command('outlook')
    .description('hour-by-hour mirage outlook for a site from air and sea temperature, wind, humidity and pressure')
    .argument('<series.csv>', 'CSV of observations: time,air_temperature_C,sea_temperature_C,wind_speed_m_s,relative_humidity_pct,pressure_hPa')
    .requiredOption('--site <site.json>', 'site file: observer height, instrument heights, the landmark watched')
    .option('--json', 'print one JSON object on stdout and nothing else')
    .option('--csv', 'print the rows as CSV')
    .option('--html <file>', 'also write a standalone HTML chart (works offline)')
    .option('--force', 'let --html replace an existing file')
    .option('--skip-bad-rows', 'leave out rows with bad values (listed in the output) instead of failing')
    .option('--workers <n>', 'worker threads: "auto" (all cores for long series) or a number', 'auto')
    .option('--no-progress', 'no progress bar on stderr')
    .action(async (seriesPath: string, options: OutlookCliOptions) => {
      try {
        if (options.json && options.csv) throw new InputError('--csv', 'choose one of --json and --csv');
        if (options.force && !options.html) throw new InputError('--force', 'goes with --html');
        const workers = options.workers === 'auto' ? 'auto' : parseInteger('workers', options.workers, 1, MAX_WORKERS);
        const [text, site] = await Promise.all([readSeries(seriesPath), loadSiteFile(options.site)]);
        const series = parseSeriesCsv(text);
        const progress = options.progress ? createProgress('outlook') : null;
        const result = await computeOutlook(series, site, {
          skipBadRows: options.skipBadRows ?? false,
          workers,
          onProgress: progress ? (done, total) => progress.update(done, total) : undefined,
        }).finally(() => progress?.stop());
        if (options.html) await writeFileAtomic(options.html, await outlookHtml(result, SAFETY_CAUTION), { force: options.force ?? false, option: '--html' });
        if (options.csv) process.stdout.write(outlookCsv(result));
        else printResult(Boolean(options.json), { ...result, caution: SAFETY_CAUTION }, () => outlookText(result, SAFETY_CAUTION));
      } catch (error) {
        process.exitCode = reportError(error);
      }
    });
}
