/**
 * Validation of request bodies (STYLE.md §6: routes validate once, then call the services).
 * Request options are checked by small zod schemas; the scenario inside a body goes through the
 * one scenario loader (server/scenario/load.ts) plus the server's own range limit, and every
 * field is reported by its dotted path in the body (`scenario.atmosphere.profile.1.height_m`).
 */
import * as z from 'zod';
import { scenarioFromJson, describeIssues } from '../scenario/load.js';
import type { ScenarioFile } from '../scenario/schema.js';
import type { Scenario } from '../../sim/scenario.js';
import { HTTP_LIMITS } from './limits.js';
import { HttpError, inputErrorToHttp, issueFromProblem } from './errors.js';

/** A finite number in [min, max], with messages that give the allowed range and unit. */
export function rangedNumber(min: number, max: number, unit: string) {
  const allowed = `${min}..${max} ${unit}`.trim();
  return z
    .number({ error: (iss) => `expected a number (${allowed}), got ${JSON.stringify(iss.input) ?? String(iss.input)}` })
    .min(min, { error: (iss) => `${String(iss.input)} is out of range: allowed ${allowed}` })
    .max(max, { error: (iss) => `${String(iss.input)} is out of range: allowed ${allowed}` });
}

/** A whole number in [min, max]. */
export function rangedInteger(min: number, max: number, unit: string) {
  return rangedNumber(min, max, unit).refine(Number.isInteger, { error: (iss) => `${String(iss.input)} is not a whole number (allowed ${min}..${max} ${unit})` });
}

/** A list of 1..maxItems numbers in [min, max]. */
export function numberList(min: number, max: number, unit: string, maxItems: number) {
  return z
    .array(rangedNumber(min, max, unit), { error: `expected a list of numbers (${min}..${max} ${unit})` })
    .min(1, { error: 'expected at least one value' })
    .max(maxItems, { error: (iss) => `too many values (${(iss.input as unknown[]).length}): allowed at most ${maxItems}` });
}

/** Parses a request body with a zod schema; throws HttpError(400) listing every problem by field. */
export function parseRequest<T>(schema: z.ZodType<T>, body: unknown): T {
  if (body === undefined || body === null || typeof body !== 'object' || Array.isArray(body)) {
    throw new HttpError(400, [{ field: 'body', message: 'expected a JSON object (Content-Type: application/json)' }]);
  }
  const result = schema.safeParse(body);
  if (!result.success) throw new HttpError(400, describeIssues(result.error.issues).map(issueFromProblem));
  return result.data;
}

/** SI suffixes of sim/ error fields and the file-format suffixes they stand for. */
const FILE_SUFFIXES: [RegExp, string][] = [
  [/^target\.outline_m\b/, 'target.outline'],
  [/temperature_K$/, 'temperature_C'],
  [/pressure_Pa$/, 'pressure_hPa'],
  [/wavelength_um$/, 'wavelength_nm'],
];

/**
 * Names a field reported by sim/ (SI, its own structure) by its place in a request body:
 * `observerHeight_m` → `scenario.observer.height_m`, `atmosphere.nodes[1].temperature_K` →
 * `scenario.atmosphere.profile.1.temperature_C`. Fields that are not part of a scenario are kept,
 * unless `always` (the field is known to be inside the scenario).
 */
export function scenarioField(field: string, prefix = 'scenario', always = false): string {
  if (field === 'observerHeight_m') return `${prefix}.observer.height_m`;
  if (!always && !/^(atmosphere|optics|observer|target|earth|name|description)\b/.test(field)) return field;
  let path = field.replace(/\.nodes\[(\d+)\]/g, '.profile.$1').replace(/\[(\d+)\]/g, '.$1');
  for (const [pattern, replacement] of FILE_SUFFIXES) path = path.replace(pattern, replacement);
  return path ? `${prefix}.${path}` : prefix;
}

/** A scenario from a request body, validated by the loader and the server's limits. */
export interface BodyScenario {
  file: ScenarioFile;
  scenario: Scenario;
}

/**
 * Validates `body[field]` as a scenario file and converts it; every error names the field inside
 * the body (`scenario.target.range_m`). Also applies HTTP_LIMITS.range_m.
 */
export function scenarioFromBody(value: unknown, prefix = 'scenario'): BodyScenario {
  if (value === undefined) throw new HttpError(400, [{ field: prefix, message: 'required: a scenario object (see GET /api/scenario-schema)' }]);
  let parsed: BodyScenario;
  try {
    parsed = scenarioFromJson(value);
  } catch (error) {
    throw inputErrorToHttp(error, (f) => (f === 'scenario' || f === '' ? prefix : scenarioField(f, prefix, true))) ?? error;
  }
  const range_m = parsed.scenario.target.range_m;
  if (range_m > HTTP_LIMITS.range_m) {
    throw new HttpError(400, [{ field: `${prefix}.target.range_m`, message: `${range_m} is beyond the server's limit: allowed 10..${HTTP_LIMITS.range_m} m` }]);
  }
  return parsed;
}
