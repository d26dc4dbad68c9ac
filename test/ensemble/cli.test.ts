/**
 * The `ensemble` command: JSON contract fields (DESIGN.md §6), member files, exit codes, and Ctrl-C
 * in a real process (stops the workers, prints the finished members labelled partial, exit 130).
 */
import { spawn } from 'node:child_process';
import { mkdtemp, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { runCli } from './run-cli.js';

let dir = '';
let scenarioPath = '';
const SCENARIO = {
  name: 'CLI ensemble test (invented)',
  observer: { height_m: { normal: { mean: 10, sd: 1 } } },
  target: { range_m: { uniform: { min: 15000, max: 25000 } }, height_m: 5 },
  atmosphere: { profile: [{ height_m: 0, temperature_C: 10 }, { height_m: 50, temperature_C: 9.7 }] },
  optics: { index_model: 'none' },
};

beforeAll(async () => {
  dir = await mkdtemp(join(tmpdir(), 'loomline-ensemble-cli-'));
  scenarioPath = join(dir, 'scenario.json');
  await writeFile(scenarioPath, JSON.stringify(SCENARIO));
});
afterAll(async () => {
  await rm(dir, { recursive: true, force: true });
});

describe('ensemble command', () => {
  it('prints the contract fields as one JSON object and writes the members as CSV and JSON', async () => {
    const csv = join(dir, 'members.csv');
    const json = join(dir, 'members.json');
    const r = await runCli(['ensemble', scenarioPath, '--members', '4', '--seed', '7', '--workers', '0', '--json', '--no-progress', '--csv', csv, '--save-json', json]);
    expect(r.code).toBe(0);
    const result = JSON.parse(r.stdout);
    expect(result.members).toBe(4);
    expect(Object.keys(result.probabilities)).toEqual(['visible', 'partly_hidden', 'hidden']);
    expect(Object.keys(result.standard_errors)).toEqual(['visible', 'partly_hidden', 'hidden']);
    expect(Object.keys(result.hidden_height_m)).toEqual(['p5', 'p50', 'p95']);
    expect(result.sensitivity.map((s: { input: string }) => s.input).sort()).toEqual(['observer.height_m', 'target.range_m']);
    expect((await readFile(csv, 'utf8')).trimEnd().split('\r\n')).toHaveLength(5);
    expect(JSON.parse(await readFile(json, 'utf8')).member_rows).toHaveLength(4);
    // A second run without --force leaves the files as they were and exits 2.
    const again = await runCli(['ensemble', scenarioPath, '--members', '2', '--workers', '0', '--json', '--no-progress', '--csv', csv]);
    expect(again.code).toBe(2);
    expect(again.stderr).toMatch(/--csv: .*members\.csv already exists: pass --force/);
    expect((await readFile(csv, 'utf8')).trimEnd().split('\r\n')).toHaveLength(5);
  });

  it('exits 2 naming the option for a bad seed or sampling method', async () => {
    const seed = await runCli(['ensemble', scenarioPath, '--seed', '-1', '--no-progress']);
    expect(seed.code).toBe(2);
    expect(seed.stderr).toMatch(/--seed = -1 is out of range/);
    const sampling = await runCli(['ensemble', scenarioPath, '--sampling', 'sobol', '--no-progress']);
    expect(sampling.code).toBe(2);
    expect(sampling.stderr).toMatch(/--sampling: "sobol" is not one of monte-carlo, latin-hypercube/);
  });

  it('stops on Ctrl-C, prints the finished members labelled partial and exits 130', async () => {
    // Members enough to outlast the 1.5 s before the interrupt: straight rays (index_model 'none')
    // are computed in closed form, a member in well under a millisecond.
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/cli/main.ts', 'ensemble', scenarioPath, '--members', '100000', '--workers', '1', '--json'], {
      cwd: process.cwd(),
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    // Interrupt once the progress bar has started (the ensemble is running).
    child.stderr.on('data', (d) => {
      const first = stderr === '';
      stderr += d;
      if (first) setTimeout(() => child.kill('SIGINT'), 1500);
    });
    const code = await new Promise<number | null>((resolve) => child.on('exit', (c) => resolve(c)));
    expect(code).toBe(130);
    const result = JSON.parse(stdout);
    expect(result.partial).toBe(true);
    expect(result.members).toBeLessThan(100_000);
    expect(result.member_rows).toHaveLength(result.members);
    expect(stderr).toMatch(/stopping/);
  });
});
