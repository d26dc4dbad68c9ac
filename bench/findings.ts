/**
 * Findings cost per request: CPU milliseconds of one `findings` computation (what POST
 * /api/findings runs in a worker) for every scenario file in profiles/, in two cases:
 *   - shared air: the media come from a cache as in the HTTP worker (server/http/medium-cache.ts;
 *     an eye-height edit, the viewer's common case), timed with the eye height varied;
 *   - air rebuilt: no cache, every medium (the scenario's and its references') built inside the
 *     request (the worst case of an air edit).
 * CPU time is process.cpuUsage (user + system) of this single-threaded process, so other work on
 * the machine changes it far less than wall time; both are printed with the load average.
 * With `--snapshot FILE` the findings JSON of every profile (shared-air case, first eye height)
 * is written to FILE, to compare the results of two versions (`--compare FILE` prints the largest
 * differences of every number against a saved snapshot, leaving out the transfer curve's list of
 * rays, which samples the curve and changes with the fan's settings).
 *
 *   node --import tsx bench/findings.ts [--snapshot FILE | --compare FILE] [--runs N]
 */
import { readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { join } from 'node:path';
import { buildMedium } from '../sim/atmosphere/medium.js';
import type { Scenario } from '../sim/scenario.js';
import { REPO_ROOT } from '../server/http/bundle.js';
import { MediumCache } from '../server/http/medium-cache.js';
import { scenarioFromJson } from '../server/scenario/load.js';
import { findings } from '../server/service/findings.js';

/** Timed requests per profile and case (after WARMUP untimed ones). */
const DEFAULT_RUNS = 30;
const WARMUP = 5;
/** The viewer's findings request (web/api.ts): refraction at 0° only. */
const VIEWER_OPTIONS = { refraction_elevations_deg: [0] };

interface Row {
  id: string;
  shared_cpu_ms: number;
  shared_wall_ms: number;
  rebuilt_cpu_ms: number;
  rebuilt_wall_ms: number;
  rays: number;
}

function scenarios(): { id: string; scenario: Scenario }[] {
  const out: { id: string; scenario: Scenario }[] = [];
  for (const name of readdirSync(join(REPO_ROOT, 'profiles')).filter((n) => n.endsWith('.json')).sort()) {
    try {
      out.push({ id: name.replace(/\.json$/, ''), scenario: scenarioFromJson(JSON.parse(readFileSync(join(REPO_ROOT, 'profiles', name), 'utf8'))).scenario });
    } catch {
      // Not a plain scenario (an ensemble or outlook file): not a findings request.
    }
  }
  return out;
}

const withEye = (s: Scenario, i: number): Scenario => ({ ...s, observer: { ...s.observer, height_m: s.observer.height_m * (1 + 0.01 * (i % 8)) } });

/** Median CPU and wall ms of `runs` calls of f(i). */
function time(runs: number, f: (i: number) => void): { cpu: number; wall: number } {
  for (let i = 0; i < WARMUP; i++) f(i);
  const cpu: number[] = [];
  const wall: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const w0 = performance.now();
    f(i);
    const w = performance.now() - w0;
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
    wall.push(w);
  }
  const median = (xs: number[]) => xs.sort((a, b) => a - b)[xs.length >> 1];
  return { cpu: median(cpu), wall: median(wall) };
}

/** Largest absolute difference per JSON path pattern between two values (numbers only; other changes listed). */
function differences(a: unknown, b: unknown, path: string, out: Map<string, number>, changed: string[]): void {
  // The fan's own rays (their number and elevations) are how the curve was sampled, not a result.
  if (/^\.transfer\.rays(\[|_traced|$)/.test(path)) return;
  const key = path.replace(/\[\d+\]/g, '[]');
  if (typeof a === 'number' && typeof b === 'number') {
    const d = Math.abs(a - b);
    if (d > (out.get(key) ?? 0) || !out.has(key)) out.set(key, Math.max(d, out.get(key) ?? 0));
    return;
  }
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) changed.push(`${path}: length ${a.length} → ${b.length}`);
    for (let i = 0; i < Math.min(a.length, b.length); i++) differences(a[i], b[i], `${path}[${i}]`, out, changed);
    return;
  }
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    for (const k of new Set([...Object.keys(a), ...Object.keys(b)])) differences((a as any)[k], (b as any)[k], `${path}.${k}`, out, changed);
    return;
  }
  if (a !== b) changed.push(`${path}: ${JSON.stringify(a)} → ${JSON.stringify(b)}`);
}

export async function benchFindings(runs = DEFAULT_RUNS, snapshot?: string, compare?: string): Promise<string[]> {
  const startLoad = loadavg()[0];
  const lines: string[] = [];
  const rows: Row[] = [];
  const results: Record<string, unknown> = {};
  for (const { id, scenario } of scenarios()) {
    const medium = buildMedium(scenario);
    const media = new MediumCache();
    const first = findings(withEye(scenario, 0), { ...VIEWER_OPTIONS, medium, media });
    results[id] = first;
    const shared = time(runs, (i) => findings(withEye(scenario, i), { ...VIEWER_OPTIONS, medium, media }));
    const rebuilt = time(runs, (i) => findings(withEye(scenario, i), { ...VIEWER_OPTIONS }));
    rows.push({ id, shared_cpu_ms: shared.cpu, shared_wall_ms: shared.wall, rebuilt_cpu_ms: rebuilt.cpu, rebuilt_wall_ms: rebuilt.wall, rays: first.transfer.rays_traced });
  }
  lines.push(`findings: CPU ms per request (median of ${runs}; wall in brackets), node ${process.version}, ${availableParallelism()} cores, load average ${startLoad.toFixed(2)} at the start`);
  for (const r of rows) {
    lines.push(
      `findings: ${r.id.padEnd(28)} shared air ${r.shared_cpu_ms.toFixed(1).padStart(6)} ms (${r.shared_wall_ms.toFixed(1)}), ` +
        `air rebuilt ${r.rebuilt_cpu_ms.toFixed(1).padStart(6)} ms (${r.rebuilt_wall_ms.toFixed(1)}), transfer rays ${r.rays}`,
    );
  }
  const sum = (f: (r: Row) => number) => rows.reduce((s, r) => s + f(r), 0);
  lines.push(`findings: total over ${rows.length} profiles: shared air ${sum((r) => r.shared_cpu_ms).toFixed(1)} ms CPU, air rebuilt ${sum((r) => r.rebuilt_cpu_ms).toFixed(1)} ms CPU; load average ${loadavg()[0].toFixed(2)} at the end`);
  if (snapshot) writeFileSync(snapshot, JSON.stringify(results));
  if (compare) {
    const before = JSON.parse(readFileSync(compare, 'utf8')) as Record<string, unknown>;
    for (const id of Object.keys(results)) {
      const diffs = new Map<string, number>();
      const changed: string[] = [];
      differences(before[id], JSON.parse(JSON.stringify(results[id])), '', diffs, changed);
      const worst = [...diffs].filter(([, d]) => d > 0).sort((x, y) => y[1] - x[1]).slice(0, 8);
      lines.push(`compare: ${id}: ${changed.length} non-numeric changes${changed.length ? ` (${changed.slice(0, 4).join('; ')})` : ''}; largest numeric differences: ${worst.map(([k, d]) => `${k} ${d.toExponential(1)}`).join(', ') || 'none'}`);
    }
  }
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const arg = (name: string) => {
    const i = process.argv.indexOf(name);
    return i > 0 ? process.argv[i + 1] : undefined;
  };
  for (const line of await benchFindings(Number(arg('--runs') ?? DEFAULT_RUNS), arg('--snapshot'), arg('--compare'))) console.log(line);
}
