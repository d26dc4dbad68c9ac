/**
 * Computes the outlook rows, in this thread or over a pool of worker threads (piscina) when there
 * are enough rows for the pool's start-up to pay off (bench/outlook.ts measures it).
 */
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { outlookForObservation, type OutlookFinding, type OutlookObservation, type OutlookSite } from '../../sim/analysis/outlook.js';
import { InputError } from '../../sim/errors.js';
import { tsWorkerOptions } from '../ts-worker.js';
import type { OutlookTask } from './worker.js';

/**
 * Fewest rows for which `workers: 'auto'` starts a pool. Measured on this 2-core machine with
 * bench/outlook.ts while other work ran (load average 2.4–3): two workers take about 1 s to start
 * (each loads the simulation through tsx and warms up its JIT); over 168 rows the pool then gave
 * 1.2–1.5 times the rows per second of one thread, over 36 rows 0.6–0.8 times: the break-even lay
 * near 60 rows. On an idle machine (about 72 ms per row in one thread, 36 ms with two) it would lie
 * near 1 s / 36 ms ≈ 28 rows. 48 sits between.
 */
export const POOL_MIN_ROWS = 48;

/** Options of computeFindings. */
export interface ComputeOptions {
  /** Worker threads: 'auto' (default) uses every core when there are POOL_MIN_ROWS rows or more, else 1; 1 computes in this thread. */
  workers?: number | 'auto';
  /** Called after each row with the number done and the total. */
  onProgress?: (done: number, total: number) => void;
  /** Label of each observation in error messages (default "row i"). */
  labels?: string[];
}

/** Worker threads that `workers` means for a number of rows. */
export function workerCount(workers: number | 'auto', rows: number): number {
  if (workers === 'auto') return rows >= POOL_MIN_ROWS ? Math.max(1, Math.min(availableParallelism(), rows)) : 1;
  return Math.max(1, Math.min(workers, rows));
}

/** The worker module the pool's threads load (as ES modules, through server/ts-worker-entry.mjs). */
const WORKER_URL = new URL('./worker.ts', import.meta.url).href;

/** Adds the row's label to an error, keeping input errors input errors (exit code 2). */
function rowError(error: unknown, label: string): Error {
  const message = error instanceof Error ? error.message : String(error);
  if (error instanceof InputError || (error as Error | undefined)?.name === 'InputRangeError' || error instanceof RangeError) {
    return new InputError(label, message);
  }
  return new Error(`${label}: ${message}`);
}

/**
 * The findings of every observation, in order.
 * @param observations SI observations.
 * @param site the SI site.
 * @param options workers and progress (ComputeOptions).
 * @returns one OutlookFinding per observation.
 * @throws InputError naming the row for bad input met in the computation; Error otherwise.
 */
export async function computeFindings(observations: readonly OutlookObservation[], site: OutlookSite, options: ComputeOptions = {}): Promise<OutlookFinding[]> {
  const total = observations.length;
  const threads = workerCount(options.workers ?? 'auto', total);
  const label = (i: number) => options.labels?.[i] ?? `row ${i + 1}`;
  let done = 0;
  const tick = () => options.onProgress?.(++done, total);
  if (threads <= 1) {
    const findings: OutlookFinding[] = [];
    for (let i = 0; i < total; i++) {
      try {
        findings.push(outlookForObservation(observations[i], site));
      } catch (error) {
        throw rowError(error, label(i));
      }
      tick();
      // Let the progress bar's timers and signal handlers run between rows.
      await new Promise((resolve) => setImmediate(resolve));
    }
    return findings;
  }
  const pool = new Piscina<OutlookTask, OutlookFinding>({
    ...tsWorkerOptions(WORKER_URL),
    minThreads: threads,
    maxThreads: threads,
  });
  try {
    return await Promise.all(
      observations.map((observation, i) =>
        pool.run({ observation, site }).then(
          (finding) => {
            tick();
            return finding;
          },
          (error: unknown) => {
            throw rowError(error, label(i));
          },
        ),
      ),
    );
  } finally {
    await pool.destroy();
  }
}
