/**
 * The mirage outlook for a site over a series of routine observations (DESIGN.md §6 `outlook`):
 * the one place that builds the outlook JSON, shared by the CLI `outlook` command and the HTTP API.
 */
import type { OutlookSite } from '../../sim/analysis/outlook.js';
import { parseSeriesCsv, usableRows, type ParsedSeries } from '../outlook/csv.js';
import { describeBadRow, type BadRow } from '../outlook/errors.js';
import { computeFindings } from '../outlook/pool.js';
import { observationOf, outlookRowJson, type OutlookRowJson } from '../outlook/rows.js';
import type { SiteFile } from '../outlook/site.js';

/** What the outlook is measured against (said in every result). */
export const OUTLOOK_REFERENCE =
  'US Standard Atmosphere 1976 through the observed air temperature at the sensor height, with the observed surface pressure and humidity';

/** The outlook JSON: DESIGN.md §6 `rows`, with the site, the skipped rows and warnings. */
export interface OutlookResult {
  site: {
    name: string;
    description?: string;
    observer_height_m: number;
    air_temperature_height_m: number;
    wind_height_m: number;
    landmark: { name?: string; range_m: number; height_m: number; azimuth_deg?: number };
    earth_radius_m: number;
  };
  reference: string;
  rows: OutlookRowJson[];
  /** Rows left out with --skip-bad-rows: line, field, value and why. */
  skipped_rows: BadRow[];
  /** Soft problems of the whole run (skipped rows); each row carries its own. */
  warnings: string[];
}

/** Options of computeOutlook. */
export interface OutlookOptions {
  /** Leave bad rows out (listed in skipped_rows) instead of failing. Default false. */
  skipBadRows?: boolean;
  /** Worker threads: 'auto' (default) or a number (1: this thread). */
  workers?: number | 'auto';
  /** Called after each row with the number done and the total. */
  onProgress?: (done: number, total: number) => void;
}

/**
 * The outlook of a parsed series at a site.
 * @param series the parsed series (server/outlook/csv.ts).
 * @param siteFile the site file as written, and its SI form.
 * @param options bad-row policy, workers, progress.
 * @throws SeriesError listing bad rows (unless skipBadRows) or when no row is left.
 */
export async function computeOutlook(series: ParsedSeries, siteFile: { file: SiteFile; site: OutlookSite }, options: OutlookOptions = {}): Promise<OutlookResult> {
  const skip = options.skipBadRows ?? false;
  const rows = usableRows(series, skip);
  const { file, site } = siteFile;
  const findings = await computeFindings(rows.map(observationOf), site, {
    workers: options.workers ?? 'auto',
    onProgress: options.onProgress,
    labels: rows.map((r) => `line ${r.line} (${r.time})`),
  });
  const skipped = skip ? series.bad : [];
  const skippedLines = [...new Set(skipped.map((b) => b.line))];
  return {
    site: {
      name: file.name,
      ...(file.description !== undefined ? { description: file.description } : {}),
      observer_height_m: site.observer_height_m,
      air_temperature_height_m: site.air_temperature_height_m,
      wind_height_m: site.wind_height_m,
      landmark: {
        ...(file.landmark.name !== undefined ? { name: file.landmark.name } : {}),
        range_m: site.landmark_range_m,
        height_m: site.landmark_height_m,
        ...(file.landmark.azimuth_deg !== undefined ? { azimuth_deg: file.landmark.azimuth_deg } : {}),
      },
      earth_radius_m: site.earth_radius_m,
    },
    reference: OUTLOOK_REFERENCE,
    rows: rows.map((row, i) => outlookRowJson(row, findings[i])),
    skipped_rows: skipped,
    warnings: skippedLines.length > 0 ? [`skipped ${skippedLines.length} bad row${skippedLines.length > 1 ? 's' : ''}: ${skipped.map(describeBadRow).join('; ')}`] : [],
  };
}

/**
 * The outlook from a series file's text and a site (the HTTP route's entry).
 * @throws SeriesError for a bad header or bad rows (see computeOutlook).
 */
export async function outlookFromCsvText(csvText: string, siteFile: { file: SiteFile; site: OutlookSite }, options: OutlookOptions = {}): Promise<OutlookResult> {
  return computeOutlook(parseSeriesCsv(csvText), siteFile, options);
}
