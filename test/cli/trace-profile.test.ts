import { describe, expect, it } from 'vitest';
import { runCli, runJson } from './run.js';

const STANDARD = 'profiles/standard-air.json';
/** Straight-line geometry over a sphere: h(D) = (R + h0)·cos α / cos(α + D/R) − R (exact, no refraction). */
function straightHeight_m(h0: number, elevation_rad: number, range_m: number, R: number): number {
  return ((R + h0) * Math.cos(elevation_rad)) / Math.cos(elevation_rad + range_m / R) - R;
}

describe('the trace command', () => {
  it('prints the DESIGN §6 ray fields for chosen elevations', async () => {
    const out = await runJson('trace', STANDARD, '--elevations=-0.1,0,0.1');
    const rays = out.rays as { elevation_deg: number; fate: string; height_at_target_m: number | null; path: [number, number][] }[];
    expect(rays.map((r) => r.elevation_deg)).toEqual([-0.1, 0, 0.1]);
    for (const ray of rays) {
      expect(['target', 'surface', 'escaped', 'trapped']).toContain(ray.fate);
      expect(ray.path[0]).toEqual([0, 12]);
      if (ray.fate === 'target') expect(ray.path.at(-1)![0]).toBe(30000);
    }
    // Rays bend down toward the denser air, so each lands below the straight line by κD²/2 with
    // k = κR ≈ 0.1699 at 15 °C, 1013 hPa, −6.5 K/km, 550 nm (REFERENCES §5.1, independent
    // computation from Ciddor 1996). Tolerance: humidity (RH 0.5) and the small-angle form, ±0.003.
    const R = 6_371_000;
    const K_STANDARD = 0.1699;
    const K_TOLERANCE = 0.003;
    for (const ray of rays) {
      expect(ray.height_at_target_m).not.toBeNull();
      const deficit_m = straightHeight_m(12, (ray.elevation_deg * Math.PI) / 180, 30000, R) - ray.height_at_target_m!;
      const k = (2 * deficit_m * R) / 30000 ** 2;
      expect(Math.abs(k - K_STANDARD)).toBeLessThan(K_TOLERANCE);
    }
  });

  it('gives straight rays with index model none, to a millimetre', async () => {
    const dir = await import('node:fs/promises');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const file = join(tmpdir(), `loomline-none-${process.pid}.json`);
    const scenario = JSON.parse(await dir.readFile(STANDARD, 'utf8'));
    scenario.optics = { index_model: 'none' };
    await dir.writeFile(file, JSON.stringify(scenario));
    try {
      const out = await runJson('trace', file, '--fan=0,0.2,3');
      const rays = out.rays as { elevation_deg: number; height_at_target_m: number }[];
      for (const ray of rays) {
        // Exact geometry; 1 mm covers the tracer's documented default tolerance at 30 km.
        expect(Math.abs(ray.height_at_target_m - straightHeight_m(12, (ray.elevation_deg * Math.PI) / 180, 30000, 6_371_000))).toBeLessThan(1e-3);
      }
    } finally {
      await dir.rm(file, { force: true });
    }
  });

  it('rejects a bad fan with exit code 2 and the option named', async () => {
    const run = await runCli('trace', STANDARD, '--fan=0,1');
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('--fan');
  });
});

describe('the profile command', () => {
  it('prints the levels at the chosen heights with the DESIGN §6 fields', async () => {
    const out = await runJson('profile', STANDARD, '--heights=0,1,2,5,10');
    const levels = out.levels as Record<string, number>[];
    expect(levels.map((l) => l.height_m)).toEqual([0, 1, 2, 5, 10]);
    // US 1976 shifted to 15 °C: a 6.5 K/km lapse in geopotential height H = r0·z/(r0 + z),
    // r0 = 6 356 766 m (US Standard Atmosphere 1976, eqs. 18 and 23, Table 4).
    const H_m = (6_356_766 * 10) / (6_356_766 + 10);
    expect(levels[4].temperature_C).toBeCloseTo(15 - 0.0065 * H_m, 9);
    expect(levels[0].pressure_hPa).toBeCloseTo(1013.25, 9);
    for (const level of levels) {
      expect(level.refractive_index).toBeGreaterThan(1.00027);
      expect(level.refractive_index).toBeLessThan(1.00029);
      expect(level.dn_dz_per_m).toBeLessThan(0);
    }
  });

  it('rejects a height outside the air with the option named', async () => {
    const run = await runCli('profile', STANDARD, '--heights=0,-5');
    expect(run.code).toBe(2);
    expect(run.stderr).toContain('--heights');
  });
});
