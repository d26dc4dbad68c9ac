/**
 * Bad bodies and limits: every one is answered 400 (413 for size) in JSON, naming the field as a
 * dotted path in the body and the allowed range; internal failures are 500 without details.
 */
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { HTTP_LIMITS } from '../../server/http/limits.js';
import { MAX_PROFILE_NODES } from '../../server/scenario/schema.js';
import { INVERSION, appUnderTest, inversionWith } from './fixtures.js';

const { app, log, close } = appUnderTest();
afterAll(close);

interface ErrorAnswer {
  status: number;
  field: string;
  message: string;
  problems: string[];
}

async function post(path: string, body: unknown): Promise<ErrorAnswer> {
  const res = await request(app).post(path).send(body as object);
  return { status: res.status, field: res.body?.error?.field, message: res.body?.error?.message, problems: res.body?.error?.problems };
}

describe('bad bodies', () => {
  it('rejects malformed JSON, naming the body', async () => {
    const res = await request(app).post('/api/trace').set('Content-Type', 'application/json').send('{"scenario": ').expect(400);
    expect(res.body.error.field).toBe('body');
    expect(res.body.error.message).toMatch(/not valid JSON/);
  });

  it('rejects a body that is not a JSON object, or not sent as JSON', async () => {
    expect(await post('/api/profile', [1, 2])).toMatchObject({ status: 400, field: 'body' });
    const res = await request(app).post('/api/profile').set('Content-Type', 'text/plain').send('scenario').expect(400);
    expect(res.body.error.message).toMatch(/Content-Type: application\/json/);
  });

  it('requires the scenario', async () => {
    expect(await post('/api/trace', { fan: { count: 3 } })).toMatchObject({ status: 400, field: 'scenario' });
  });

  it('names a scenario field out of range with its allowed range', async () => {
    const answer = await post('/api/trace', { scenario: inversionWith((s) => (s.observer.height_m = -6)) });
    expect(answer).toMatchObject({ status: 400, field: 'scenario.observer.height_m' });
    expect(answer.message).toContain('allowed 0..10000 m');
  });

  it('names an unknown key of the scenario and of the request', async () => {
    const inScenario = await post('/api/profile', { scenario: inversionWith((s) => (s.observer.eye_m = 2)) });
    expect(inScenario).toMatchObject({ status: 400, field: 'scenario.observer.eye_m' });
    const inRequest = await post('/api/profile', { scenario: INVERSION, height_list: [1] });
    expect(inRequest).toMatchObject({ status: 400, field: 'height_list' });
  });

  it('names a node whose height does not increase, by its index', async () => {
    const answer = await post('/api/trace', { scenario: inversionWith((s) => (s.atmosphere.profile[1].height_m = 0)) });
    expect(answer).toMatchObject({ status: 400, field: 'scenario.atmosphere.profile.1.height_m' });
    expect(answer.message).toMatch(/increase/);
  });

  it('lists every problem when there are several', async () => {
    const answer = await post('/api/trace', { scenario: inversionWith((s) => { s.observer.height_m = 'high'; s.target.height_m = -1; }) });
    expect(answer.status).toBe(400);
    expect(answer.problems).toHaveLength(2);
    expect(answer.problems.join('\n')).toMatch(/scenario\.observer\.height_m[\s\S]*scenario\.target\.height_m/);
  });

  it('names a wavelength outside the index model\'s range', async () => {
    const answer = await post('/api/profile', { scenario: inversionWith((s) => (s.optics.wavelength_nm = 200)) });
    expect(answer).toMatchObject({ status: 400, field: 'scenario.optics.wavelength_nm' });
    expect(answer.message).toContain('300..1700');
  });

  it('refuses both elevations and a fan in one trace request', async () => {
    expect(await post('/api/trace', { scenario: INVERSION, elevations_deg: [0], fan: { count: 3 } })).toMatchObject({ status: 400, field: 'fan' });
  });

  it('refuses a fan with only one end given', async () => {
    expect(await post('/api/trace', { scenario: INVERSION, fan: { from_deg: 0, count: 3 } })).toMatchObject({ status: 400, field: 'fan' });
  });

  it('names a profile height above the modelled air with the air\'s top', async () => {
    // A constant lapse of −6.5 K/km from 15 °C leaves the accepted 150 K at about 21 km.
    const scenario = inversionWith((s) => (s.atmosphere.above = { lapse_K_per_m: -0.0065 }));
    const answer = await post('/api/profile', { scenario, heights_m: [0, 30_000] });
    expect(answer).toMatchObject({ status: 400, field: 'heights_m[1]' });
    expect(answer.message).toMatch(/allowed 0\.\.\d+/);
  });
});

describe('limits', () => {
  it('refuses more rays than HTTP_LIMITS.rays_per_request', async () => {
    const answer = await post('/api/trace', { scenario: INVERSION, fan: { count: HTTP_LIMITS.rays_per_request + 1 } });
    expect(answer).toMatchObject({ status: 400, field: 'fan.count' });
    expect(answer.message).toContain(`1..${HTTP_LIMITS.rays_per_request}`);
    const list = await post('/api/trace', { scenario: INVERSION, elevations_deg: Array(HTTP_LIMITS.rays_per_request + 1).fill(0) });
    expect(list).toMatchObject({ status: 400, field: 'elevations_deg' });
  });

  it('refuses a fan whose rays × range exceed the work per request', async () => {
    const far = inversionWith((s) => (s.target.range_m = 200_000));
    const answer = await post('/api/trace', { scenario: far, fan: { count: 2001 } });
    expect(answer).toMatchObject({ status: 400, field: 'fan.count' });
    expect(answer.message).toContain(`at most ${HTTP_LIMITS.ray_km_per_request / 200} rays`);
  });

  it('refuses a response larger than the path points per request', async () => {
    const answer = await post('/api/trace', { scenario: INVERSION, fan: { count: 2000 }, path_points: 1000 });
    expect(answer).toMatchObject({ status: 400, field: 'fan.count' });
    expect(answer.message).toContain('path_points');
  });

  it('refuses more path points per ray than HTTP_LIMITS.path_points', async () => {
    expect(await post('/api/trace', { scenario: INVERSION, path_points: HTTP_LIMITS.path_points + 1 })).toMatchObject({ status: 400, field: 'path_points' });
  });

  it('refuses a target range beyond HTTP_LIMITS.range_m', async () => {
    const answer = await post('/api/trace', { scenario: inversionWith((s) => (s.target.range_m = HTTP_LIMITS.range_m + 1)) });
    expect(answer).toMatchObject({ status: 400, field: 'scenario.target.range_m' });
    expect(answer.message).toContain(String(HTTP_LIMITS.range_m));
  });

  it('refuses more temperature nodes than the file format allows', async () => {
    const nodes = Array.from({ length: MAX_PROFILE_NODES + 1 }, (_, i) => ({ height_m: i, temperature_C: 10 }));
    const answer = await post('/api/profile', { scenario: inversionWith((s) => (s.atmosphere.profile = nodes)) });
    expect(answer).toMatchObject({ status: 400, field: 'scenario.atmosphere.profile' });
    expect(answer.message).toContain(String(MAX_PROFILE_NODES));
  });

  it('refuses more profile heights than HTTP_LIMITS.profile_heights', async () => {
    const heights_m = Array.from({ length: HTTP_LIMITS.profile_heights + 1 }, (_, i) => i);
    expect(await post('/api/profile', { scenario: INVERSION, heights_m })).toMatchObject({ status: 400, field: 'heights_m' });
  });

  it('refuses a view of more cells than HTTP_LIMITS.view_cells, and a side beyond HTTP_LIMITS.view_side', async () => {
    const big = await post('/api/view', { scenario: INVERSION, rows: 1000, columns: 1000 });
    expect(big).toMatchObject({ status: 400, field: 'rows' });
    expect(big.message).toContain(String(HTTP_LIMITS.view_cells));
    expect(await post('/api/view', { scenario: INVERSION, columns: HTTP_LIMITS.view_side + 1 })).toMatchObject({ status: 400, field: 'columns' });
  });

  it('refuses findings options out of range, naming each', async () => {
    expect(await post('/api/findings', { scenario: INVERSION, rays: HTTP_LIMITS.transfer_rays + 1 })).toMatchObject({ status: 400, field: 'rays' });
    expect(await post('/api/findings', { scenario: INVERSION, refraction_elevations_deg: [0, 95] })).toMatchObject({ status: 400, field: 'refraction_elevations_deg.1' });
    expect(await post('/api/findings', { scenario: INVERSION, bodies_deg: Array(HTTP_LIMITS.bodies + 1).fill(0) })).toMatchObject({ status: 400, field: 'bodies_deg' });
    expect(await post('/api/findings', { scenario: INVERSION, max_height_m: 0 })).toMatchObject({ status: 400, field: 'max_height_m' });
  });

  it('answers 413 naming the body when it exceeds HTTP_LIMITS.body_bytes', async () => {
    const res = await request(app).post('/api/trace').set('Content-Type', 'application/json').send(JSON.stringify({ scenario: INVERSION, pad: 'x'.repeat(HTTP_LIMITS.body_bytes) })).expect(413);
    expect(res.body.error).toMatchObject({ field: 'body' });
    expect(res.body.error.message).toContain(String(HTTP_LIMITS.body_bytes));
  });
});

describe('internal failures', () => {
  it('answers 500 with a fixed message and logs the details on the server only', async () => {
    const broken = appUnderTest({ profilesDir: '/nonexistent/loomline-profiles', workers: 0 });
    const res = await request(broken.app).get('/api/scenarios').expect(500);
    expect(res.body.error.message).toMatch(/^internal error/);
    expect(JSON.stringify(res.body)).not.toMatch(/ENOENT|nonexistent|at .*\.ts:\d+/);
    expect(broken.log.join('\n')).toMatch(/ENOENT/);
    await broken.close();
  });

  it('logged nothing while answering bad input', () => {
    expect(log).toEqual([]);
  });
});
