/**
 * Facts about the server: GET /api/health, GET /api/limits (HTTP_LIMITS and the scenario file's
 * LIMITS), GET /api/scenario-schema (the scenario file's JSON Schema, generated from the zod schema
 * so other tools validate files exactly as the server does).
 */
import { Router } from 'express';
import * as z from 'zod';
import { LIMITS, TARGET_SHAPES, scenarioFileSchema } from '../../scenario/schema.js';
import { HTTP_LIMITS } from '../limits.js';

let schemaCache: unknown = null;

/** The scenario file's JSON Schema (draft 2020-12), built once. */
export function scenarioJsonSchema(): unknown {
  schemaCache ??= {
    ...z.toJSONSchema(scenarioFileSchema),
    title: 'Loomline scenario file',
    description: 'Observer, target, air and optics of one Loomline scenario (units in the key names).',
  };
  return schemaCache;
}

export function metaRoutes(version: string, startedAt_ms: number): Router {
  const router = Router();
  router.get('/health', (_req, res) => {
    res.json({ status: 'ok', name: 'loomline', version, uptime_s: Math.round((Date.now() - startedAt_ms) / 1000) });
  });
  router.get('/limits', (_req, res) => {
    const scenario = Object.fromEntries(Object.entries(LIMITS).map(([k, [min, max, unit]]) => [k, { min, max, unit }]));
    res.json({ http: HTTP_LIMITS, scenario, target_shapes: TARGET_SHAPES });
  });
  router.get('/scenario-schema', (_req, res) => {
    res.type('application/schema+json').send(JSON.stringify(scenarioJsonSchema()));
  });
  return router;
}
