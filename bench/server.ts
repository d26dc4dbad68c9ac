/**
 * Server benchmark: latency of POST /api/findings under 16 concurrent connections (autocannon),
 * for the built-in scenario. Goal (issue 4): p99 ≤ 250 ms with 0 errors. Two loads:
 *   - varied: each request a different eye height (the air, and so the cached medium, is shared,
 *     as when viewers edit the sight line);
 *   - varied air: each request a different surface temperature (the medium is rebuilt every time).
 * The server runs as `npm start` does, in its own process (autocannon would otherwise share its
 * event loop). It computes on one event loop, so under 16 connections a request waits for the
 * others: latency ≈ 16 × the time of one request.
 *
 *   node --import tsx bench/server.ts
 */
import { availableParallelism, loadavg } from 'node:os';
import { spawn, type ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';
import { REPO_ROOT } from '../server/http/bundle.js';
import { profileFile } from '../test/server/fixtures.js';

/** Concurrent connections (issue 4). */
const CONNECTIONS = 16;
/** Seconds per load. */
const DURATION_S = 10;
/** Goal of issue 4, ms. */
const GOAL_P99_MS = 250;
/** The route measured. */
export const BENCH_ROUTE = '/api/findings';

type Edit = (scenario: Record<string, any>, i: number) => void;

async function load(url: string, edit: Edit): Promise<autocannon.Result> {
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
    duration: DURATION_S,
    requests: [{ method: 'POST', headers: { 'content-type': 'application/json' }, setupRequest: (req) => ({ ...req, body: bodies[next++ % bodies.length] }) }],
  });
}

function describe(label: string, r: autocannon.Result): string {
  const errors = r.errors + r.timeouts + r.non2xx;
  const ok = r.latency.p99 <= GOAL_P99_MS && errors === 0;
  return (
    `server: ${label}: ${r.requests.total} requests in ${DURATION_S} s (${r.requests.average.toFixed(1)}/s), latency p50 ${r.latency.p50} ms, ` +
    `p99 ${r.latency.p99} ms, max ${r.latency.max} ms, errors ${errors} — goal p99 ≤ ${GOAL_P99_MS} ms, 0 errors: ${ok ? 'met' : 'NOT met'}`
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
    // One untimed request warms the JIT and the medium cache.
    await fetch(`${url}${BENCH_ROUTE}`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ scenario: profileFile('cold-channel-morning') }) });
    const eye = await load(url, (s, i) => (s.observer.height_m = 4 + 0.125 * i));
    const air = await load(url, (s, i) => (s.atmosphere.profile[0].temperature_C = 1 + 0.03125 * i));
    return [
      `server: POST ${BENCH_ROUTE}, built-in scenario, ${CONNECTIONS} connections, server in its own process (${availableParallelism()} cores, load average ${startLoad.toFixed(1)} at the start)`,
      describe('varied eye height (shared air)', eye),
      describe('varied surface temperature (air rebuilt)', air),
    ];
  } finally {
    child.kill('SIGTERM');
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchServer()) console.log(line);
}
