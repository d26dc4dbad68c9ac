/**
 * Runs ensemble members on a piscina worker pool (one worker thread per core by default), or in
 * this thread for `workers: 0`, reporting each finished member and stopping cleanly on abort:
 * queued members are dropped, running ones are ended with their worker, finished ones are kept.
 */
import { setMaxListeners } from 'node:events';
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { InputRangeError } from '../../sim/errors.js';
import { tsWorkerOptions } from '../ts-worker.js';
import runMember, { type MemberResult, type MemberTask } from './worker.js';

/** Most worker threads accepted. */
export const MAX_WORKERS = 64;

export interface PoolOptions {
  /** Worker threads; 0 runs the members one after another in this thread. Default: availableParallelism(). */
  workers?: number;
  /** Aborting stops the run; the result then holds the members finished so far. */
  signal?: AbortSignal;
  /** Called once per finished member, with the count finished so far. */
  onResult?: (result: MemberResult, finished: number) => void;
}

export interface PoolRun {
  /** results[i] for task i, or null when it did not finish (cancelled). */
  results: (MemberResult | null)[];
  /** True when the run was stopped before every member finished. */
  cancelled: boolean;
  /** Worker threads used (0: this thread). */
  workers: number;
}

/** The worker module the pool's threads load (as ES modules, through server/ts-worker-entry.mjs). */
const WORKER_URL = new URL('./worker.ts', import.meta.url).href;

/** Default worker count: the cores Node reports. */
export function defaultWorkers(): number {
  return availableParallelism();
}

/**
 * Runs the tasks and collects their results in task order.
 * @throws InputRangeError for a worker count outside 0..MAX_WORKERS.
 */
export async function runMemberTasks(tasks: readonly MemberTask[], options: PoolOptions = {}): Promise<PoolRun> {
  const workers = options.workers ?? defaultWorkers();
  if (!Number.isInteger(workers) || workers < 0 || workers > MAX_WORKERS) throw new InputRangeError('workers', workers, `integers 0..${MAX_WORKERS}`);
  const results: (MemberResult | null)[] = tasks.map(() => null);
  let finished = 0;
  const record = (result: MemberResult, slot: number) => {
    results[slot] = result;
    finished++;
    options.onResult?.(result, finished);
  };
  const signal = options.signal;
  if (workers === 0) {
    for (let i = 0; i < tasks.length && !signal?.aborted; i++) {
      record(runMember(tasks[i]), i);
      // Let signal handlers (Ctrl-C) and progress output run between members.
      await new Promise((resolve) => setImmediate(resolve));
    }
    return { results, cancelled: finished < tasks.length, workers };
  }
  const pool = new Piscina<MemberTask, MemberResult>({
    ...tsWorkerOptions(WORKER_URL),
    minThreads: workers,
    maxThreads: workers,
    idleTimeout: 1000,
  });
  const controller = new AbortController();
  // A member that finishes just as the run is stopped can post its result after piscina has ended
  // its worker and dropped the task; piscina then emits 'error' ("Unexpected message from Worker"),
  // which without a listener is an uncaught exception. After a stop such a late result is dropped;
  // any other pool error is thrown as before.
  pool.on('error', (error: unknown) => {
    if (!controller.signal.aborted) throw error;
  });
  try {
    // piscina listens on the signal once per queued task.
    setMaxListeners(tasks.length + 10, controller.signal);
    const stop = () => controller.abort();
    if (signal?.aborted) stop();
    signal?.addEventListener('abort', stop, { once: true });
    await Promise.allSettled(
      tasks.map((task, i) =>
        pool.run(task, { signal: controller.signal }).then(
          (result) => record(result, i),
          (error: unknown) => {
            if (!controller.signal.aborted) throw error;
          },
        ),
      ),
    ).then((settled) => {
      const failure = settled.find((s): s is PromiseRejectedResult => s.status === 'rejected');
      if (failure) throw failure.reason;
    });
    signal?.removeEventListener('abort', stop);
  } finally {
    await pool.destroy();
  }
  return { results, cancelled: finished < tasks.length, workers };
}
