import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.js';
import { errorHandler } from '../../server/http/errors.js';
import { outlookRoutes } from '../../server/http/outlook.js';
import { SERIES_HEADER } from '../../server/outlook/csv.js';

/** The outlook routes behind the API's own JSON parser and error handler. */
function app() {
  const log: string[] = [];
  const server = express();
  server.use('/api', express.json(), outlookRoutes());
  server.use(errorHandler(256 * 1024, (m) => log.push(m)));
  return { server, log };
}

const SITE = {
  name: 'Test pier (invented)',
  observer: { height_m: 5 },
  measurements: { air_temperature_height_m: 10, wind_height_m: 10 },
  landmark: { range_m: 20000, height_m: 30 },
};

describe('the outlook routes', () => {
  it('answer a series and a site with the same outlook JSON as the CLI', async () => {
    const { server, log } = app();
    const series_csv = [SERIES_HEADER, '2031-07-02T15:00Z,15,10,5,80,1013', '2031-07-02T17:00Z,15,20,5,80,1013'].join('\n');
    const res = await request(server).post('/api/outlook').send({ series_csv, site: SITE }).expect(200);
    expect(log).toEqual([]);
    expect(res.body.rows.map((r: { time: string }) => r.time)).toEqual(['2031-07-02T15:00Z', '2031-07-02T17:00Z']);
    expect(res.body.rows[0].landmark_shift_arcmin).toBeGreaterThan(0);
    expect(res.body.rows[1].landmark_shift_arcmin).toBeLessThan(0);
    expect(res.body.caution).toMatch(/Model estimate only/);
  });

  it('name bad rows under series_csv and bad site fields by their path, with status 400', async () => {
    const { server } = app();
    const bad = await request(server)
      .post('/api/outlook')
      .send({ series_csv: `${SERIES_HEADER}\n2031-07-02T15:00Z,15,10,55,80,1013`, site: SITE })
      .expect(400);
    expect(bad.body.error.field).toBe('series_csv');
    expect(bad.body.error.problems).toContain('series_csv: line 2, wind_speed_m_s: 55 is out of range: allowed 0..40 m/s');
    const site = await request(server)
      .post('/api/outlook')
      .send({ series_csv: SERIES_HEADER, site: { ...SITE, landmark: { range_m: 1, height_m: 30 } } })
      .expect(400);
    expect(site.body.error.field).toBe('site.landmark.range_m');
    expect(site.body.error.message).toMatch(/allowed 10..1000000 m/);
    const missing = await request(server).post('/api/outlook').send({ series_csv: SERIES_HEADER }).expect(400);
    expect(missing.body.error.field).toBe('site');
  });

  it('serve the demo files of profiles/, also from the whole API', async () => {
    const { server } = app();
    const res = await request(server).get('/api/outlook/demo').expect(200);
    expect(res.body.site.name).toMatch(/invented/i);
    expect(res.body.series_csv).toContain(SERIES_HEADER);
    const whole = createApp({ workers: 0, log: () => undefined });
    try {
      const again = await request(whole.app).get('/api/outlook/demo').expect(200);
      expect(again.body).toEqual(res.body);
    } finally {
      await whole.close();
    }
  });
});
