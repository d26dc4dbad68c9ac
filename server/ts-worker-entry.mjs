/**
 * The entry of every piscina pool's worker threads (server/http/compute-pool.ts,
 * server/ensemble/pool.ts, server/outlook/pool.ts; options from server/ts-worker.ts): loads the
 * TypeScript worker module named by `workerData.tsWorker` (a file URL) and its imports as ES
 * modules through tsx's ESM API, and hands piscina its default export.
 *
 * Why not `--import tsx` with the .ts worker as piscina's filename: piscina first tries
 * `require(filename)`, which tsx's CommonJS hook answers by compiling every module of the worker
 * to CommonJS, where each use of an imported binding goes through a getter. Measured on the
 * built-in scenario in one worker thread: 17.5 ms a findings request that builds its air, 6.6 ms
 * one with the air cached; loaded as ES modules, 9.9 ms and 5.6 ms. This file is plain
 * JavaScript with a top-level await, so piscina's require() fails and it falls back to import().
 */
import { workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

const url = workerData?.tsWorker;
if (typeof url !== 'string') {
  throw new TypeError(`ts-worker-entry.mjs: workerData.tsWorker must be the file URL of a TypeScript worker module (got ${typeof url}); build the pool's options with tsWorkerOptions() of server/ts-worker.ts`);
}

const worker = await tsImport(url, import.meta.url);

export default worker.default;
