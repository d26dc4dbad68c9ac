/**
 * The outlook routes (DESIGN.md §6 `outlook` over HTTP), thin like the others (STYLE.md §15):
 *   POST /api/outlook        { series_csv, site, skip_bad_rows? } → the outlook JSON of the CLI
 *   GET  /api/outlook/demo   { series_csv, site }: the demo files of profiles/
 * Rows are computed on the worker pool (server/outlook/pool.ts) for long series, so the event loop
 * stays free; a request is bounded by OUTLOOK_HTTP_LIMITS.
 */
import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { Router } from 'express';
import * as z from 'zod';
import { SAFETY_CAUTION } from '../service/caution.js';
import { parseSeriesCsv } from '../outlook/csv.js';
import { SeriesError } from '../outlook/errors.js';
import { siteFromJson } from '../outlook/site.js';
import { computeOutlook } from '../service/outlook.js';
import { REPO_ROOT } from './bundle.js';
import { HttpError, inputErrorToHttp } from './errors.js';
import { parseRequest } from './validate.js';

/** Limits of one outlook request. */
export const OUTLOOK_HTTP_LIMITS = Object.freeze({
  /** Most rows computed (a week of hours); a row costs about 0.1–0.5 s of one core. */
  rows: 168,
  /** Longest series text, characters (a week of rows is about 8 KB). */
  series_chars: 100_000,
});

/** The demo of profiles/ (README): an invented site and an invented two-day series. */
export const OUTLOOK_DEMO = Object.freeze({
  site: join(REPO_ROOT, 'profiles', 'outlook', 'site-tarrowgale-head.json'),
  series: join(REPO_ROOT, 'profiles', 'outlook', 'tarrowgale-two-days.csv'),
});

const outlookRequest = z.strictObject({
  series_csv: z
    .string({ error: 'expected the series as CSV text (header: time,air_temperature_C,sea_temperature_C,wind_speed_m_s,relative_humidity_pct,pressure_hPa)' })
    .max(OUTLOOK_HTTP_LIMITS.series_chars, { error: `too long: allowed at most ${OUTLOOK_HTTP_LIMITS.series_chars} characters` }),
  site: z.unknown(),
  skip_bad_rows: z.boolean().optional(),
});

/** Series problems all concern the body's series_csv; site problems already name `site.<field>`. */
function asHttp(error: unknown): unknown {
  if (error instanceof SeriesError) return new HttpError(400, error.problems.map((message) => ({ field: 'series_csv', message })));
  return inputErrorToHttp(error) ?? error;
}

export function outlookRoutes(): Router {
  const router = Router();

  router.post('/outlook', async (req, res) => {
    const body = parseRequest(outlookRequest, req.body);
    try {
      if (body.site === undefined) throw new HttpError(400, [{ field: 'site', message: 'required: a site object (observer, measurements, landmark)' }]);
      const site = siteFromJson(body.site);
      const series = parseSeriesCsv(body.series_csv);
      if (series.rows.length > OUTLOOK_HTTP_LIMITS.rows) {
        throw new HttpError(400, [{ field: 'series_csv', message: `${series.rows.length} rows is too many for one request: allowed at most ${OUTLOOK_HTTP_LIMITS.rows}` }]);
      }
      const result = await computeOutlook(series, site, { skipBadRows: body.skip_bad_rows ?? false });
      res.json({ ...result, caution: SAFETY_CAUTION });
    } catch (error) {
      throw asHttp(error);
    }
  });

  router.get('/outlook/demo', async (_req, res) => {
    const [site, series_csv] = await Promise.all([readFile(OUTLOOK_DEMO.site, 'utf8'), readFile(OUTLOOK_DEMO.series, 'utf8')]);
    res.json({ site: JSON.parse(site), series_csv });
  });

  return router;
}
