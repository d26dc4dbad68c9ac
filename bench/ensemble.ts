/**
 * Ensemble speed: a 400-member ensemble of an invented scenario with uncertain inputs, wall time
 * with 1 and with 2 worker threads, and their ratio (the speed-up of the pool). Also checks that
 * both runs give identical numbers (the worker count must not change results).
 *
 * Run alone: node --import tsx bench/ensemble.ts   (or through bench/run.ts).
 */
import { availableParallelism, loadavg } from 'node:os';
import { validateScenarioFile } from '../server/scenario/load.js';
import { runEnsemble } from '../server/service/ensemble.js';

/** Members of the benchmark ensemble. */
const MEMBERS = 400;
const SEED = 400;

/**
 * An invented inshore case with a layered profile: cheaper per member than a bulk surface layer,
 * with inputs spread enough to give all three outcomes.
 */
const SCENARIO = {
  name: 'Bench: Harrow Sound crossing (invented)',
  observer: { height_m: { normal: { mean: 8, sd: 0.5 } } },
  target: { range_m: { uniform: { min: 14000, max: 24000 } }, height_m: { choice: [4, 6, 8] } },
  atmosphere: {
    surface_pressure_hPa: 1015,
    relative_humidity: { uniform: { min: 0.6, max: 0.9 } },
    profile: [
      { height_m: 0, temperature_C: { normal: { mean: 4, sd: 1 } } },
      { height_m: 15, temperature_C: { normal: { mean: 7, sd: 1.5 } } },
      { height_m: 60, temperature_C: 6.5 },
    ],
    above: 'us1976',
  },
};

async function timeRun(workers: number): Promise<{ seconds: number; fingerprint: string; members: number }> {
  const file = validateScenarioFile(SCENARIO);
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
    `ensemble: ${MEMBERS} members (${one.members} finished), ${availableParallelism()} cores reported`,
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
