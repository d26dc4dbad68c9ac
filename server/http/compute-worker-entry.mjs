/**
 * The entry of the compute pool's worker threads (server/http/compute-pool.ts): loads
 * compute-worker.ts and its imports as ES modules through tsx's ESM API and hands piscina its
 * default export.
 *
 * Why not `--import tsx` with compute-worker.ts as piscina's filename: piscina first tries
 * `require(filename)`, which tsx's CommonJS hook answers by compiling every module of the worker
 * to CommonJS, where each use of an imported binding goes through a getter. Measured on the
 * built-in scenario in one worker thread: 17.5 ms a findings request that builds its air, 6.6 ms
 * one with the air cached; loaded as ES modules, 9.9 ms and 5.6 ms. This file is plain
 * JavaScript with a top-level await, so piscina's require() fails and it falls back to import().
 */
import { tsImport } from 'tsx/esm/api';

const worker = await tsImport('./compute-worker.ts', import.meta.url);

export default worker.default;
