/**
 * The scenario files in profiles/: GET /api/scenarios lists those that pass the scenario schema
 * (id, name, description) and names the other JSON files there (outlook sites, say) with the
 * reason; GET /api/scenarios/:id returns one file as stored.
 */
import { readdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Router } from 'express';
import { scenarioFromText } from '../../scenario/load.js';
import { HttpError } from '../errors.js';

/** A scenario id: the file name without `.json` (lower case, digits and dashes). */
const ID_PATTERN = /^[a-z0-9][a-z0-9-]{0,79}$/;

/** One entry of the scenario list. */
export interface ScenarioEntry {
  id: string;
  name: string;
  description: string;
  /** False when the file does not pass the scenario schema (then `problem` says why). */
  valid: boolean;
  problem?: string;
}

/** Lists the scenario files of a folder, sorted by id. */
export async function listScenarios(dir: string): Promise<ScenarioEntry[]> {
  const names = (await readdir(dir)).filter((f) => f.endsWith('.json') && ID_PATTERN.test(f.slice(0, -5))).sort();
  return Promise.all(
    names.map(async (fileName): Promise<ScenarioEntry> => {
      const id = fileName.slice(0, -5);
      const text = await readFile(join(dir, fileName), 'utf8');
      try {
        const { file } = scenarioFromText(text, fileName);
        return { id, name: file.name, description: file.description ?? '', valid: true };
      } catch (error) {
        return { id, name: id, description: '', valid: false, problem: (error as Error).message };
      }
    }),
  );
}

/** Routes of the scenario folder; `defaultId` is the scenario the viewer opens with. */
export function scenarioRoutes(dir: string, defaultId: string): Router {
  const router = Router();
  router.get('/scenarios', async (_req, res) => {
    const entries = await listScenarios(dir);
    res.json({
      default_id: defaultId,
      scenarios: entries.filter((e) => e.valid),
      other_files: entries.filter((e) => !e.valid).map((e) => ({ id: e.id, problem: e.problem })),
    });
  });
  router.get('/scenarios/:id', async (req, res) => {
    const id = req.params.id.replace(/\.json$/, '');
    if (!ID_PATTERN.test(id)) throw new HttpError(400, [{ field: 'id', message: `"${id.slice(0, 80)}" is not a scenario id: allowed lower-case letters, digits and dashes` }]);
    let text: string;
    try {
      text = await readFile(join(dir, `${id}.json`), 'utf8');
    } catch {
      throw new HttpError(404, [{ field: 'id', message: `no scenario "${id}" in profiles/ (GET /api/scenarios lists them)` }]);
    }
    let value: unknown;
    try {
      value = JSON.parse(text);
    } catch {
      throw new HttpError(500, [{ field: 'id', message: `the file profiles/${id}.json is not valid JSON` }]);
    }
    res.json(value);
  });
  return router;
}
