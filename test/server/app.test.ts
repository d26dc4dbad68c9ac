/**
 * server/app.ts: the happy path of every route. The computing routes must give exactly what the
 * service functions give (the CLI calls the same functions).
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { REPO_ROOT, ensureViewerBundle } from '../../server/http/bundle.js';
import { HTTP_LIMITS } from '../../server/http/limits.js';
import { scenarioFromJson } from '../../server/scenario/load.js';
import { LIMITS } from '../../server/scenario/schema.js';
import { profileLevels } from '../../server/service/profile.js';
import { findings } from '../../server/service/findings.js';
import { automaticFan, traceRays } from '../../server/service/trace.js';
import { viewFinding } from '../../server/service/view.js';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { expectClose } from '../support/close.js';
import { INVERSION, appUnderTest, profileFile } from './fixtures.js';

const { app, log, close } = appUnderTest();
afterAll(close);
const json = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

describe('meta routes', () => {
  it('answers the health check with the package version', async () => {
    const res = await request(app).get('/api/health').expect(200);
    const version = JSON.parse(readFileSync(join(REPO_ROOT, 'package.json'), 'utf8')).version;
    expect(res.body).toMatchObject({ status: 'ok', name: 'loomline', version });
  });

  it('publishes the HTTP limits and the scenario ranges', async () => {
    const res = await request(app).get('/api/limits').expect(200);
    expect(res.body.http).toEqual(json(HTTP_LIMITS));
    expect(res.body.scenario.observer_height_m).toEqual({ min: LIMITS.observer_height_m[0], max: LIMITS.observer_height_m[1], unit: 'm' });
  });

  it('serves the scenario JSON Schema generated from the zod schema, ranges included', async () => {
    const res = await request(app).get('/api/scenario-schema').expect(200).expect('Content-Type', /schema\+json/);
    const schema = JSON.parse(res.text);
    expect(schema.$schema).toMatch(/json-schema/);
    expect(schema.required).toEqual(expect.arrayContaining(['name', 'observer', 'target', 'atmosphere']));
    expect(schema.additionalProperties).toBe(false);
    const observerHeight = schema.properties.observer.properties.height_m.anyOf[0];
    expect([observerHeight.minimum, observerHeight.maximum]).toEqual([LIMITS.observer_height_m[0], LIMITS.observer_height_m[1]]);
  });
});

describe('scenario routes', () => {
  it('lists the scenario files of profiles/ by id and names every other JSON file there with its problem', async () => {
    const res = await request(app).get('/api/scenarios').expect(200);
    const files = readdirSync(join(REPO_ROOT, 'profiles')).filter((f) => f.endsWith('.json')).map((f) => f.slice(0, -5)).sort();
    const listed = res.body.scenarios.map((s: { id: string }) => s.id);
    const others = res.body.other_files.map((s: { id: string }) => s.id);
    expect([...listed, ...others].sort()).toEqual(files);
    // The six kinds of scenario issue 4 asks for, and the built-in default.
    for (const id of ['standard-air', 'looming-coast', 'superior-mirage-cold-sea', 'stacked-images', 'inferior-mirage-hot-flats', 'radio-duct-warm-sea', 'cold-channel-morning']) {
      expect(listed).toContain(id);
    }
    for (const entry of res.body.scenarios) {
      expect(entry.valid).toBe(true);
      expect(entry.name).toBe(profileFile(entry.id).name);
      expect(entry.description.length).toBeGreaterThan(10);
    }
    for (const entry of res.body.other_files) expect(entry.problem).toMatch(/\w+: /);
    expect(res.body.default_id).toBe('cold-channel-morning');
  });

  it('returns one scenario file as stored', async () => {
    const res = await request(app).get('/api/scenarios/inferior-mirage-hot-flats').expect(200);
    expect(res.body).toEqual(profileFile('inferior-mirage-hot-flats'));
  });

  it('answers 404 in JSON for a scenario that does not exist', async () => {
    const res = await request(app).get('/api/scenarios/no-such-place').expect(404);
    expect(res.body.error.field).toBe('id');
  });
});

describe('POST /api/profile', () => {
  it('gives the same levels as the CLI profile command\'s service function', async () => {
    const heights_m = [0, 1, 5, 10, 29.5, 30, 31, 200];
    const res = await request(app).post('/api/profile').send({ scenario: INVERSION, heights_m }).expect(200);
    const { scenario } = scenarioFromJson(INVERSION);
    const direct = profileLevels(scenario, heights_m);
    expect(res.body.levels).toEqual(json(direct.levels));
    expect(res.body).toMatchObject({ scenario: INVERSION.name, index_model: 'ciddor', wavelength_nm: 550, warnings: direct.warnings });
  });

  it('gives the ducting threshold as the gradient of N at which M = N + 0.157 z stays constant', async () => {
    // ITU-R P.453: M = N + 0.157·h (h in m); dM/dz = 0 ⇔ dN/dz = −0.157 per m (REFERENCES.md §2.2).
    const res = await request(app).post('/api/profile').send({ scenario: INVERSION }).expect(200);
    expectClose(res.body.duct_threshold_dN_dz_per_m, -0.157, { abs: 1e-12 });
    expect(res.body.levels.length).toBeGreaterThan(5);
  });
});

describe('POST /api/trace', () => {
  it('gives the same rays as the trace service for explicit elevations', async () => {
    const elevations_deg = [-0.2, -0.05, 0, 0.05, 0.2];
    const res = await request(app).post('/api/trace').send({ scenario: INVERSION, elevations_deg, path_points: 11 }).expect(200);
    const { scenario } = scenarioFromJson(INVERSION);
    expect(res.body).toEqual(json({ ...traceRays(scenario, elevations_deg, { path_points: 11 }), fan: null }));
  });

  it('spaces a given fan evenly and reports it', async () => {
    const res = await request(app).post('/api/trace').send({ scenario: INVERSION, fan: { from_deg: -0.1, to_deg: 0.1, count: 5 } }).expect(200);
    expectClose(res.body.rays.map((r: { elevation_deg: number }) => r.elevation_deg), [-0.1, -0.05, 0, 0.05, 0.1], { abs: 1e-15 });
    expect(res.body.fan).toEqual({ from_deg: -0.1, to_deg: 0.1, count: 5 });
  });

  it('frames the target with the automatic fan when only a count is given', async () => {
    const res = await request(app).post('/api/trace').send({ scenario: INVERSION, fan: { count: 21 }, path_points: 5 }).expect(200);
    const { scenario } = scenarioFromJson(INVERSION);
    const fan = automaticFan(scenario, buildMedium(scenario));
    expect(res.body.fan).toEqual({ ...fan, count: 21 });
    expect(res.body.rays).toHaveLength(21);
    expect(res.body.rays[0].fate).toBe('surface');
  });

  it('traces the default fan when the body holds only a scenario', async () => {
    const res = await request(app).post('/api/trace').send({ scenario: INVERSION }).expect(200);
    expect(res.body.rays).toHaveLength(101);
  });
});

describe('POST /api/findings', () => {
  it('gives the same findings as the findings service (the CLI findings command\'s function), caution included', async () => {
    const res = await request(app).post('/api/findings').send({ scenario: INVERSION, refraction_elevations_deg: [0, 5] }).expect(200);
    const { scenario } = scenarioFromJson(INVERSION);
    expect(res.body).toEqual(json(findings(scenario, { refraction_elevations_deg: [0, 5] })));
    expect(res.body.caution).toMatch(/defer to official observations/i);
    expect(res.body.refraction.rows.map((r: { apparent_elevation_deg: number }) => r.apparent_elevation_deg)).toEqual([0, 5]);
  });
});

describe('POST /api/view', () => {
  it('gives the same view as the view service, with the grid size asked for', async () => {
    const res = await request(app).post('/api/view').send({ scenario: INVERSION, rows: 31, columns: 21 }).expect(200);
    const { scenario } = scenarioFromJson(INVERSION);
    expect(res.body).toEqual(json(viewFinding(scenario, { rows: 31, columns: 21 })));
    expect(res.body.classes).toHaveLength(31);
    expect(res.body.classes[0]).toHaveLength(21);
  });
});

describe('POST /api/ensemble (mounted from server/http/routes/ensemble.ts)', () => {
  it('streams the ensemble result as NDJSON', async () => {
    const scenario = { ...INVERSION, observer: { height_m: { uniform: { min: 5, max: 7 } } }, optics: { index_model: 'none' } };
    const res = await request(app).post('/api/ensemble').send({ scenario, members: 3, seed: 1 }).expect(200);
    const last = JSON.parse(res.text.trim().split('\n').at(-1) as string);
    expect(last.type).toBe('result');
    expect(last.result.members).toBe(3);
  });
});

describe('the viewer and unknown routes', () => {
  beforeAll(async () => {
    await ensureViewerBundle();
  });

  it('serves the viewer page with an empty icon and no outside resources', async () => {
    const res = await request(app).get('/').expect(200).expect('Content-Type', /html/);
    expect(res.text).toContain('<link rel="icon" href="data:,">');
    expect(res.text).not.toMatch(/(src|href)="https?:/);
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
  });

  it('serves the viewer bundle and Plotly from node_modules', async () => {
    const bundle = await request(app).get('/app.js').expect(200).expect('Content-Type', /javascript/);
    expect(bundle.text.length).toBeGreaterThan(1000);
    const plotly = await request(app).get('/vendor/plotly.min.js').expect(200).expect('Content-Type', /javascript/);
    const installed = readFileSync(join(REPO_ROOT, 'node_modules', 'plotly.js-dist-min', 'plotly.min.js'), 'utf8');
    expect(plotly.text.length).toBe(installed.length);
  });

  it('answers unknown routes with 404 in JSON, inside and outside /api', async () => {
    for (const path of ['/api/nothing-here', '/no/such/page']) {
      const res = await request(app).get(path).expect(404).expect('Content-Type', /json/);
      expect(res.body.error.message).toContain(path.replace('/api', ''));
    }
    await request(app).post('/api/health').send({}).expect(404);
  });

  it('logged no internal errors on the way', () => {
    expect(log).toEqual([]);
  });
});
