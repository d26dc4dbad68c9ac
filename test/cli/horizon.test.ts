import { describe, expect, it } from 'vitest';
import { expectBadInput, expectFields, runCli, runJson } from './run.js';

const R = 6_371_000;

describe('the horizon command', () => {
  it('prints the DESIGN.md §6 fields with --json, confirmed by tracing', async () => {
    const j = await runJson('horizon', 'profiles/standard-air.json');
    expectFields(j, { horizon_elevation_deg: 'number', dip_arcmin: 'number', horizon_distance_m: 'number|null', false_horizon: 'boolean', trapped_elevations: 'object|null', ducts: 'array', trace_check: 'object', geometry: 'object', standard: 'object|null' });
    expect(j.false_horizon).toBe(false);
    expect(j.dip_arcmin).toBeCloseTo(-(j.horizon_elevation_deg as number) * 60, 12);
    expect((j.trace_check as { confirmed: boolean }).confirmed).toBe(true);
    // Straight lines from 12 m: arccos(R/(R+h)) (DESIGN.md §3 item 2), and refraction makes the dip smaller.
    const geometric = (Math.acos(R / (R + 12)) * 180 * 60) / Math.PI;
    expect((j.geometry as { dip_arcmin: number }).dip_arcmin).toBeCloseTo(geometric, 9);
    expect(j.dip_arcmin as number).toBeLessThan(geometric);
  });

  it('reports the false horizon of the superior mirage, raised above the horizontal', async () => {
    const j = await runJson('horizon', 'profiles/superior-mirage-cold-sea.json');
    expect(j.false_horizon).toBe(true);
    expect(j.horizon_elevation_deg as number).toBeGreaterThan(0);
    expect((j.ducts as unknown[]).length).toBeGreaterThan(0);
  });

  it('prints a readable table without --json', async () => {
    const run = await runCli('horizon', 'profiles/standard-air.json');
    expect(run.code).toBe(0);
    expect(run.stdout).toMatch(/apparent horizon/);
    expect(run.stdout).toMatch(/dip/);
  });

  it('exits with 2 and names the problem for a missing scenario file', async () => {
    await expectBadInput(/cannot read scenario file/, 'horizon', 'profiles/no-such-file.json');
  });
});
