/** Shared pieces of the HTTP tests: the app under test, its log, and a small valid scenario. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createApp } from '../../server/app.js';
import { REPO_ROOT } from '../../server/http/bundle.js';

/**
 * The app with its internal-error log captured (tests assert nothing leaks to clients), computing
 * in worker threads as `npm start` does; close() ends them (call it in afterAll).
 */
export function appUnderTest(options: Parameters<typeof createApp>[0] = {}) {
  const log: string[] = [];
  const { app, close } = createApp({ log: (m) => log.push(m), ...options });
  return { app, log, close };
}

/** A scenario file from profiles/, parsed. */
export function profileFile(id: string): Record<string, unknown> {
  return JSON.parse(readFileSync(join(REPO_ROOT, 'profiles', `${id}.json`), 'utf8')) as Record<string, unknown>;
}

/** A small valid scenario: a surface inversion over a cold sea (invented). */
export const INVERSION = Object.freeze({
  name: 'Test inversion (invented)',
  observer: { height_m: 6 },
  target: { range_m: 20_000, height_m: 30 },
  atmosphere: { surface_pressure_hPa: 1013.25, relative_humidity: 0.5, profile: [{ height_m: 0, temperature_C: 2 }, { height_m: 30, temperature_C: 8 }], above: 'us1976' },
  optics: { wavelength_nm: 550, index_model: 'ciddor' },
});

/** A deep copy of INVERSION with changes applied by `edit`. */
export function inversionWith(edit: (s: Record<string, any>) => void): Record<string, unknown> {
  const copy = structuredClone(INVERSION) as Record<string, any>;
  edit(copy);
  return copy;
}
