/**
 * The computing routes. Each parses and validates its body here (server/http/validate.ts), then
 * hands the work to the compute pool, which calls the same service functions as the CLI
 * (server/http/compute-worker.ts), and sends the JSON (STYLE.md §15).
 *   POST /api/profile   { scenario, heights_m? }                                   → the resolved air
 *   POST /api/trace     { scenario, elevations_deg? | fan?, path_points? }        → DESIGN.md §6 trace
 *   POST /api/findings  { scenario, refraction_elevations_deg?, bodies_deg?, max_height_m?, rays? } → findings
 *   POST /api/view      { scenario, rows?, columns?, from_elevation_deg?, to_elevation_deg?, half_width_deg? } → simulated view
 */
import { Router, type Response } from 'express';
import * as z from 'zod';
import { DEFAULT_PROFILE_HEIGHTS_M } from '../../service/profile.js';
import { REFRACTION_ELEVATION_RANGE_DEG } from '../../service/refraction.js';
import { TRACE_DEFAULTS } from '../../service/trace.js';
import type { ComputePool } from '../compute-pool.js';
import type { ComputeTask } from '../compute-worker.js';
import { HttpError } from '../errors.js';
import { HTTP_LIMITS } from '../limits.js';
import { numberList, parseRequest, rangedInteger, rangedNumber, scenarioFromBody } from '../validate.js';

/** Steepest elevation a ray may start at, degrees (the tracer's limit, sim/trace/options.ts). */
const ELEVATION_LIMIT_DEG = 80;
/** Rays of the automatic fan when a trace request gives neither elevations nor a count. */
export const DEFAULT_FAN_RAYS = 101;
/** Highest height a profile request may ask for, m (the CLI's limit too). */
const PROFILE_TOP_M = 100_000;
/** Widest half field of a view, degrees. */
const VIEW_HALF_WIDTH_LIMIT_DEG = 10;

const elevation = rangedNumber(-ELEVATION_LIMIT_DEG, ELEVATION_LIMIT_DEG, 'degrees');
const [REFRACTION_MIN_DEG, REFRACTION_MAX_DEG] = REFRACTION_ELEVATION_RANGE_DEG;

const profileRequest = z.strictObject({
  scenario: z.unknown(),
  heights_m: numberList(0, PROFILE_TOP_M, 'm', HTTP_LIMITS.profile_heights).optional(),
});

const traceRequest = z
  .strictObject({
    scenario: z.unknown(),
    elevations_deg: numberList(-ELEVATION_LIMIT_DEG, ELEVATION_LIMIT_DEG, 'degrees', HTTP_LIMITS.rays_per_request).optional(),
    fan: z
      .strictObject({ from_deg: elevation.optional(), to_deg: elevation.optional(), count: rangedInteger(1, HTTP_LIMITS.rays_per_request, 'rays') })
      .refine((f) => (f.from_deg === undefined) === (f.to_deg === undefined), { error: 'give both from_deg and to_deg, or neither (automatic span)' })
      .optional(),
    path_points: rangedInteger(2, HTTP_LIMITS.path_points, 'points').optional(),
  })
  .refine((b) => !(b.elevations_deg && b.fan), { error: 'give elevations_deg or fan, not both', path: ['fan'] });

const findingsRequest = z.strictObject({
  scenario: z.unknown(),
  refraction_elevations_deg: numberList(REFRACTION_MIN_DEG, REFRACTION_MAX_DEG, 'degrees', HTTP_LIMITS.refraction_elevations).optional(),
  bodies_deg: numberList(REFRACTION_MIN_DEG, REFRACTION_MAX_DEG, 'degrees', HTTP_LIMITS.bodies).optional(),
  max_height_m: rangedNumber(0, 10_000, 'm').refine((h) => h > 0, { error: 'must be above 0 m (allowed (0, 10000] m)' }).optional(),
  rays: rangedInteger(3, HTTP_LIMITS.transfer_rays, 'rays').optional(),
});

const viewRequest = z
  .strictObject({
    scenario: z.unknown(),
    rows: rangedInteger(2, HTTP_LIMITS.view_side, 'rows').optional(),
    columns: rangedInteger(2, HTTP_LIMITS.view_side, 'columns').optional(),
    from_elevation_deg: elevation.optional(),
    to_elevation_deg: elevation.optional(),
    half_width_deg: rangedNumber(1e-6, VIEW_HALF_WIDTH_LIMIT_DEG, 'degrees').optional(),
  })
  .refine((b) => (b.from_elevation_deg === undefined) === (b.to_elevation_deg === undefined), { error: 'give both from_elevation_deg and to_elevation_deg, or neither', path: ['to_elevation_deg'] })
  .refine((b) => b.from_elevation_deg === undefined || b.to_elevation_deg! > b.from_elevation_deg, { error: 'must be above from_elevation_deg', path: ['to_elevation_deg'] })
  .refine((b) => (b.rows ?? 241) * (b.columns ?? 161) <= HTTP_LIMITS.view_cells, { error: `rows × columns is too many cells: allowed at most ${HTTP_LIMITS.view_cells}`, path: ['rows'] });

/** Rejects a trace whose work (rays × range, rays × path points) exceeds HTTP_LIMITS. */
function checkTraceWork(rays: number, range_m: number, pathPoints: number, field: string): void {
  const range_km = range_m / 1000;
  const maxByRange = Math.floor(HTTP_LIMITS.ray_km_per_request / range_km);
  if (rays > maxByRange) {
    throw new HttpError(400, [{ field, message: `${rays} rays to ${range_km} km is too much work for one request: allowed at most ${maxByRange} rays at this range (${HTTP_LIMITS.ray_km_per_request} ray·km)` }]);
  }
  const maxByPoints = Math.floor(HTTP_LIMITS.path_points_per_request / pathPoints);
  if (rays > maxByPoints) {
    throw new HttpError(400, [{ field, message: `${rays} rays of ${pathPoints} path points is too large a response: allowed at most ${maxByPoints} rays at this path_points (${HTTP_LIMITS.path_points_per_request} points)` }]);
  }
}

/** Removes undefined options (the services read absence as "default"). */
function defined<T extends object>(options: T): T {
  return Object.fromEntries(Object.entries(options).filter(([, v]) => v !== undefined)) as T;
}

export function computeRoutes(pool: ComputePool): Router {
  const router = Router();

  async function answer(res: Response, task: ComputeTask): Promise<void> {
    const result = await pool.run(task);
    if (!result.ok) throw new HttpError(400, result.issues);
    res.type('application/json').send(result.json);
  }

  router.post('/profile', async (req, res) => {
    const body = parseRequest(profileRequest, req.body);
    const { scenario } = scenarioFromBody(body.scenario);
    await answer(res, { kind: 'profile', scenario, heights_m: body.heights_m ?? DEFAULT_PROFILE_HEIGHTS_M });
  });

  router.post('/trace', async (req, res) => {
    const body = parseRequest(traceRequest, req.body);
    const { scenario } = scenarioFromBody(body.scenario);
    const path_points = body.path_points ?? TRACE_DEFAULTS.path_points;
    const fan = body.elevations_deg ? null : { ...body.fan, count: body.fan?.count ?? DEFAULT_FAN_RAYS };
    const rays = body.elevations_deg?.length ?? fan!.count;
    checkTraceWork(rays, scenario.target.range_m, path_points, body.elevations_deg ? 'elevations_deg' : 'fan.count');
    await answer(res, { kind: 'trace', scenario, elevations_deg: body.elevations_deg ?? null, fan, path_points, max_steps: HTTP_LIMITS.steps_per_ray });
  });

  router.post('/findings', async (req, res) => {
    const { scenario: raw, ...options } = parseRequest(findingsRequest, req.body);
    const { scenario } = scenarioFromBody(raw);
    await answer(res, { kind: 'findings', scenario, options: defined(options) });
  });

  router.post('/view', async (req, res) => {
    const { scenario: raw, ...options } = parseRequest(viewRequest, req.body);
    const { scenario } = scenarioFromBody(raw);
    await answer(res, { kind: 'view', scenario, options: defined(options) });
  });

  return router;
}
