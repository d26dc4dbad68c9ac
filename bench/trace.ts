/**
 * Ray-tracer speed and accuracy: a 1001-ray fan (observer 10 m, elevations −0.5°..+0.5°, to 50 km)
 * through a strong surface inversion (5 °C at the sea, +10 K over the lowest 30 m, then the US 1976
 * lapse rates; dry air, Ciddor 1996 at 550 nm, built by the project's buildMedium). Reports the
 * median time per fan, rays per second, steps per ray, the worst Bouguer drift, the worst height
 * error at 50 km against a tight run (tolerance 1e-13 m), and a fixed-step RK4 at equal error: its
 * time and the ratio. The naive RK4 (no kink handling) converges only to first order here: the step
 * that crosses the kink at 30 m meets a jump of dn/dz. It is timed at steps of 400, 100 and 25 m,
 * and its step and time at equal error are extrapolated from the measured order (marked so).
 * A second block repeats the fan on the test-only Gladstone–Dale medium of test/trace/media.ts.
 *
 * Run alone: node --import tsx bench/trace.ts   (or through bench/run.ts).
 */
import { availableParallelism, loadavg } from 'node:os';
import { buildMedium } from '../sim/atmosphere/medium.js';
import { RAD_PER_DEG } from '../sim/constants.js';
import type { IndexTable } from '../sim/refractivity/index-table.js';
import type { Scenario } from '../sim/scenario.js';
import { RayEquations } from '../sim/trace/equations.js';
import { hermiteCrossing } from '../sim/trace/hermite.js';
import { traceFan } from '../sim/trace/fan.js';
import type { FanResult } from '../sim/trace/fan.js';
import { DEFAULTS } from '../sim/trace/options.js';
import { strongInversion } from '../test/trace/media.js';

const RAYS = 1001;
const OBSERVER_M = 10;
const RANGE_M = 50000;
const R = 6371000;
/** Timed runs per configuration (after WARMUP untimed ones); the median is reported. */
const RUNS = 11;
const WARMUP = 3;
/** Timed runs of each RK4 step size (slow: up to a second each). */
const RK4_RUNS = 5;
/** The kink of the bench profile (top of the inversion), m. */
const KINK_M = 30;
/** Fixed RK4 steps timed, m. */
const RK4_STEPS_M = [400, 100, 25];
/** Tolerance of the reference fan, m per step. */
const REFERENCE_TOLERANCE_M = 1e-13;

/** The bench atmosphere as a scenario (invented), resolved by sim/atmosphere/medium.ts. */
const SCENARIO: Scenario = {
  name: 'Bench: strong surface inversion (invented)',
  observer: { height_m: OBSERVER_M },
  target: { range_m: RANGE_M, height_m: 0 },
  atmosphere: {
    kind: 'profile',
    surface_pressure_Pa: 101325,
    relative_humidity: 0,
    nodes: [
      { height_m: 0, temperature_K: 278.15 },
      { height_m: 30, temperature_K: 288.15 },
    ],
    above: { kind: 'us1976' },
  },
  optics: { wavelength_um: 0.55, index_model: 'ciddor', co2_ppm: 450 },
  earth: { radius_m: R },
};

function fanElevations(): Float64Array {
  return Float64Array.from({ length: RAYS }, (_, i) => (-0.5 + i / (RAYS - 1)) * RAD_PER_DEG);
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[sorted.length >> 1];
}

/** Median wall and CPU milliseconds of fn over runs after warmup untimed ones. */
function time(fn: () => void, runs = RUNS, warmup = WARMUP): { wall_ms: number; cpu_ms: number } {
  for (let i = 0; i < warmup; i++) fn();
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    wall.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { wall_ms: median(wall), cpu_ms: median(cpu) };
}

/** Worst |height − reference| at the target range over rays that reach it in both fans, m. */
function worstHeightError(heights: Float64Array, reached: Uint8Array, reference: FanResult): number {
  let worst = 0;
  for (let k = 0; k < RAYS; k++) {
    if (reached[k] && reference.fate[k] === 0) worst = Math.max(worst, Math.abs(heights[k] - reference.endHeight_m[k]));
  }
  return worst;
}

/** One classical RK4 step of the ray equations, allocation-free: returns step(from, to, h). */
function rk4Stepper(eq: RayEquations): (from: Float64Array, to: Float64Array, h: number) => void {
  const f = eq.derivative;
  const w = new Float64Array(2);
  const k1 = new Float64Array(2);
  const k2 = new Float64Array(2);
  const k3 = new Float64Array(2);
  const k4 = new Float64Array(2);
  return (from, to, h) => {
    f(k1, from, 0);
    for (let i = 0; i < 2; i++) w[i] = from[i] + 0.5 * h * k1[i];
    f(k2, w, 0);
    for (let i = 0; i < 2; i++) w[i] = from[i] + 0.5 * h * k2[i];
    f(k3, w, 0);
    for (let i = 0; i < 2; i++) w[i] = from[i] + h * k3[i];
    f(k4, w, 0);
    for (let i = 0; i < 2; i++) to[i] = from[i] + (h / 6) * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
  };
}

/**
 * Fixed-step RK4 baselines; height at RANGE_M per ray. A ray ends 'surface' at the first step
 * below z = 0. kink_m null: the naive scheme, no kink handling. kink_m given: a step that crosses
 * the kink is redone up to the crossing (cubic Hermite guess, one Newton correction on the redone
 * step), the ray put on the kink and the medium switched to the other side (the smooth
 * continuation of RayEquations.setDomain) — the same treatment the adaptive kernel gives kinks.
 */
function rk4Fan(table: IndexTable, elevations: Float64Array, h: number, kink_m: number | null): { height: Float64Array; reached: Uint8Array } {
  const eq = new RayEquations(table, R);
  const rkStep = rk4Stepper(eq);
  const y = new Float64Array(2);
  const y1 = new Float64Array(2);
  const height = new Float64Array(elevations.length);
  const reached = new Uint8Array(elevations.length);
  const top = table.top_m;
  const enter = (z: number, up: boolean): void => {
    if (kink_m === null) return;
    if (z > kink_m || (z === kink_m && up)) eq.setDomain(kink_m, top);
    else eq.setDomain(0, kink_m);
  };
  for (let r = 0; r < elevations.length; r++) {
    y[0] = OBSERVER_M;
    y[1] = elevations[r];
    enter(y[0], y[1] > 0);
    let s = 0;
    while (s < RANGE_M && y[0] >= 0) {
      const step = Math.min(h, RANGE_M - s);
      rkStep(y, y1, step);
      if (kink_m !== null && (y[0] - kink_m) * (y1[0] - kink_m) < 0) {
        let part = hermiteCrossing(0, y[0], eq.heightRate(y[0], y[1]), step, y1[0], eq.heightRate(y1[0], y1[1]), kink_m, 0, step);
        rkStep(y, y1, part);
        part -= (y1[0] - kink_m) / eq.heightRate(y1[0], y1[1]);
        rkStep(y, y1, part);
        y[0] = kink_m;
        y[1] = y1[1];
        enter(kink_m, y1[1] > 0);
        s += part;
        continue;
      }
      y[0] = y1[0];
      y[1] = y1[1];
      s += step;
    }
    reached[r] = y[0] >= 0 && s >= RANGE_M ? 1 : 0;
    height[r] = y[0];
  }
  return { height, reached };
}

/** Bench lines for one medium. */
function benchMedium(label: string, table: IndexTable): string[] {
  const elevations = fanElevations();
  const options = { stopRange_m: RANGE_M, maxRange_m: RANGE_M };
  let fan = traceFan(table, OBSERVER_M, elevations, options);
  const timing = time(() => {
    fan = traceFan(table, OBSERVER_M, elevations, options);
  });
  const reference = traceFan(table, OBSERVER_M, elevations, { ...options, tolerance_m: REFERENCE_TOLERANCE_M });
  // The integration alone: the same fan with the smallest path output (2 samples per ray).
  const bare = time(() => traceFan(table, OBSERVER_M, elevations, { ...options, samplesPerRay: 2 }));

  let steps = 0;
  let integratorSteps = 0;
  let evaluations = 0;
  let drift = 0;
  const counts = [0, 0, 0, 0];
  let fateDifferences = 0;
  for (let k = 0; k < RAYS; k++) {
    steps += fan.steps[k];
    integratorSteps += fan.integratorSteps[k];
    evaluations += fan.evaluations[k];
    drift = Math.max(drift, fan.maxInvariantDrift[k]);
    counts[fan.fate[k]]++;
    if (fan.fate[k] !== reference.fate[k]) fateDifferences++;
  }
  const targetReached = Uint8Array.from(fan.fate, (f) => (f === 0 ? 1 : 0));
  const error = worstHeightError(fan.endHeight_m, targetReached, reference);

  // Naive fixed-step RK4 at a few steps; order and equal-error step from the two finest.
  const rk4 = RK4_STEPS_M.map((h) => {
    const run = rk4Fan(table, elevations, h, null);
    const timed = time(() => rk4Fan(table, elevations, h, null), RK4_RUNS, 1);
    return { h, error: worstHeightError(run.height, run.reached, reference), ...timed };
  });
  const [coarse, fine] = rk4.slice(-2);
  const order = Math.log(coarse.error / fine.error) / Math.log(coarse.h / fine.h);
  const hEqual = fine.h * Math.pow(error / fine.error, 1 / order);
  const msEqual = (fine.cpu_ms * fine.h) / hEqual;

  // Kink-aware RK4: halve the step from 12.8 km until its error is no larger than the adaptive fan's.
  let hKink = 12800;
  let kinked = rk4Fan(table, elevations, hKink, KINK_M);
  while (worstHeightError(kinked.height, kinked.reached, reference) > error && hKink > 1) {
    hKink /= 2;
    kinked = rk4Fan(table, elevations, hKink, KINK_M);
  }
  const kinkError = worstHeightError(kinked.height, kinked.reached, reference);
  const kinkTiming = time(() => rk4Fan(table, elevations, hKink, KINK_M), RK4_RUNS, 1);

  const fates = fan.fates.map((name, i) => `${name} ${counts[i]}`).join(', ');
  return [
    `trace [${label}]: ${RAYS} rays, observer ${OBSERVER_M} m, -0.5..+0.5 deg, to ${RANGE_M / 1000} km, tolerance ${DEFAULTS.tolerance_m} m per step, ${table.z_m.length} table nodes`,
    `trace [${label}]: median ${timing.wall_ms.toFixed(1)} ms per fan with ${DEFAULTS.samplesPerRay} path samples per ray (CPU ${timing.cpu_ms.toFixed(1)} ms), ${Math.round((RAYS * 1000) / timing.wall_ms)} rays/s (median of ${RUNS})`,
    `trace [${label}]: without paths (samplesPerRay 2): median ${bare.wall_ms.toFixed(1)} ms per fan (CPU ${bare.cpu_ms.toFixed(1)} ms)`,
    `trace [${label}]: per ray ${(steps / RAYS).toFixed(2)} path steps, ${(integratorSteps / RAYS).toFixed(2)} integrator steps, ${(evaluations / RAYS).toFixed(1)} derivative evaluations`,
    `trace [${label}]: fates ${fates}; ${fateDifferences} differ from the reference`,
    `trace [${label}]: max invariant drift ${drift.toExponential(2)}; max height error at ${RANGE_M / 1000} km ${error.toExponential(2)} m (reference tolerance ${REFERENCE_TOLERANCE_M} m)`,
    ...rk4.map((r) => `trace [${label}]: fixed-step RK4 (no kink handling), h = ${r.h} m: error ${r.error.toExponential(2)} m, median ${r.wall_ms.toFixed(0)} ms (CPU ${r.cpu_ms.toFixed(0)} ms)`),
    `trace [${label}]: RK4 order measured ${order.toFixed(2)}; at equal error (${error.toExponential(2)} m) it would need h = ${hEqual.toExponential(2)} m and about ${(msEqual / 1000).toFixed(0)} s CPU per fan, ${(msEqual / timing.cpu_ms).toExponential(1)}x the adaptive fan (extrapolated)`,
    `trace [${label}]: fixed-step RK4 stopping at the kink, at equal error: h = ${hKink} m, error ${kinkError.toExponential(2)} m, median ${kinkTiming.wall_ms.toFixed(1)} ms (CPU ${kinkTiming.cpu_ms.toFixed(1)} ms), ${(kinkTiming.cpu_ms / bare.cpu_ms).toFixed(1)}x the adaptive fan's CPU time without paths`,
  ];
}

/** Runs the benchmark and returns its lines. */
export async function benchTrace(): Promise<string[]> {
  const medium = buildMedium(SCENARIO);
  const load = loadavg().map((x) => x.toFixed(1)).join(' ');
  return [
    `trace: ${availableParallelism()} cores, load average ${load} (wall times suffer when it exceeds the cores; CPU times less)`,...benchMedium('Ciddor medium', medium.table), ...benchMedium('test medium', strongInversion())];
}

if (import.meta.url === `file://${process.argv[1]}`) {
  for (const line of await benchTrace()) console.log(line);
}
