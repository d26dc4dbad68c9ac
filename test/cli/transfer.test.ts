import { describe, expect, it } from 'vitest';
import { expectBadInput, expectFields, runJson } from './run.js';

const FATES = ['target', 'surface', 'escaped', 'trapped'];

describe('the transfer command', () => {
  it('prints range, rays, images, lowest visible height and hidden bands (DESIGN.md §6) with --json', async () => {
    const j = await runJson('transfer', 'profiles/superior-mirage-cold-sea.json');
    expectFields(j, { range_m: 'number', rays: 'array', images: 'array', lowest_visible_height_m: 'number|null', hidden_bands: 'array', max_height_m: 'number', looming: 'object' });
    expect(j.range_m).toBe(20_000);
    expect(j.max_height_m).toBe(26);
    for (const ray of j.rays as Record<string, unknown>[]) {
      expectFields(ray, { elevation_deg: 'number', height_m: 'number|null', fate: 'string' });
      expect(FATES).toContain(ray.fate);
      expect(ray.height_m === null).toBe(ray.fate !== 'target');
    }
    for (const image of j.images as Record<string, unknown>[]) {
      expectFields(image, { from_height_m: 'number', to_height_m: 'number', from_elevation_deg: 'number', to_elevation_deg: 'number', orientation: 'string' });
      expect(image.from_height_m as number).toBeLessThanOrEqual(image.to_height_m as number);
      expect(image.to_height_m as number).toBeLessThanOrEqual(26);
    }
    for (const band of j.hidden_bands as Record<string, unknown>[]) expectFields(band, { from_height_m: 'number', to_height_m: 'number' });
  });

  it('shows erect, inverted and erect images with a hidden band for the superior-mirage profile, as its description promises', async () => {
    const j = await runJson('transfer', 'profiles/superior-mirage-cold-sea.json');
    expect((j.images as { orientation: string }[]).map((i) => i.orientation)).toEqual(['erect', 'inverted', 'erect']);
    expect((j.hidden_bands as unknown[]).length).toBe(1);
  });

  it('honours --range and --max-height', async () => {
    const j = await runJson('transfer', 'profiles/standard-air.json', '--range=10000', '--max-height=5');
    expect(j.range_m).toBe(10_000);
    expect(j.max_height_m).toBe(5);
    for (const image of j.images as { to_height_m: number }[]) expect(image.to_height_m).toBeLessThanOrEqual(5);
  });

  it('exits with 2 naming --range, --max-height or --rays for values out of range', async () => {
    await expectBadInput(/--range/, 'transfer', 'profiles/standard-air.json', '--range=-5');
    await expectBadInput(/--max-height/, 'transfer', 'profiles/standard-air.json', '--max-height=0');
    await expectBadInput(/--max-height/, 'transfer', 'profiles/standard-air.json', '--max-height=abc');
    await expectBadInput(/--rays/, 'transfer', 'profiles/standard-air.json', '--rays=2');
  });
});
