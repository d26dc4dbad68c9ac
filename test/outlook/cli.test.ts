/**
 * The `outlook` command end to end, in this process: series and site files in a temporary folder,
 * stdout and stderr captured, exit codes as server/cli/run.ts defines them.
 */
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it, vi } from 'vitest';
import { main } from '../../server/cli/main.js';
import { EXIT_BAD_INPUT, EXIT_OK } from '../../server/cli/run.js';
import { SERIES_HEADER } from '../../server/outlook/csv.js';

let dir = '';
let seriesPath = '';
let badPath = '';
let sitePath = '';

/** Three invented hours at an invented pier: warm air over cold water, neutral air, cold air over warm water. */
const ROWS = ['2031-07-02T15:00Z,15,10,5,80,1013', '2031-07-02T16:00Z,9.902,10,12,95,1013', '2031-07-02T17:00Z,15,20,5,80,1013'];

const SITE = {
  name: 'Test pier (invented)',
  observer: { height_m: 5 },
  measurements: { air_temperature_height_m: 10, wind_height_m: 10 },
  landmark: { name: 'Test beacon (invented)', range_m: 20000, height_m: 30 },
};

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'loomline-outlook-'));
  seriesPath = join(dir, 'series.csv');
  badPath = join(dir, 'bad.csv');
  sitePath = join(dir, 'site.json');
  await writeFile(seriesPath, ['# invented', SERIES_HEADER, ...ROWS].join('\n'));
  await writeFile(badPath, [SERIES_HEADER, ROWS[0], '2031-07-02T16:00Z,15,10,-3,80,1013', ROWS[2]].join('\n'));
  await writeFile(sitePath, JSON.stringify(SITE));
});

afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

afterEach(() => {
  process.exitCode = undefined;
  vi.restoreAllMocks();
});

/** Runs the CLI with these arguments; returns the exit code and what went to stdout and stderr. */
async function run(...args: string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  let stdout = '';
  let stderr = '';
  vi.spyOn(process.stdout, 'write').mockImplementation((chunk: string | Uint8Array) => ((stdout += String(chunk)), true));
  vi.spyOn(process.stderr, 'write').mockImplementation((chunk: string | Uint8Array) => ((stderr += String(chunk)), true));
  const code = await main(args);
  vi.restoreAllMocks();
  process.exitCode = undefined;
  return { code, stdout, stderr };
}

describe('the outlook command', () => {
  it('prints one JSON object with the DESIGN.md §6 fields per row, looming over cold water and sinking over warm', async () => {
    const { code, stdout, stderr } = await run('outlook', seriesPath, '--site', sitePath, '--json', '--workers', '1', '--no-progress');
    expect(stderr).toBe('');
    expect(code).toBe(EXIT_OK);
    expect(stdout.trim().split('\n')).toHaveLength(1);
    const result = JSON.parse(stdout);
    expect(result.rows).toHaveLength(3);
    // DESIGN.md §6 `outlook`: the minimum fields of every row.
    for (const row of result.rows) {
      for (const key of ['time', 'stability', 'horizon_shift_arcmin', 'landmark_shift_arcmin', 'landmark_magnification', 'image_count', 'false_horizon', 'label', 'strength']) {
        expect(row).toHaveProperty(key);
      }
      expect(row.strength).toBeGreaterThanOrEqual(0);
      expect(row.strength).toBeLessThanOrEqual(1);
    }
    const [warm, neutral, cold] = result.rows;
    expect(warm.time).toBe('2031-07-02T15:00Z');
    expect(warm.line).toBe(3);
    expect(warm.landmark_shift_arcmin).toBeGreaterThan(1);
    expect(cold.landmark_shift_arcmin).toBeLessThan(-0.5);
    // Half the eye's 1′ (common practice, no source): neutral air must read as ordinary.
    expect(Math.abs(neutral.landmark_shift_arcmin)).toBeLessThan(0.5);
    expect(Math.abs(neutral.horizon_shift_arcmin)).toBeLessThan(0.5);
    expect(result.site.landmark.name).toBe('Test beacon (invented)');
    expect(result.skipped_rows).toEqual([]);
    expect(result.caution).toMatch(/Model estimate only/);
  });

  it('fails with exit code 2 on a bad row, naming its line and field, and skips it only when told', async () => {
    const failed = await run('outlook', badPath, '--site', sitePath, '--json', '--workers', '1', '--no-progress');
    expect(failed.code).toBe(EXIT_BAD_INPUT);
    expect(failed.stdout).toBe('');
    expect(failed.stderr).toMatch(/1 bad row \(lines 3\)/);
    expect(failed.stderr).toContain('line 3, wind_speed_m_s: -3 is out of range: allowed 0..40 m/s');

    const skipped = await run('outlook', badPath, '--site', sitePath, '--csv', '--skip-bad-rows', '--workers', '1', '--no-progress');
    expect(skipped.code).toBe(EXIT_OK);
    const lines = skipped.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^time,stability,horizon_shift_arcmin,landmark_shift_arcmin,landmark_magnification,image_count,false_horizon,label,strength,line,/);
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(['2031-07-02T15:00Z', '2031-07-02T17:00Z']);
  });

  it('writes a standalone chart with Plotly inlined, and refuses to overwrite it without --force', async () => {
    const html = join(dir, 'outlook.html');
    const first = await run('outlook', seriesPath, '--site', sitePath, '--html', html, '--workers', '1', '--no-progress');
    expect(first.code).toBe(EXIT_OK);
    expect(first.stdout).toMatch(/Test pier \(invented\)/);
    const page = await readFile(html, 'utf8');
    expect(page).toMatch(/^<!doctype html>/);
    expect(page).toContain('plotly.js v'); // the bundle's own banner: inlined, not fetched
    expect(page).not.toMatch(/<script[^>]+src=/);
    expect(page).toContain('"2031-07-02 15:00"');

    const again = await run('outlook', seriesPath, '--site', sitePath, '--html', html, '--workers', '1', '--no-progress');
    expect(again.code).toBe(EXIT_BAD_INPUT);
    expect(again.stderr).toMatch(/already exists.*--force/);
    const forced = await run('outlook', seriesPath, '--site', sitePath, '--html', html, '--force', '--json', '--workers', '1', '--no-progress');
    expect(forced.code).toBe(EXIT_OK);
  });

  it('rejects conflicting options and a missing site with exit code 2', async () => {
    expect((await run('outlook', seriesPath, '--site', sitePath, '--json', '--csv')).code).toBe(EXIT_BAD_INPUT);
    expect((await run('outlook', seriesPath, '--site', sitePath, '--workers', 'many')).code).toBe(EXIT_BAD_INPUT);
    expect((await run('outlook', seriesPath)).code).toBe(EXIT_BAD_INPUT);
    const missing = await run('outlook', join(dir, 'none.csv'), '--site', sitePath);
    expect(missing.code).toBe(EXIT_BAD_INPUT);
    expect(missing.stderr).toMatch(/cannot read .*none\.csv/);
  });
});
