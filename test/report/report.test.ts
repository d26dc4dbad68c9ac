/**
 * The `report` command: every section and figure present, Plotly inlined, reproducibility facts
 * (package version, seed, SHA-256 of the scenario file), members as JSON and CSV, and no overwrite
 * without --force.
 */
import { createHash } from 'node:crypto';
import { readFile, rm, stat } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from '../ensemble/run-cli.js';
import { REPORT_CAUTION } from '../../server/report/sections.js';
import { DEFAULTS as TRACE_DEFAULTS } from '../../sim/trace/options.js';
import { CHEAP_REPORT_ARGS, scenarioFolder } from './fixture.js';

const VERSION = (createRequire(import.meta.url)('../../package.json') as { version: string }).version;

let dir = '';
let scenarioPath = '';
let scenarioText = '';
let html = '';
let out = '';

/** Asserts that the report contains a piece of text, without printing the 5 MB page on failure. */
function expectContains(text: string): void {
  const at = html.indexOf(text);
  expect(at >= 0, `report lacks: ${text}`).toBe(true);
}

beforeAll(async () => {
  ({ dir, path: scenarioPath, text: scenarioText } = await scenarioFolder());
  out = join(dir, 'report.html');
  const r = await runCli(['report', scenarioPath, '--out', out, '--json', ...CHEAP_REPORT_ARGS]);
  expect(r.stderr).toBe('');
  expect(r.code).toBe(0);
  html = await readFile(out, 'utf8');
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('report', () => {
  it('has every section', () => {
    for (const id of ['summary', 'inputs', 'sighting', 'figures', 'methods', 'limits', 'reproducibility']) expectContains(`<section id="${id}">`);
    expect(html.match(/the target was fully visible in [0-9.]+ % \(± [0-9.]+ %\), partly hidden in [0-9.]+ % \(± [0-9.]+ %\) and hidden in [0-9.]+ %/)).not.toBeNull();
    expectContains('<td><code>atmosphere.profile.0.temperature_C</code></td><td>°C</td><td>normal, mean 5, standard deviation 1');
  });

  it('names the methods and their sources, with the integrator tolerance', () => {
    for (const phrase of ['Ciddor 1996', 'Monin–Obukhov', 'COARE 3.5', 'Bouguer', 'Cash &amp; Karp 1990', `tolerance ${TRACE_DEFAULTS.tolerance_m.toExponential()} m`, 'Spearman']) expectContains(phrase);
  });

  it('carries the caution and the reproducibility facts', () => {
    expect(REPORT_CAUTION).toBe('Model estimate; defer to official observations, local regulations and licensed professionals.');
    expectContains(REPORT_CAUTION);
    expectContains(`loomline ${VERSION}`);
    expectContains(createHash('sha256').update(scenarioText).digest('hex'));
    expectContains('<th>seed</th><td><code>11</code>');
  });

  it('holds all seven figures and Plotly itself, with nothing to fetch', () => {
    for (const id of ['fig-air', 'fig-paths', 'fig-transfer', 'fig-view', 'fig-histograms', 'fig-sensitivity', 'fig-sighting']) expectContains(`id="${id}"`);
    expect(/<script[^>]+src=/.test(html)).toBe(false);
    expect(/<link[^>]+stylesheet/.test(html)).toBe(false);
    expectContains('Plotly');
    expect(html.length).toBeGreaterThan(3_000_000);
  });

  it('writes the members as JSON and CSV beside it', async () => {
    const json = JSON.parse(await readFile(join(dir, 'report.members.json'), 'utf8'));
    expect(json.member_rows).toHaveLength(4);
    const csv = (await readFile(join(dir, 'report.members.csv'), 'utf8')).trimEnd().split('\r\n');
    expect(csv).toHaveLength(5);
    expect(csv[0]).toContain('observer.height_m');
  });

  it('leaves the first report untouched on a second run without --force, and replaces it with --force', async () => {
    const before = await stat(out);
    const again = await runCli(['report', scenarioPath, '--out', out, ...CHEAP_REPORT_ARGS]);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/report\.html already exists: pass --force/);
    expect((await readFile(out, 'utf8')) === html).toBe(true);
    expect((await stat(out)).mtimeMs).toBe(before.mtimeMs);
    const forced = await runCli(['report', scenarioPath, '--out', out, '--force', '--seed', '12', ...CHEAP_REPORT_ARGS.filter((a, i, all) => a !== '--seed' && all[i - 1] !== '--seed')]);
    expect(forced.code).toBe(0);
    expect((await readFile(out, 'utf8')).includes('<th>seed</th><td><code>12</code>')).toBe(true);
  });
});
