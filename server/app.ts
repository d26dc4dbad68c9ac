/**
 * The Loomline HTTP server as an Express 5 app factory: testable without listening (supertest),
 * started by server/main.ts. Routes are thin (STYLE.md §15): they validate and call the services
 * in server/service/, the same functions the CLI calls.
 *
 *   GET  /                      the viewer (web/public/index.html, dist/web/app.js)
 *   GET  /vendor/plotly.min.js  plotly.js-dist-min from node_modules (nothing is fetched from outside)
 *   GET  /api/health            { status, name, version, uptime_s }
 *   GET  /api/limits            HTTP_LIMITS and the scenario file's ranges
 *   GET  /api/scenario-schema   the scenario file's JSON Schema
 *   GET  /api/scenarios         the files in profiles/: { default_id, scenarios: [{ id, name, description, valid }] }
 *   GET  /api/scenarios/:id     one scenario file
 *   POST /api/profile           the resolved air at heights
 *   POST /api/trace             a fan of rays (DESIGN.md §6 trace)
 *   POST /api/findings          horizon, transfer, visibility, refraction (DESIGN.md §6), with the caution
 *   POST /api/view              the simulated view toward the target (grid of sky / sea / target / duct)
 *   POST /api/outlook, GET /api/outlook/demo   the mirage outlook of a series at a site (server/http/outlook.ts)
 *   POST /api/ensemble          an ensemble, progress streamed as NDJSON (server/http/routes/ensemble.ts)
 *   POST /api/report            the HTML report as an attachment (same file)
 * Errors: JSON { error: { field, message, problems, issues } }; 400 bad input, 404 unknown
 * route, 413 body too large, 500 internal (no stack traces).
 */
import { createRequire } from 'node:module';
import { join } from 'node:path';
import express, { type Express } from 'express';
import { REPO_ROOT, VIEWER_PATHS } from './http/bundle.js';
import { errorHandler, notFound, type ErrorLog } from './http/errors.js';
import { HTTP_LIMITS } from './http/limits.js';
import { createComputePool, defaultComputeWorkers } from './http/compute-pool.js';
import { computeRoutes } from './http/routes/compute.js';
import { ensembleRoutes } from './http/routes/ensemble.js';
import { outlookRoutes } from './http/outlook.js';
import { metaRoutes } from './http/routes/meta.js';
import { scenarioRoutes } from './http/routes/scenarios.js';
import { loadScenarioFile } from './scenario/load.js';

/** Options of createApp; defaults in APP_DEFAULTS. */
export interface AppOptions {
  /** Folder of scenario files served at /api/scenarios. Default: profiles/ of the repository. */
  profilesDir?: string;
  /** Scenario the viewer opens with (an id in profilesDir). Default 'cold-channel-morning'. */
  defaultScenarioId?: string;
  /** Folder of the viewer's static files. Default web/public. */
  publicDir?: string;
  /** Folder of the built viewer bundle. Default dist/web. */
  bundleDir?: string;
  /** Where internal errors are logged. Default: one line on stderr. */
  log?: ErrorLog;
  /** Worker threads computing requests (0: the main thread). Default: the cores Node reports. */
  workers?: number;
}

/** The app and what must be closed with it. */
export interface LoomlineApp {
  app: Express;
  /** Starts the compute threads and loads the services in them (else the first requests wait about a second for it). */
  warm(): Promise<void>;
  /** Ends the compute pool's worker threads (call after the HTTP server has closed). */
  close(): Promise<void>;
}

export const APP_DEFAULTS = Object.freeze({
  profilesDir: join(REPO_ROOT, 'profiles'),
  defaultScenarioId: 'cold-channel-morning',
  publicDir: VIEWER_PATHS.publicDir,
  bundleDir: VIEWER_PATHS.bundleDir,
  log: ((message: string) => process.stderr.write(`loomline server: ${message}\n`)) as ErrorLog,
  workers: defaultComputeWorkers(),
});

const require = createRequire(import.meta.url);

/** The package version, for /api/health. */
const VERSION: string = require('../package.json').version;

/**
 * Content Security Policy of the viewer: everything from this server; inline styles for Plotly's
 * own style sheet; data:/blob: images for the PNG download.
 */
const CSP = "default-src 'self'; script-src 'self'; style-src 'self' 'unsafe-inline'; img-src 'self' data: blob:; connect-src 'self'; object-src 'none'; base-uri 'none'; frame-ancestors 'none'";

/**
 * Builds the Express app (does not listen).
 * @param options folders, logging, worker threads (AppOptions; defaults APP_DEFAULTS).
 * @returns the app (`app.listen(port, '127.0.0.1')` serves it) and close() for its worker threads.
 */
export function createApp(options: AppOptions = {}): LoomlineApp {
  const settings = { ...APP_DEFAULTS, ...options };
  const pool = createComputePool(settings.workers, HTTP_LIMITS.compute_ms);
  const app = express();
  app.disable('x-powered-by');
  app.set('etag', false);
  app.use((_req, res, next) => {
    res.set('X-Content-Type-Options', 'nosniff');
    res.set('Content-Security-Policy', CSP);
    res.set('Referrer-Policy', 'no-referrer');
    next();
  });

  const api = express.Router();
  api.use(express.json({ limit: HTTP_LIMITS.body_bytes, strict: true }));
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  api.use(metaRoutes(VERSION, Date.now()));
  api.use(scenarioRoutes(settings.profilesDir, settings.defaultScenarioId));
  api.use(computeRoutes(pool));
  api.use(outlookRoutes());
  api.use(ensembleRoutes());
  api.use(notFound);
  app.use('/api', api);

  app.get('/vendor/plotly.min.js', (_req, res) => {
    res.sendFile(require.resolve('plotly.js-dist-min'), { maxAge: '1h' });
  });
  app.use(express.static(settings.publicDir, { index: 'index.html', maxAge: 0 }));
  app.use(express.static(settings.bundleDir, { index: false, maxAge: 0 }));
  app.use(notFound);
  app.use(errorHandler(HTTP_LIMITS.body_bytes, settings.log));
  const warm = async (): Promise<void> => {
    const { scenario } = await loadScenarioFile(join(settings.profilesDir, `${settings.defaultScenarioId}.json`));
    await pool.warm({ kind: 'profile', scenario, heights_m: [0] });
  };
  return { app, warm, close: () => pool.close() };
}
