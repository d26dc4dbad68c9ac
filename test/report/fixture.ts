/**
 * A cheap report for the report tests: an invented inshore case with a layered profile, four
 * ensemble members in this thread and a six-range sighting sweep (a few seconds in all).
 */
import { mkdtemp, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export const REPORT_SCENARIO = {
  name: 'Report test: Gull Narrows (invented)',
  description: 'An invented check case: a 6 m eye, a 10 m marker 16 km off, a mild surface inversion.',
  observer: { height_m: { normal: { mean: 6, sd: 0.5 } } },
  target: { range_m: { uniform: { min: 15000, max: 17000 } }, height_m: 10, shape: 'tower' },
  atmosphere: {
    relative_humidity: 0.7,
    profile: [
      { height_m: 0, temperature_C: { normal: { mean: 5, sd: 1 } } },
      { height_m: 20, temperature_C: 7 },
    ],
  },
};

/** CLI arguments that keep the report cheap. */
export const CHEAP_REPORT_ARGS = ['--members', '4', '--seed', '11', '--workers', '0', '--no-progress', '--ranges', '4000,30000,6', '--range-tolerance', '500'];

/** Writes the scenario into a new temporary folder; returns the folder and the file's path and text. */
export async function scenarioFolder(): Promise<{ dir: string; path: string; text: string }> {
  const dir = await mkdtemp(join(tmpdir(), 'loomline-report-'));
  const path = join(dir, 'gull-narrows.json');
  const text = JSON.stringify(REPORT_SCENARIO, null, 2) + '\n';
  await writeFile(path, text);
  return { dir, path, text };
}
