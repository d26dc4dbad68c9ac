/**
 * Generated batches of malformed input (fast-check): whatever arrives, the server answers in JSON
 * with a status below 500, and every 4xx body has the error shape with a field and a message.
 */
import fc from 'fast-check';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { appUnderTest, profileFile } from './fixtures.js';

const { app, log, close } = appUnderTest();
afterAll(close);

/** Runs per property: enough to reach deep fields of the scenario, short enough for CI (a few seconds each). */
const RUNS = 120;
/** A fixed seed keeps CI reproducible; a failure prints it with the counterexample. */
const SEED = 20241;

const ROUTES = ['/api/profile', '/api/trace', '/api/findings', '/api/view'] as const;

/** Small requests keep each valid body cheap: a few rays, heights, cells. */
const CHEAP: Record<(typeof ROUTES)[number], object> = {
  '/api/profile': { heights_m: [0, 2, 50] },
  '/api/trace': { fan: { count: 3 }, path_points: 3 },
  '/api/findings': { refraction_elevations_deg: [0] },
  '/api/view': { rows: 5, columns: 3 },
};

async function expectNoServerError(route: string, body: unknown): Promise<void> {
  const res = await request(app).post(route).set('Content-Type', 'application/json').send(JSON.stringify(body));
  expect(res.status, `${route} ${JSON.stringify(body).slice(0, 300)} → ${res.status} ${res.text.slice(0, 300)}`).toBeLessThan(500);
  expect(res.headers['content-type']).toMatch(/json/);
  if (res.status >= 400) {
    expect(typeof res.body.error.field).toBe('string');
    expect(res.body.error.message.length).toBeGreaterThan(0);
    expect(res.body.error.problems.length).toBeGreaterThan(0);
  }
}

/** Every leaf path of a JSON value, as key lists. */
function leafPaths(value: unknown, prefix: (string | number)[] = []): (string | number)[][] {
  if (value !== null && typeof value === 'object') {
    const entries = Array.isArray(value) ? value.map((v, i) => [i, v] as const) : Object.entries(value);
    return [prefix, ...entries.flatMap(([k, v]) => leafPaths(v, [...prefix, k]))];
  }
  return [prefix];
}

function replaceAt(value: unknown, path: (string | number)[], replacement: unknown): unknown {
  if (path.length === 0) return replacement;
  const copy = structuredClone(value) as Record<string | number, unknown>;
  let at = copy;
  for (const key of path.slice(0, -1)) at = at[key] as Record<string | number, unknown>;
  at[path[path.length - 1]] = replacement;
  return copy;
}

/** Values that break things: extremes, wrong types, empty containers, long strings. */
const nasty = fc.oneof(
  fc.jsonValue({ maxDepth: 2 }),
  fc.constantFrom(0, -0, -1, 1e308, -1e308, 5e-324, 1e6, -1e6, 80, 90, 1e-12, '', 'NaN', null, true, [], {}),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.string({ maxLength: 40 }),
);

const SCENARIO_IDS = ['cold-channel-morning', 'inferior-mirage-hot-flats', 'radio-duct-warm-sea', 'standard-air', 'stacked-images'];

describe('generated malformed input', () => {
  it('never gets a 5xx for arbitrary JSON bodies', async () => {
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...ROUTES), fc.jsonValue({ maxDepth: 4 }), async (route, body) => {
        await expectNoServerError(route, body);
      }),
      { numRuns: RUNS, seed: SEED },
    );
  });

  it('never gets a 5xx when one field of a valid scenario is replaced by a nasty value', async () => {
    const files = SCENARIO_IDS.map(profileFile);
    const cases = fc
      .record({ file: fc.constantFrom(...files), route: fc.constantFrom(...ROUTES), pick: fc.nat(), value: nasty })
      .map(({ file, route, pick, value }) => {
        const paths = leafPaths(file).filter((p) => p.length > 0);
        return { route, scenario: replaceAt(file, paths[pick % paths.length], value) };
      });
    await fc.assert(
      fc.asyncProperty(cases, async ({ route, scenario }) => {
        await expectNoServerError(route, { scenario, ...CHEAP[route] });
      }),
      { numRuns: RUNS, seed: SEED },
    );
  });

  it('never gets a 5xx for nasty request options around a valid scenario', async () => {
    const scenario = profileFile('superior-mirage-cold-sea');
    const options = fc.record(
      {
        elevations_deg: fc.oneof(nasty, fc.array(nasty, { maxLength: 4 })),
        fan: fc.oneof(nasty, fc.record({ from_deg: nasty, to_deg: nasty, count: nasty }, { requiredKeys: [] })),
        path_points: nasty,
        heights_m: fc.oneof(nasty, fc.array(nasty, { maxLength: 4 })),
        refraction_elevations_deg: fc.oneof(nasty, fc.array(nasty, { maxLength: 3 })),
        bodies_deg: fc.oneof(nasty, fc.array(nasty, { maxLength: 3 })),
        max_height_m: nasty,
        rays: nasty,
        rows: nasty,
        columns: nasty,
        from_elevation_deg: nasty,
        to_elevation_deg: nasty,
        half_width_deg: nasty,
      },
      { requiredKeys: [] },
    );
    await fc.assert(
      fc.asyncProperty(fc.constantFrom(...ROUTES), options, async (route, extra) => {
        await expectNoServerError(route, { scenario, ...extra });
      }),
      { numRuns: RUNS, seed: SEED },
    );
  });

  it('logged no internal error in all of it', () => {
    expect(log).toEqual([]);
  });
});
