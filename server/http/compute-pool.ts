/**
 * Where the HTTP API computes: a piscina pool of worker threads (one per core by default), so the
 * event loop stays free for other requests, several requests compute at once, and a request that
 * runs past HTTP_LIMITS.compute_ms is stopped (its worker ended) and answered 503. With
 * `workers: 0` tasks run in the main thread (no time limit; the size limits still bound the work).
 */
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { tsWorkerOptions } from '../ts-worker.js';
import compute, { type ComputeAnswer, type ComputeTask } from './compute-worker.js';
import { HttpError } from './errors.js';

/** The worker module the pool's threads load (as ES modules, through server/ts-worker-entry.mjs). */
const WORKER_URL = new URL('./compute-worker.ts', import.meta.url).href;
/** Idle worker threads above minThreads end after this long, ms (all threads are kept: minThreads = workers). */
const IDLE_TIMEOUT_MS = 10 * 60_000;

/** Runs compute tasks. */
export interface ComputePool {
  /** Worker threads (0: the main thread). */
  readonly workers: number;
  /** Runs a task; resolves with its answer; rejects with HttpError(503) past the time limit. */
  run(task: ComputeTask): Promise<ComputeAnswer>;
  /** Starts every worker thread and loads the services in it (the first task otherwise waits for that). */
  warm(task: ComputeTask): Promise<void>;
  /** Ends the worker threads. */
  close(): Promise<void>;
}

/** Default worker threads: the cores Node reports. */
export function defaultComputeWorkers(): number {
  return availableParallelism();
}

/**
 * Creates the pool.
 * @param workers worker threads, 0..64 (0: compute in the main thread).
 * @param timeout_ms longest computation of one task, ms (ignored without workers).
 */
export function createComputePool(workers: number, timeout_ms: number): ComputePool {
  if (workers === 0) {
    return { workers, run: async (task) => compute(task), warm: async (task) => void compute(task), close: async () => {} };
  }
  const pool = new Piscina<ComputeTask, ComputeAnswer>({
    ...tsWorkerOptions(WORKER_URL),
    minThreads: workers,
    maxThreads: workers,
    idleTimeout: IDLE_TIMEOUT_MS,
  });
  // A task whose time limit ran out just as its worker answered makes piscina emit 'error'
  // ("Unexpected message from Worker") after the task is gone; unheard, that would be an uncaught
  // exception that stops the server. No request is waiting for it, so it is logged and dropped.
  pool.on('error', (error: unknown) => {
    process.stderr.write(`loomline: compute pool: ${error instanceof Error ? error.message : String(error)} (ignored)\n`);
  });
  let closing = false;
  return {
    workers,
    async run(task) {
      const signal = AbortSignal.timeout(timeout_ms);
      try {
        return await pool.run(task, { signal });
      } catch (error) {
        if (closing) throw new HttpError(503, [{ field: '', message: 'the server is stopping' }]);
        if (signal.aborted) {
          throw new HttpError(503, [{ field: '', message: `the computation took longer than the server allows (${timeout_ms / 1000} s per request) and was stopped; ask for fewer rays, fewer cells or a shorter range` }]);
        }
        throw error;
      }
    },
    async warm(task) {
      // One task per thread at once: piscina gives each idle thread one.
      await Promise.all(Array.from({ length: workers }, () => pool.run(task)));
    },
    close: () => {
      closing = true;
      return pool.destroy();
    },
  };
}
