/**
 * Ensemble speed: a 400-member ensemble of the invented incident (profiles/incident-corran-star.json), wall time
 * with 1 and with 2 worker threads, and their ratio (the speed-up of the pool). Also checks that
 * both runs give identical numbers (the worker count must not change results).
 *
 * Run alone: node --import tsx bench/ensemble.ts   (or through bench/run.ts).
 */
import { availableParallelism, loadavg } from 'node:os';
import { fileURLToPath } from 'node:url';
import { loadScenarioFile } from '../server/scenario/load.js';
import { runEnsemble } from '../server/service/ensemble.js';

/** Members of the benchmark ensemble. */
const MEMBERS = 400;
const SEED = 400;

/** The invented incident of profiles/ (bulk surface layer, six uncertain inputs): the README's case. */
const SCENARIO_PATH = fileURLToPath(new URL('../profiles/incident-corran-star.json', import.meta.url));

async function timeRun(workers: number): Promise<{ seconds: number; fingerprint: string; members: number }> {
  const { file } = await loadScenarioFile(SCENARIO_PATH);
  const start = performance.now();
  const result = await runEnsemble(file, { members: MEMBERS, seed: SEED, workers });
  const seconds = (performance.now() - start) / 1000;
  return { seconds, fingerprint: JSON.stringify([result.probabilities, result.hidden_height_m, result.sensitivity]), members: result.members };
}

/** Runs the benchmark and returns its lines. */
export async function benchEnsemble(): Promise<string[]> {
  const one = await timeRun(1);
  const two = await timeRun(2);
  const lines = [
    `ensemble: ${MEMBERS} members of profiles/incident-corran-star.json (${one.members} finished), ${availableParallelism()} cores reported`,
    `ensemble: 1 worker  ${one.seconds.toFixed(1)} s (${((1000 * one.seconds) / MEMBERS).toFixed(0)} ms per member)`,
    `ensemble: 2 workers ${two.seconds.toFixed(1)} s (${((1000 * two.seconds) / MEMBERS).toFixed(0)} ms per member)`,
    `ensemble: ratio 1 worker / 2 workers = ${(one.seconds / two.seconds).toFixed(2)} (2.00 would be perfect scaling)`,
    `ensemble: results identical with 1 and 2 workers: ${one.fingerprint === two.fingerprint ? 'yes' : 'NO'}`,
    // Other work on the machine takes cores from the pool: the ratio means little when this is above the core count.
    `ensemble: load average at the end ${loadavg()[0].toFixed(2)} on ${availableParallelism()} cores`,
  ];
  return lines;
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchEnsemble()) console.log(line);
}
