import { describe, expect, it } from 'vitest';
import { SAFETY_CAUTION } from '../../server/cli/commands/shared.js';
import { expectBadInput, expectFields, runCli, runJson } from './run.js';

const VERDICT = { hidden_height_m: 'number', visible_fraction: 'number', image_count: 'number', status: 'string' } as const;

describe('the visibility command', () => {
  it('prints hidden height, visible fraction, image count and status (DESIGN.md §6) with --json', async () => {
    const j = await runJson('visibility', 'profiles/inferior-mirage-hot-flats.json');
    expectFields(j, { ...VERDICT, images: 'array', hidden_bands: 'array', resolution: 'object', compared: 'object', caution: 'string' });
    expect(['visible', 'partly-hidden', 'hidden']).toContain(j.status);
    expect(j.visible_fraction as number).toBeGreaterThanOrEqual(0);
    expect(j.visible_fraction as number).toBeLessThanOrEqual(1);
    expect(j.image_count).toBe((j.images as unknown[]).length);
    const compared = j.compared as Record<string, unknown>;
    expectFields(compared.geometry, VERDICT);
    expectFields(compared.standard, VERDICT);
    expect(j.caution).toBe(SAFETY_CAUTION);
  });

  it('shows the inferior mirage promised by its profile: an inverted image below the erect one, the base hidden', async () => {
    const j = await runJson('visibility', 'profiles/inferior-mirage-hot-flats.json');
    expect((j.images as { orientation: string }[]).map((i) => i.orientation)).toEqual(['inverted', 'erect']);
    expect(j.status).toBe('partly-hidden');
    expect(j.hidden_height_m as number).toBeGreaterThan(0);
  });

  it('takes --max-height as the target top and reports a whole target as visible', async () => {
    const j = await runJson('visibility', 'profiles/standard-air.json', '--range=5000', '--max-height=10');
    expect(j).toMatchObject({ target_height_m: 10, hidden_height_m: 0, visible_fraction: 1, status: 'visible' });
  });

  it('ends its readable verdict with the safety caution', async () => {
    const run = await runCli('visibility', 'profiles/standard-air.json');
    expect(run.code).toBe(0);
    expect(run.stdout).toContain(SAFETY_CAUTION);
  });

  it('exits with 2 naming --range for a range beyond 1000 km', async () => {
    await expectBadInput(/--range/, 'visibility', 'profiles/standard-air.json', '--range=2000000');
  });
});
