/**
 * Piscina options that run a TypeScript worker module in worker threads as ES modules, shared by
 * the HTTP compute pool, the ensemble pool and the outlook pool. The threads start plain (no
 * `--import tsx`) at ts-worker-entry.mjs, which imports the module through tsx's ESM API; see that
 * file for why (CommonJS interop made the workers' code 1.2–1.8 times slower).
 */

/** The one entry file of every pool's worker threads. */
const ENTRY_URL = new URL('./ts-worker-entry.mjs', import.meta.url).href;

/** What ts-worker-entry.mjs reads from the thread's workerData. */
export interface TsWorkerData {
  /** File URL of the TypeScript worker module; its default export handles the tasks. */
  tsWorker: string;
}

/** The piscina options tsWorkerOptions sets (spread them into the pool's options). */
export interface TsWorkerOptions {
  filename: string;
  workerData: TsWorkerData;
  execArgv: string[];
}

/**
 * Piscina options (filename, workerData, execArgv) that load a TypeScript worker module as ES modules.
 * @param workerUrl file URL of the worker module, e.g. `new URL('./worker.ts', import.meta.url).href`;
 *   its default export is the task handler.
 * @returns options to spread into `new Piscina({ ... })`; the pool must not set its own workerData.
 */
export function tsWorkerOptions(workerUrl: string): TsWorkerOptions {
  return { filename: ENTRY_URL, workerData: { tsWorker: workerUrl }, execArgv: [] };
}
