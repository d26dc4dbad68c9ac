import { describe, expect, it } from 'vitest';
import { expectBadInput, expectFields, runJson } from './run.js';

describe('the refraction command', () => {
  it('prints rows of apparent elevation and refraction (DESIGN.md §6) at --elevations', async () => {
    const j = await runJson('refraction', 'profiles/standard-air.json', '--elevations=0,1,5,10,45');
    expectFields(j, { rows: 'array', bodies: 'array', horizon_elevation_deg: 'number' });
    const rows = j.rows as { apparent_elevation_deg: number; refraction_arcmin: number; true_elevation_deg: number }[];
    expect(rows.map((r) => r.apparent_elevation_deg)).toEqual([0, 1, 5, 10, 45]);
    for (const r of rows) {
      expectFields(r, { apparent_elevation_deg: 'number', refraction_arcmin: 'number|null', true_elevation_deg: 'number|null' });
      expect(r.true_elevation_deg).toBeCloseTo(r.apparent_elevation_deg - r.refraction_arcmin / 60, 12);
    }
    // Refraction falls with elevation. At 45°: Bennett's formula (Meeus, Astronomical Algorithms ch. 16,
    // REFERENCES.md §4.1) gives cot(45° + 7.31/49.4)′ = 0.995′ at 10 °C and 1010 hPa, 0.981′ scaled to
    // 15 °C and 1013.25 hPa; ±10 % covers the formula's own error and the humidity of this profile.
    for (let i = 1; i < rows.length; i++) expect(rows[i].refraction_arcmin).toBeLessThan(rows[i - 1].refraction_arcmin);
    expect(rows[4].refraction_arcmin).toBeGreaterThan(0.9);
    expect(rows[4].refraction_arcmin).toBeLessThan(1.1);
  });

  it('reports bodies at true elevations given by --bodies, the lower limb of one below the horizon hidden', async () => {
    const j = await runJson('refraction', 'profiles/standard-air.json', '--bodies=10,-0.5');
    const bodies = j.bodies as Record<string, unknown>[];
    expect(bodies).toHaveLength(2);
    for (const b of bodies) expectFields(b, { true_elevation_deg: 'number', upper_limb_elevation_deg: 'number|null', lower_limb_elevation_deg: 'number|null', flattening: 'number|null', above_horizon: 'boolean' });
    expect(bodies[0].above_horizon).toBe(true);
    expect(bodies[0].flattening as number).toBeLessThan(1);
  });

  it('exits with 2 naming --elevations or --bodies for values outside −90..90', async () => {
    await expectBadInput(/--elevations/, 'refraction', 'profiles/standard-air.json', '--elevations=0,91');
    await expectBadInput(/--bodies/, 'refraction', 'profiles/standard-air.json', '--bodies=x');
  });
});
