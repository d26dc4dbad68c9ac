/**
 * The ensemble HTTP routes: progress streamed as NDJSON then the result, bad input answered with a
 * 400 naming the field before anything is streamed, and the report as an HTML attachment.
 */
import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { errorHandler } from '../../server/http/errors.js';
import { ensembleRoutes } from '../../server/http/routes/ensemble.js';

/** The routes as the server mounts them (JSON body parser, /api prefix, the shared error handler). */
function app() {
  const a = express();
  a.use('/api', express.json(), ensembleRoutes());
  a.use(errorHandler(256 * 1024, () => undefined));
  return a;
}

const SCENARIO = {
  name: 'HTTP ensemble test (invented)',
  observer: { height_m: { normal: { mean: 10, sd: 1 } } },
  target: { range_m: { uniform: { min: 15000, max: 25000 } }, height_m: 5 },
  atmosphere: { profile: [{ height_m: 0, temperature_C: 10 }] },
  optics: { index_model: 'none' },
};

describe('POST /api/ensemble', () => {
  it('streams progress lines and then the result', async () => {
    const res = await request(app()).post('/api/ensemble').send({ scenario: SCENARIO, members: 4, seed: 3 }).buffer(true).parse((r, done) => {
      let text = '';
      r.on('data', (c: Buffer) => (text += c.toString()));
      r.on('end', () => done(null, text));
    });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/x-ndjson/);
    const lines = (res.body as string).trim().split('\n').map((l) => JSON.parse(l));
    expect(lines.filter((l) => l.type === 'progress').map((l) => l.finished)).toEqual([1, 2, 3, 4]);
    const last = lines[lines.length - 1];
    expect(last.type).toBe('result');
    expect(last.result.members).toBe(4);
    expect(last.result.seed).toBe(3);
    expect(Object.keys(last.result.probabilities)).toEqual(['visible', 'partly_hidden', 'hidden']);
  });

  it('answers 400 naming the field for bad options or a bad scenario', async () => {
    const members = await request(app()).post('/api/ensemble').send({ scenario: SCENARIO, members: 5000 });
    expect(members.status).toBe(400);
    expect(members.body.error.field).toBe('members');
    const scenario = await request(app()).post('/api/ensemble').send({ scenario: { ...SCENARIO, observer: { height_m: -3 } } });
    expect(scenario.status).toBe(400);
    expect(scenario.body.error.field).toBe('scenario.observer.height_m');
  });
});

describe('POST /api/report', () => {
  it('sends the self-contained report as an attachment', async () => {
    const res = await request(app()).post('/api/report').send({ scenario: SCENARIO, members: 3 });
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toBe('attachment; filename="loomline-report.html"');
    expect(res.text.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(res.text.includes('<section id="reproducibility">')).toBe(true);
  });
});
