/**
 * Ensemble routes: an ensemble with its progress streamed as it runs, and the HTML report.
 *   POST /api/ensemble  { scenario, members?, seed?, sampling? } → application/x-ndjson, one JSON
 *        object per line: { type: "progress", finished, total } (about every 2 % of the members),
 *        then { type: "result", result } (the `ensemble` JSON of DESIGN.md §6) or
 *        { type: "error", error } (same body as other errors). Closing the connection cancels it.
 *   POST /api/report    { scenario, members?, seed?, sampling? } → the self-contained HTML report
 *        as an attachment (the same page as `report --out`).
 * Bad input is answered before the stream starts (400 JSON, as every route).
 */
import { Router, type Request, type Response } from 'express';
import * as z from 'zod';
import { SIGHTING_DEFAULTS, defaultSightingGrid } from '../../../sim/analysis/sighting.js';
import { MAX_SEED } from '../../../sim/analysis/ensemble-random.js';
import { buildReport } from '../../report/build.js';
import { ENSEMBLE_DEFAULTS, runEnsemble, type EnsembleOptions } from '../../service/ensemble.js';
import { errorBody, HttpError } from '../errors.js';
import { parseRequest, rangedInteger, scenarioFromBody, type BodyScenario } from '../validate.js';

/** Most members one HTTP request may ask for (the CLI allows more). */
export const HTTP_MAX_MEMBERS = 2000;
/** Progress lines sent per ensemble at most (one every 2 % of the members). */
const PROGRESS_STEPS = 50;

const ensembleRequest = z.strictObject({
  scenario: z.unknown(),
  members: rangedInteger(1, HTTP_MAX_MEMBERS, 'members').optional(),
  seed: rangedInteger(0, MAX_SEED, '').optional(),
  sampling: z.enum(['monte-carlo', 'latin-hypercube'], { error: 'expected "monte-carlo" or "latin-hypercube"' }).optional(),
});

type EnsembleBody = z.infer<typeof ensembleRequest>;

/** Parses the body: options and the scenario (errors name the body field). */
function parseEnsembleBody(body: unknown): { options: EnsembleOptions; parsed: BodyScenario } {
  const b: EnsembleBody = parseRequest(ensembleRequest, body);
  const parsed = scenarioFromBody(b.scenario);
  return { options: { members: b.members ?? ENSEMBLE_DEFAULTS.members, seed: b.seed ?? ENSEMBLE_DEFAULTS.seed, sampling: b.sampling ?? ENSEMBLE_DEFAULTS.sampling }, parsed };
}

/** An AbortSignal that fires when the client goes away before the answer is complete. */
function clientGone(req: Request, res: Response): AbortSignal {
  const controller = new AbortController();
  res.on('close', () => {
    if (!res.writableEnded) controller.abort();
  });
  req.on('aborted', () => controller.abort());
  return controller.signal;
}

/** The router of POST /api/ensemble and POST /api/report (mounted under /api). */
export function ensembleRoutes(): Router {
  const router = Router();

  router.post('/ensemble', async (req, res) => {
    const { options, parsed } = parseEnsembleBody(req.body);
    const signal = clientGone(req, res);
    res.status(200).set('Content-Type', 'application/x-ndjson; charset=utf-8');
    res.flushHeaders();
    const send = (line: unknown) => res.write(JSON.stringify(line) + '\n');
    const every = Math.max(1, Math.floor((options.members ?? 1) / PROGRESS_STEPS));
    try {
      const result = await runEnsemble(parsed.file, options, {
        signal,
        onProgress: (finished, total) => {
          if (finished % every === 0 || finished === total) send({ type: 'progress', finished, total });
        },
      });
      res.end(signal.aborted ? undefined : JSON.stringify({ type: 'result', result }) + '\n');
    } catch (error) {
      const issues = error instanceof HttpError ? error.issues : [{ field: (error as { field?: string }).field ?? '', message: error instanceof Error ? error.message : String(error) }];
      res.end(JSON.stringify({ type: 'error', ...errorBody(issues) }) + '\n');
    }
  });

  router.post('/report', async (req, res) => {
    const { options, parsed } = parseEnsembleBody(req.body);
    const signal = clientGone(req, res);
    const { scenario, file } = parsed;
    const text = JSON.stringify(req.body.scenario, null, 2) + '\n';
    const grid = defaultSightingGrid(scenario.observer.height_m, scenario.target.height_m, scenario.earth.radius_m);
    const out = await buildReport(
      {
        scenarioText: text,
        scenarioPath: '(sent to the server)',
        file,
        scenario,
        ensemble: options,
        sighting: { ...grid, count: SIGHTING_DEFAULTS.count, light_height_m: scenario.target.light_height_m ?? null },
        command: `POST /api/report members=${options.members} seed=${options.seed} sampling=${options.sampling}`,
        generated_at: new Date().toISOString(),
      },
      { signal },
    );
    if (signal.aborted) return;
    res.status(200).set('Content-Type', 'text/html; charset=utf-8').set('Content-Disposition', 'attachment; filename="loomline-report.html"').send(out.html);
  });

  return router;
}
