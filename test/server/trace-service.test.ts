/**
 * server/service/trace.ts: the `trace` JSON (DESIGN.md §6) shared by the CLI and the HTTP API.
 */
import { describe, expect, it } from 'vitest';
import { scenarioFromJson } from '../../server/scenario/load.js';
import { TRACE_DEFAULTS, automaticFan, fanElevations, traceRays } from '../../server/service/trace.js';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';

const R = 6_371_000;
const RAD = Math.PI / 180;

/**
 * Path heights are rounded to 1 mm; the tracer's height error at 35 km is about 1e-4 m
 * (sim/trace/options.ts tolerance_m). 2 mm covers both and still fails for any real mistake
 * (a wrong elevation unit or Earth radius moves heights by metres).
 */
const HEIGHT_TOLERANCE_M = 2e-3;

/** A 10 K surface inversion over 30 m (as in profiles/cold-channel-morning.json). */
const INVERSION_FILE = {
  name: 'inversion (test)',
  observer: { height_m: 6 },
  target: { range_m: 35_000, height_m: 40 },
  atmosphere: { profile: [{ height_m: 0, temperature_C: 2 }, { height_m: 30, temperature_C: 12 }] },
};

function vacuumScenario(observer_height_m: number, range_m: number) {
  return scenarioFromJson({
    name: 'straight lines (test)',
    observer: { height_m: observer_height_m },
    target: { range_m, height_m: 40 },
    atmosphere: { standard: 'us1976' },
    optics: { index_model: 'none' },
    earth: { radius_m: R },
  }).scenario;
}

/**
 * Height of a straight line over a sphere: a line leaving radius r0 at elevation α has the
 * perpendicular distance p = r0·cos α from the centre, so at central angle θ it is at
 * r = p / cos(θ + α) (plane geometry in polar coordinates; DESIGN.md §3 check 2: no atmosphere,
 * straight rays). Independent computation.
 */
function straightLineHeight_m(h: number, elevation_rad: number, range_m: number): number {
  const r0 = R + h;
  return (r0 * Math.cos(elevation_rad)) / Math.cos(range_m / R + elevation_rad) - R;
}

describe('traceRays', () => {
  it('gives straight-line heights at the target and along the path when the index model is none', () => {
    const scenario = vacuumScenario(10, 35_000);
    const elevations = [0, 0.05, 0.2, 1];
    const result = traceRays(scenario, elevations, { path_points: 8 });
    expect(result.rays).toHaveLength(elevations.length);
    for (const ray of result.rays) {
      expect(ray.fate).toBe('target');
      expectClose(ray.height_at_target_m, straightLineHeight_m(10, ray.elevation_deg * RAD, 35_000), { abs: HEIGHT_TOLERANCE_M });
      expect(ray.path).toHaveLength(8);
      for (const [range_m, height_m] of ray.path) {
        expectClose(height_m, straightLineHeight_m(10, ray.elevation_deg * RAD, range_m), { abs: HEIGHT_TOLERANCE_M });
      }
    }
  });

  it('ends a downward ray on the surface at the straight line\'s crossing, with no height at the target', () => {
    const scenario = vacuumScenario(10, 35_000);
    const [ray] = traceRays(scenario, [-0.5]).rays;
    expect(ray.fate).toBe('surface');
    expect(ray.height_at_target_m).toBeNull();
    // The straight line first meets r = R before its closest approach (θ + α = 0), where
    // cos(θ + α) = (R + h) cos α / R with θ + α < 0 (independent computation).
    const alpha = -0.5 * RAD;
    const theta = -alpha - Math.acos(((R + 10) * Math.cos(alpha)) / R);
    expectClose(ray.end_range_m, theta * R, { abs: 0.01 });
    expectClose(ray.path[ray.path.length - 1][1], 0, { abs: HEIGHT_TOLERANCE_M });
  });

  it('counts every ray under exactly one fate and names the scenario', () => {
    const { scenario } = scenarioFromJson(INVERSION_FILE);
    const result = traceRays(scenario, fanElevations(-0.3, 0.3, 61));
    const total = Object.values(result.fates).reduce((a, b) => a + b, 0);
    expect(total).toBe(61);
    expect(result.fates.target).toBe(result.rays.filter((r) => r.height_at_target_m !== null).length);
    expect(result.scenario).toBe('inversion (test)');
    expect(result.range_m).toBe(35_000);
  });

  it('rejects an elevation beyond the tracer\'s 80 degrees, naming its index', () => {
    const scenario = vacuumScenario(10, 35_000);
    expect(() => traceRays(scenario, [0, 85])).toThrow(InputRangeError);
    expect(() => traceRays(scenario, [0, 85])).toThrow(/elevations_deg\[1\]/);
  });

  it('rejects a path with fewer than two points', () => {
    expect(() => traceRays(vacuumScenario(10, 35_000), [0], { path_points: 1 })).toThrow(/path_points/);
  });
});

describe('fanElevations', () => {
  it('spaces the rays evenly from the first to the last elevation', () => {
    expectClose(fanElevations(-0.2, 0.2, 5), [-0.2, -0.1, 0, 0.1, 0.2], { abs: 1e-15 });
    expect(fanElevations(0.3, 0.9, 1)).toEqual([0.3]);
  });
});

describe('automaticFan', () => {
  it('frames the target: its lowest ray meets the surface and its highest passes above the frame', () => {
    const { scenario } = scenarioFromJson(INVERSION_FILE);
    const medium = buildMedium(scenario);
    const fan = automaticFan(scenario, medium);
    expect(fan.from_deg).toBeLessThan(fan.to_deg);
    const [low, high] = traceRays(scenario, [fan.from_deg, fan.to_deg], { medium }).rays;
    expect(low.fate).toBe('surface');
    expect(high.fate === 'escaped' || (high.height_at_target_m ?? 0) > TRACE_DEFAULTS.fan_top_factor * 40).toBe(true);
  });
});
