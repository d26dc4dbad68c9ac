import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../server/cli/commands/shared.js';
import { expectBadInput, expectFields, runCli, runJson } from './run.js';

describe('the findings command', () => {
  it('prints every part with the field names of its own command, and the caution', async () => {
    const j = await runJson('findings', 'profiles/stacked-images.json');
    expectFields(j, { horizon: 'object', transfer: 'object', visibility: 'object', refraction: 'object', caution: 'string', range_m: 'number', target_height_m: 'number' });
    expectFields(j.horizon, { horizon_elevation_deg: 'number', dip_arcmin: 'number', horizon_distance_m: 'number|null', false_horizon: 'boolean' });
    expectFields(j.transfer, { range_m: 'number', rays: 'array', images: 'array', lowest_visible_height_m: 'number|null', hidden_bands: 'array' });
    expectFields(j.visibility, { hidden_height_m: 'number', visible_fraction: 'number', image_count: 'number', status: 'string' });
    expectFields(j.refraction, { rows: 'array' });
    expect(j.caution).toBe(SAFETY_CAUTION);
  });

  it('shows the stacked images its profile promises: seven, alternately inverted and erect, the upper half hidden', async () => {
    const j = await runJson('findings', 'profiles/stacked-images.json');
    const images = (j.transfer as { images: { orientation: string }[] }).images;
    expect(images.map((i) => i.orientation)).toEqual(['inverted', 'erect', 'inverted', 'erect', 'inverted', 'erect', 'inverted']);
    const bands = (j.transfer as { hidden_bands: { to_height_m: number }[] }).hidden_bands;
    expect(bands[bands.length - 1].to_height_m).toBe(30);
  });

  it('prints readable text with the caution after the visibility verdict', async () => {
    const run = await runCli('findings', 'profiles/superior-mirage-cold-sea.json');
    expect(run.code).toBe(0);
    for (const heading of ['Horizon', 'At the target range', 'Astronomical refraction', 'Visibility of the target']) expect(run.stdout).toContain(heading);
    expect(run.stdout.indexOf(SAFETY_CAUTION)).toBeGreaterThan(run.stdout.indexOf('Visibility of the target'));
  });

  it('prints one JSON object and nothing else on stdout when run as a program', () => {
    const child = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/main.ts', 'findings', 'profiles/standard-air.json', '--json'], { encoding: 'utf8' });
    expect(child.status).toBe(0);
    const lines = child.stdout.trim().split('\n');
    expect(lines).toHaveLength(1);
    expect(JSON.parse(lines[0]).visibility.status).toBe('partly-hidden');
  });

  it('exits with 2 for a bad scenario, naming the field', async () => {
    await expectBadInput(/--max-height/, 'findings', 'profiles/standard-air.json', '--max-height=-1');
  });
});
