/**
 * Server benchmark: latency of POST /api/findings under 16 concurrent connections (autocannon),
 * for the built-in scenario. Goal (issue 4): p99 ≤ 250 ms with 0 errors. Two loads:
 *   - varied: each request a different eye height (the air, and so the cached medium, is shared,
 *     as when viewers edit the sight line);
 *   - varied air: each request a different surface temperature (the medium is rebuilt every time).
 * The server runs as `npm start` does, in its own process (autocannon would otherwise share its
 * event loop), computing in a pool of worker threads, one per core. Under 16 connections a request
 * waits for the others: latency ≈ 16 × (CPU time of one request) / (cores free for the server).
 * So each load also reports the server process's CPU time per request (all its threads, from
 * /proc/<pid>/stat on Linux): unlike latency, it hardly depends on what else runs on the machine.
 *
 *   node --import tsx bench/server.ts
 */
import { readFileSync } from 'node:fs';
import { availableParallelism, loadavg } from 'node:os';
import { spawn, type ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';
import { REPO_ROOT } from '../server/http/bundle.js';
import { profileFile } from '../test/server/fixtures.js';

/** Concurrent connections (issue 4). */
const CONNECTIONS = 16;
/** Seconds per load. */
const DURATION_S = 10;
/**
 * Seconds of untimed load before the timed ones: every worker thread compiles the findings code
 * (one request would warm one thread only, and the other's first requests would be timed cold).
 */
const WARMUP_S = 3;
/** Goal of issue 4, ms. */
const GOAL_P99_MS = 250;
/** The route measured. */
export const BENCH_ROUTE = '/api/findings';

type Edit = (scenario: Record<string, any>, i: number) => void;

async function load(url: string, edit: Edit, duration_s = DURATION_S): Promise<autocannon.Result> {
  const base = profileFile('cold-channel-morning');
  const bodies = Array.from({ length: 64 }, (_, i) => {
    const scenario = structuredClone(base) as Record<string, any>;
    edit(scenario, i);
    return JSON.stringify({ scenario });
  });
  let next = 0;
  return autocannon({
    url: `${url}${BENCH_ROUTE}`,
    connections: CONNECTIONS,
    duration: duration_s,
    requests: [{ method: 'POST', headers: { 'content-type': 'application/json' }, setupRequest: (req) => ({ ...req, body: bodies[next++ % bodies.length] }) }],
  });
}

/** CPU time of a process so far (user + system, all threads), ms; null where /proc is missing. */
function processCpu_ms(pid: number): number | null {
  try {
    // Fields after the command name (which may hold spaces): state is field 3, utime 14, stime 15.
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    const ticksPerSecond = 100; // USER_HZ on Linux
    return ((Number(fields[11]) + Number(fields[12])) * 1000) / ticksPerSecond;
  } catch {
    return null;
  }
}

/** Runs one load and measures the server's CPU time over it. */
async function measured(pid: number, url: string, edit: Edit): Promise<{ result: autocannon.Result; cpu_ms: number | null }> {
  const before = processCpu_ms(pid);
  const result = await load(url, edit);
  const after = processCpu_ms(pid);
  return { result, cpu_ms: before === null || after === null ? null : after - before };
}

function describe(label: string, { result: r, cpu_ms }: { result: autocannon.Result; cpu_ms: number | null }): string {
  const errors = r.errors + r.timeouts + r.non2xx;
  const ok = r.latency.p99 <= GOAL_P99_MS && errors === 0;
  const cpu = cpu_ms === null || r.requests.total === 0 ? '' : `, server CPU ${(cpu_ms / r.requests.total).toFixed(1)} ms per request`;
  return (
    `server: ${label}: ${r.requests.total} requests in ${DURATION_S} s (${r.requests.average.toFixed(1)}/s), latency p50 ${r.latency.p50} ms, ` +
    `p99 ${r.latency.p99} ms, max ${r.latency.max} ms, errors ${errors}${cpu} — goal p99 ≤ ${GOAL_P99_MS} ms, 0 errors: ${ok ? 'met' : 'NOT met'}`
  );
}

/** Starts `server/main.ts --port 0` and resolves with its URL once it prints it. */
function startServer(): Promise<{ child: ChildProcess; url: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(process.execPath, ['--import', 'tsx', 'server/main.ts', '--port', '0'], { cwd: REPO_ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
    let out = '';
    child.stdout!.on('data', (chunk) => {
      out += String(chunk);
      const found = /http:\/\/127\.0\.0\.1:\d+/.exec(out);
      if (found) resolve({ child, url: found[0] });
    });
    child.on('exit', (code) => reject(new Error(`server exited with code ${code} before printing its URL`)));
  });
}

export async function benchServer(): Promise<string[]> {
  const startLoad = loadavg()[0];
  const { child, url } = await startServer();
  try {
    // Untimed load warms the JIT of every worker thread and the medium caches (eye heights only:
    // the timed air load still builds new air every request).
    await load(url, (s, i) => (s.observer.height_m = 3 + 0.125 * i), WARMUP_S);
    const eye = await measured(child.pid!, url, (s, i) => (s.observer.height_m = 4 + 0.125 * i));
    const air = await measured(child.pid!, url, (s, i) => (s.atmosphere.profile[0].temperature_C = 1 + 0.03125 * i));
    return [
      `server: POST ${BENCH_ROUTE}, built-in scenario, ${CONNECTIONS} connections, server in its own process (${availableParallelism()} cores, load average ${startLoad.toFixed(1)} at the start)`,
      describe('varied eye height (shared air)', eye),
      describe('varied surface temperature (air rebuilt)', air),
      `server: load average ${loadavg()[0].toFixed(1)} at the end`,
    ];
  } finally {
    child.kill('SIGTERM');
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchServer()) console.log(line);
}
