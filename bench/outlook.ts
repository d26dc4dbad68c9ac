/**
 * Outlook speed: a 168-row week of invented hourly observations at the demo site, rows per second
 * with 1 worker (this thread) and with 2 worker threads (piscina), and their ratio; also both on a
 * series of POOL_MIN_ROWS rows (server/outlook/pool.ts), where the pool should about break even,
 * and a check that both runs give identical rows.
 *
 * Run alone: node --import tsx bench/outlook.ts   (or through bench/run.ts).
 */
import { readFile } from 'node:fs/promises';
import { availableParallelism, loadavg } from 'node:os';
import { join } from 'node:path';
import type { OutlookObservation } from '../sim/analysis/outlook.js';
import { CELSIUS_OFFSET_K } from '../sim/constants.js';
import { computeFindings, POOL_MIN_ROWS } from '../server/outlook/pool.js';
import { siteFromText } from '../server/outlook/site.js';

/** Rows of the benchmark: a week of hours. */
const WEEK_ROWS = 168;
/** Rows of the short series that tests the pool's break-even: the count at which 'auto' starts the pool. */
const SHORT_ROWS = POOL_MIN_ROWS;

/**
 * An invented week over a cold sea (about 11 °C): air 9..18 °C on a daily cycle that warms a little
 * each day, light to moderate wind, humidity falling as the air warms, slowly falling pressure.
 * Deterministic (no random numbers), so every run computes the same rows.
 */
export function inventedWeek(rows = WEEK_ROWS): OutlookObservation[] {
  return Array.from({ length: rows }, (_, t) => {
    const hour = t % 24;
    const day = Math.floor(t / 24);
    const warmth = 0.5 - 0.5 * Math.cos((2 * Math.PI * (hour - 3)) / 24); // 0 at 03:00, 1 at 15:00
    const air_C = 9 + (6 + 0.5 * day) * warmth;
    return {
      air_temperature_K: air_C + CELSIUS_OFFSET_K,
      sea_temperature_K: 11 + 0.2 * warmth + CELSIUS_OFFSET_K,
      wind_speed_m_s: 4 + 2 * Math.sin((2 * Math.PI * (t + 5)) / 37),
      relative_humidity: 0.9 - 0.3 * warmth,
      surface_pressure_Pa: 101_800 - 6 * t,
    };
  });
}

async function timeRun(observations: OutlookObservation[], workers: number): Promise<{ seconds: number; fingerprint: string }> {
  const { site } = siteFromText(await readFile(join(import.meta.dirname, '..', 'profiles', 'outlook', 'site-tarrowgale-head.json'), 'utf8'));
  const start = performance.now();
  const findings = await computeFindings(observations, site, { workers });
  const seconds = (performance.now() - start) / 1000;
  return { seconds, fingerprint: JSON.stringify(findings) };
}

/** Runs the benchmark and returns its lines. */
export async function benchOutlook(): Promise<string[]> {
  const load = loadavg()[0];
  const week = inventedWeek();
  const one = await timeRun(week, 1);
  const two = await timeRun(week, 2);
  const short = inventedWeek(SHORT_ROWS);
  const shortOne = await timeRun(short, 1);
  const shortTwo = await timeRun(short, 2);
  const rate = (rows: number, seconds: number) => `${(rows / seconds).toFixed(2)} rows/s (${((1000 * seconds) / rows).toFixed(0)} ms per row)`;
  return [
    `outlook: ${WEEK_ROWS}-row week at the demo site, ${availableParallelism()} cores reported, load average ${load.toFixed(1)} at the start (the ratio means little when other work holds the cores)`,
    `outlook: 1 worker  ${one.seconds.toFixed(1)} s, ${rate(WEEK_ROWS, one.seconds)}`,
    `outlook: 2 workers ${two.seconds.toFixed(1)} s, ${rate(WEEK_ROWS, two.seconds)} (worker start-up included)`,
    `outlook: ratio 2 workers / 1 worker in rows per second = ${(one.seconds / two.seconds).toFixed(2)} (2.00 would be perfect scaling)`,
    `outlook: ${SHORT_ROWS} rows: 1 worker ${shortOne.seconds.toFixed(2)} s, 2 workers ${shortTwo.seconds.toFixed(2)} s (ratio ${(shortOne.seconds / shortTwo.seconds).toFixed(2)})`,
    `outlook: rows identical with 1 and 2 workers: ${one.fingerprint === two.fingerprint && shortOne.fingerprint === shortTwo.fingerprint ? 'yes' : 'NO'}`,
  ];
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchOutlook()) console.log(line);
}
