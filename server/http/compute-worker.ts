/**
 * The computing half of the HTTP API: one task per request, run in a piscina worker thread
 * (loaded as ES modules through server/ts-worker-entry.mjs, so this file stays TypeScript) or in
 * the main thread when the app has no pool. Requests arrive validated (server/http/validate.ts);
 * this calls the same service functions as the CLI and returns the result as JSON text
 * (serialised here, off the main thread), or the input problems by field. Each thread keeps its
 * own cache of built media (the scenarios' and their US 1976 references').
 */
import { findings } from '../service/findings.js';
import { profileLevels } from '../service/profile.js';
import { automaticFan, fanElevations, traceRays } from '../service/trace.js';
import { viewFinding } from '../service/view.js';
import type { Scenario } from '../../sim/scenario.js';
import { modifiedRefractivity_M } from '../../sim/refractivity/radio.js';
import { inputErrorToHttp, type Issue } from './errors.js';
import { MediumCache } from './medium-cache.js';
import { scenarioField } from './validate.js';

/** Work of one request; `scenario` is the validated SI scenario. */
export type ComputeTask =
  | { kind: 'profile'; scenario: Scenario; heights_m: number[] }
  | { kind: 'trace'; scenario: Scenario; elevations_deg: number[] | null; fan: { from_deg?: number; to_deg?: number; count: number } | null; path_points: number; max_steps: number }
  | { kind: 'findings'; scenario: Scenario; options: { refraction_elevations_deg?: number[]; bodies_deg?: number[]; max_height_m?: number; rays?: number } }
  | { kind: 'view'; scenario: Scenario; options: { rows?: number; columns?: number; from_elevation_deg?: number; to_elevation_deg?: number; half_width_deg?: number } };

/** The answer: the result as JSON text, or the problems with the input. */
export type ComputeAnswer = { ok: true; json: string } | { ok: false; issues: Issue[] };

/** Option names of sim/ and the services that differ from the request body's, per task. */
const REQUEST_FIELDS: Record<ComputeTask['kind'], Record<string, string>> = {
  profile: { '--heights': 'heights_m' },
  trace: {},
  findings: { elevations_deg: 'refraction_elevations_deg', maxHeight_m: 'max_height_m' },
  view: {},
};

const media = new MediumCache();

function run(task: ComputeTask): unknown {
  const scenario = task.scenario;
  const medium = media.get(scenario);
  switch (task.kind) {
    case 'profile': {
      const { levels, warnings, top_m } = profileLevels(scenario, task.heights_m, medium);
      return {
        scenario: scenario.name,
        index_model: scenario.optics.index_model,
        wavelength_nm: scenario.optics.wavelength_um * 1000,
        top_m,
        // Gradient of N at which a horizontal ray follows the Earth (dM/dz = 0), per m: M = N + 0.157·z.
        duct_threshold_dN_dz_per_m: -modifiedRefractivity_M(0, 1),
        levels,
        warnings,
      };
    }
    case 'trace': {
      let elevations = task.elevations_deg;
      let fan: { from_deg: number; to_deg: number; count: number } | null = null;
      if (!elevations) {
        const given = task.fan?.from_deg !== undefined && task.fan?.to_deg !== undefined;
        const span = given ? { from_deg: task.fan!.from_deg!, to_deg: task.fan!.to_deg! } : automaticFan(scenario, medium);
        fan = { ...span, count: task.fan?.count ?? 1 };
        elevations = fanElevations(span.from_deg, span.to_deg, fan.count);
      }
      return { ...traceRays(scenario, elevations, { path_points: task.path_points, max_steps: task.max_steps, medium }), fan };
    }
    case 'findings':
      return findings(scenario, { ...task.options, medium, media });
    case 'view':
      return viewFinding(scenario, { ...task.options, medium });
  }
}

/**
 * Runs one task. Input errors (InputError, InputRangeError) come back as issues named as in the
 * request body; anything else is thrown (the server answers 500 and logs it).
 */
export default function compute(task: ComputeTask): ComputeAnswer {
  try {
    return { ok: true, json: JSON.stringify(run(task)) };
  } catch (error) {
    const http = inputErrorToHttp(error, (field) => {
      for (const [from, to] of Object.entries(REQUEST_FIELDS[task.kind])) if (field === from || field.startsWith(`${from}[`)) return to + field.slice(from.length);
      return scenarioField(field);
    });
    if (http) return { ok: false, issues: http.issues };
    throw error;
  }
}
