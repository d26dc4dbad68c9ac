/**
 * Ensembles end to end through the service: sampling a scenario file, running members (in this
 * thread and on the worker pool), and summarising. Scenarios use index_model "none" (straight
 * lines of sight) where an exact answer is wanted and to keep members cheap (about 50 ms each).
 */
import { describe, expect, it } from 'vitest';
import { evaluateMember } from '../../sim/analysis/ensemble-member.js';
import { convertScenario } from '../../server/scenario/convert.js';
import { validateScenarioFile } from '../../server/scenario/load.js';
import { membersCsv, runEnsemble } from '../../server/service/ensemble.js';
import { expectClose } from '../support/close.js';

const R = 6_371_000;

/** Straight lines of sight; an observer at 10 m and a 5 m target 15–25 km off; humidity has no effect with n ≡ 1. */
function geometric(observer: unknown, range: unknown, humidity: unknown = 0.5) {
  return validateScenarioFile({
    name: 'Geometry test (invented)',
    observer: { height_m: observer },
    target: { range_m: range, height_m: 5 },
    atmosphere: { relative_humidity: humidity, profile: [{ height_m: 0, temperature_C: 10 }, { height_m: 50, temperature_C: 9.7 }] },
    optics: { index_model: 'none' },
  });
}

/** Range at which a height just clears the straight-line horizon from 10 m (DESIGN.md §3 item 2). */
const clear_m = (z: number) => R * (Math.acos(R / (R + 10)) + Math.acos(R / (R + z)));

describe('runEnsemble', () => {
  it('gives identical results for the same seed, in this thread and on two workers', async () => {
    const file = geometric({ normal: { mean: 10, sd: 1 } }, { uniform: { min: 15000, max: 25000 } });
    const a = await runEnsemble(file, { members: 6, seed: 42, workers: 0 });
    const b = await runEnsemble(file, { members: 6, seed: 42, workers: 2 });
    const c = await runEnsemble(file, { members: 6, seed: 43, workers: 0 });
    const strip = (r: typeof a) => ({ ...r, workers: 0 });
    expect(strip(b)).toEqual(strip(a));
    expect(b.workers).toBe(2);
    expect(c.member_rows.map((m) => m.inputs)).not.toEqual(a.member_rows.map((m) => m.inputs));
  });

  it('equals the single run when every input has zero spread', async () => {
    const file = geometric({ normal: { mean: 10, sd: 0 } }, { uniform: { min: 21000, max: 21000 } }, { choice: [0.5] });
    const single = evaluateMember(convertScenario(file), { sighting: null }).findings;
    const e = await runEnsemble(file, { members: 4, seed: 1, workers: 0 });
    expect(e.members).toBe(4);
    expect(e.hidden_height_m).toEqual({ p5: single.hidden_height_m, p50: single.hidden_height_m, p95: single.hidden_height_m });
    expect(e.probabilities).toEqual({ visible: 0, partly_hidden: single.status === 'partly-hidden' ? 1 : 0, hidden: single.status === 'hidden' ? 1 : 0 });
    expect(e.point.hidden_height_m).toBe(single.hidden_height_m);
    expect(e.sensitivity_output).toBeNull();
    expect(e.sensitivity.every((s) => s.score === 0)).toBe(true);
  });

  it('ranks first the input built to dominate', async () => {
    // Eye height 4..16 m moves the hidden height at 15 km by metres (a large share of the 5 m target);
    // the range's 10 m spread moves it by millimetres; humidity does nothing with straight lines of sight.
    const file = geometric({ uniform: { min: 4, max: 16 } }, { normal: { mean: 15000, sd: 10 } }, { uniform: { min: 0.2, max: 0.9 } });
    const e = await runEnsemble(file, { members: 10, seed: 5, sampling: 'latin-hypercube', workers: 0 });
    expect(e.sensitivity[0].input).toBe('observer.height_m');
    expect(e.sensitivity[0].rho).toBeLessThan(-0.95);
    expect(e.summary.join(' ')).toMatch(/The observer \(eye\) height mattered most/);
  });

  it('converges on the exact straight-line probability, its standard error falling as 1/sqrt(N)', async () => {
    // Exact: hidden when the range exceeds clear_m(5) ≈ 19.27 km, so P(hidden) = (25000 − clear_m(5))/10000.
    const file = geometric(10, { uniform: { min: 15000, max: 25000 } });
    const exact = (25000 - clear_m(5)) / 10000;
    const small = await runEnsemble(file, { members: 10, seed: 9, workers: 0 });
    const large = await runEnsemble(file, { members: 40, seed: 9, workers: 0 });
    // Within 3 standard errors of the exact value (a 0.3 % false-alarm rate for a normal estimate).
    expect(Math.abs(large.probabilities.hidden - exact)).toBeLessThan(3 * large.standard_errors.hidden);
    // SE = sqrt(p̂(1 − p̂)/N): with both p̂ in 0.2..0.8, sqrt(p̂(1 − p̂)) lies in 0.4..0.5, so the ratio
    // of the standard errors at N = 10 and 40 lies within 2 × (0.8..1.25).
    for (const r of [small, large]) expect(r.probabilities.hidden).toBeGreaterThan(0.2);
    for (const r of [small, large]) expect(r.probabilities.hidden).toBeLessThan(0.8);
    const ratio = small.standard_errors.hidden / large.standard_errors.hidden;
    expect(ratio).toBeGreaterThan(2 * 0.8);
    expect(ratio).toBeLessThan(2 * 1.25);
    // Every member is either partly hidden or hidden (the base is beyond the horizon at 15 km).
    expectClose(large.probabilities.partly_hidden + large.probabilities.hidden, 1, { abs: 1e-12 });
  });

  it('stops on abort, keeps the finished members and labels the result partial', async () => {
    const file = geometric({ normal: { mean: 10, sd: 1 } }, { uniform: { min: 15000, max: 25000 } });
    const controller = new AbortController();
    const e = await runEnsemble(file, { members: 30, seed: 2, workers: 2 }, {
      signal: controller.signal,
      onProgress: (finished) => {
        if (finished >= 3) controller.abort();
      },
    });
    expect(e.partial).toBe(true);
    expect(e.members).toBeGreaterThanOrEqual(3);
    expect(e.members).toBeLessThan(30);
    expect(e.member_rows).toHaveLength(e.members);
    expect(e.warnings.some((w) => w.startsWith('partial:'))).toBe(true);
  });

  it('leaves out and counts members whose sampled inputs the model cannot take', async () => {
    // The second node's height 0..2 m (uniform) lies at or below the first node's 1 m in about half
    // of the members: convertScenario rejects those (heights must increase), the rest run. The
    // midpoint, 1 m, fails too: the single run is reported as failed, the ensemble goes on.
    const file = validateScenarioFile({
      name: 'Failing members test (invented)',
      observer: { height_m: 10 },
      target: { range_m: 15000, height_m: 5 },
      atmosphere: { profile: [{ height_m: 1, temperature_C: 10 }, { height_m: { uniform: { min: 0, max: 2 } }, temperature_C: 11 }] },
      optics: { index_model: 'none' },
    });
    const e = await runEnsemble(file, { members: 8, seed: 21, workers: 0 });
    const bad = e.member_rows.filter((r) => r.error !== null);
    expect(bad.length).toBe(e.failed);
    expect(e.failed).toBeGreaterThan(0);
    expect(e.members + e.failed).toBe(8);
    for (const r of bad) expect(r.inputs['atmosphere.profile.1.height_m']).toBeLessThanOrEqual(1);
    expect(bad[0].error).toMatch(/atmosphere\.profile\.1\.height_m: .* must be greater than the previous node's height/);
    expect(e.warnings.some((w) => /member.? failed and .* left out of the statistics/.test(w))).toBe(true);
    expect(e.point.error).toMatch(/must be greater than the previous node's height/);
    expect(e.point.status).toBeNull();
  });

  it('writes the members as CSV with one column per input', async () => {
    const file = geometric({ normal: { mean: 10, sd: 1 } }, 20000);
    const e = await runEnsemble(file, { members: 3, seed: 4, workers: 0 });
    const lines = membersCsv(e).trimEnd().split('\r\n');
    expect(lines).toHaveLength(4);
    expect(lines[0]).toBe('index,status,hidden_height_m,visible_fraction,image_count,horizon_elevation_deg,top_elevation_deg,sighting_top_m,sighting_light_m,sighting_whole_m,observer.height_m,error');
    expect(Number(lines[1].split(',')[10])).toBe(e.member_rows[0].inputs['observer.height_m']);
  });

  it('rejects a member count outside its range, naming the option', async () => {
    await expect(runEnsemble(geometric(10, 20000), { members: 0 })).rejects.toThrow(/members = 0 is out of range/);
  });
});
