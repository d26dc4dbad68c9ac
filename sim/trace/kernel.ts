/**
 * The ray-tracing kernel: integrates one ray of DESIGN.md §3 from the observer outward with the
 * Cash–Karp integrator and locates every event exactly. No argument checks (traceRay / traceFan
 * validate once); no allocation per step; one kernel serves many rays.
 *
 * Events. After each accepted step the kernel asks whether the step crossed the surface (z = 0),
 * the top (z = top_m) or a kink of the table (a profile node where dn/dz jumps, DESIGN.md §4).
 * A step whose elevation angle changes sign holds a turning point: it is located first (α = 0 by
 * re-integration), so a ray that dips below a level and comes back within one step is caught and
 * a grazing ray is judged by its integrated lowest point, not by an interpolant. A crossing sends
 * the integrator back to the start of the step and re-integrates to the crossing (locate.ts).
 * At a kink the ray is put exactly on the node and integration restarts there, so no step spans a
 * kink and the step control sees the jump of dn/dz. To keep crossings rare and cheap, steps are
 * aimed at the next level (levels.ts) and the equations continue the medium smoothly past the
 * current pair of levels (equations.ts, setDomain).
 */
import type { IndexTable } from '../refractivity/index-table.js';
import { RayEquations } from './equations.js';
import { hermiteCrossing, hermiteExtremum } from './hermite.js';
import { KnotBuffer } from './knots.js';
import { ELEVATION, HEIGHT, heightTolerance, locateEvent } from './locate.js';
import { levelAim, nextLevel } from './levels.js';
import { createOdeState, OdeStepper } from './ode.js';
import type { TraceSettings } from './options.js';

/** Ray fates (DESIGN.md §6 `transfer`), in the order of their numeric codes. */
export const FATES = ['target', 'surface', 'escaped', 'trapped'] as const;
/** One of FATES. */
export type Fate = (typeof FATES)[number];
export const FATE_TARGET = 0;
export const FATE_SURFACE = 1;
export const FATE_ESCAPED = 2;
export const FATE_TRAPPED = 3;

/**
 * First trial step, m. The step control adapts within a few steps; 200 m suits near-horizontal rays
 * (a longer first guess is mostly rejected near a strong inversion, a shorter one costs steps).
 */
const INITIAL_STEP_M = 200;

/** Reusable ray integrator over one table and one set of settings. */
export class RayKernel {
  readonly equations: RayEquations;
  readonly stepper: OdeStepper;
  readonly settings: TraceSettings;
  readonly knots = new KnotBuffer();
  /** Event levels: 0 (surface), the kinks strictly inside, top_m. */
  readonly levels: Float64Array;

  // Results of the last trace.
  fate = FATE_TRAPPED;
  endRange_m = 0;
  endHeight_m = 0;
  endElevation_rad = 0;
  invariant_m = 0;
  maxInvariantDrift = 0;
  /** Path steps (accepted steps that became part of the ray, events included). */
  steps = 0;
  /** All integrator steps, including discarded crossing steps and event re-integration. */
  integratorSteps = 0;
  /** Evaluations of the ray equations (six per trial step, rejected trials included). */
  evaluations = 0;
  minHeight_m = 0;
  minHeightRange_m = 0;
  /** True when the ray passed a lower turning point (descending, then ascending). */
  turned = false;
  stepLimitReached = false;

  private recordKnots = false;
  /** dz/ds and dα/ds at the last knot (the current state between steps). */
  private knotSlope = 0;
  private knotRate = 0;
  private readonly start = createOdeState(2);
  private readonly end = createOdeState(2);
  private readonly vertex = createOdeState(2);
  private readonly initial = new Float64Array(2);

  constructor(table: IndexTable, settings: TraceSettings) {
    this.settings = settings;
    this.equations = new RayEquations(table, settings.earthRadius_m);
    this.stepper = new OdeStepper(2, this.equations.derivative, {
      tolerance: settings.tolerance_m,
      // Height error in metres; elevation error turned into metres over the lever arm.
      errorScale: [1, 1 / Math.min(settings.endRange_m, settings.maxRange_m)],
    });
    const inner = Array.from(table.kinks_m).filter((k) => k > 0 && k < settings.top_m);
    this.levels = Float64Array.from([0, ...inner, settings.top_m]);
  }

  /**
   * Traces one ray; results land in the public fields (and in knots when recordKnots).
   * @param observerHeight_m 0 ≤ h < top_m.
   * @param elevation_rad initial elevation, |α| ≤ 80°.
   */
  trace(observerHeight_m: number, elevation_rad: number, recordKnots: boolean): void {
    const st = this.stepper;
    const y = st.y;
    const eq = this.equations;
    this.recordKnots = recordKnots;
    this.knots.clear();
    this.maxInvariantDrift = 0;
    this.steps = 0;
    this.turned = false;
    this.stepLimitReached = false;
    this.minHeight_m = observerHeight_m;
    this.minHeightRange_m = 0;
    const firstStepCount = st.stepCount;
    const firstEvaluation = eq.evaluations;
    this.initial[0] = observerHeight_m;
    this.initial[1] = elevation_rad;
    st.reset(this.initial, 0, Math.min(INITIAL_STEP_M, this.settings.endRange_m));
    this.invariant_m = eq.invariant(observerHeight_m, elevation_rad);
    this.addKnot(false);
    const top = this.levels.length - 1;
    const startDir = elevation_rad > 0 || (elevation_rad === 0 && eq.elevationRate(observerHeight_m, false) >= 0) ? 1 : -1;
    this.enterDomain(observerHeight_m, startDir);
    let fate = -1;
    if (observerHeight_m === 0 && (elevation_rad < 0 || (elevation_rad === 0 && eq.elevationRate(0, true) < 0))) {
      fate = FATE_SURFACE;
      this.addKnot(false);
    }
    while (fate < 0) {
      if (this.steps >= this.settings.maxSteps) {
        this.stepLimitReached = true;
        fate = FATE_TRAPPED;
        break;
      }
      st.save(this.start);
      st.step(this.stepLimit());
      const more = st.t < this.settings.endRange_m;
      st.save(this.end);
      this.steps++;
      const level = this.findEvent();
      if (level === 0) fate = FATE_SURFACE;
      else if (level === top) fate = FATE_ESCAPED;
      else if (level > 0) {
        y[0] = this.levels[level]; // onto the node exactly: the next step starts on the kink
        st.dt = this.end.dt;
        this.enterDomain(y[0], y[1] > 0 || (y[1] === 0 && eq.elevationRate(y[0], false) >= 0) ? 1 : -1);
      } else if (!more) fate = this.settings.endIsTarget ? FATE_TARGET : FATE_TRAPPED;
      this.addKnot(level > 0);
    }
    this.fate = fate;
    this.endRange_m = st.t;
    this.endHeight_m = y[0];
    this.endElevation_rad = y[1];
    this.integratorSteps = st.stepCount - firstStepCount;
    this.evaluations = eq.evaluations - firstEvaluation;
  }

  /** Where the next step should stop (see levelAim): the state's slopes come from the last knot. */
  private stepLimit(): number {
    const st = this.stepper;
    return levelAim(this.levels, st.t, st.y[0], this.knotSlope, this.knotRate, this.equations.earthRadius_m, st.dt, this.settings.endRange_m);
  }

  /** Sets the equations' smooth domain to the pair of levels around z (the one above/below z when on a level, by dir). */
  private enterDomain(z: number, dir: number): void {
    const levels = this.levels;
    const up = nextLevel(levels, z, 1);
    const down = nextLevel(levels, z, -1);
    const onLevel = up >= 0 && down + 2 === up; // levels[down + 1] === z
    const lo = onLevel && dir > 0 ? z : down >= 0 ? levels[down] : -Infinity;
    const hi = onLevel && dir < 0 ? z : up >= 0 ? levels[up] : Infinity;
    this.equations.setDomain(lo, hi);
  }

  /** Records the stepper's state as a knot; updates drift and lowest point. */
  private addKnot(onKink: boolean): void {
    const st = this.stepper;
    const eq = this.equations;
    const z = st.y[0];
    const a = st.y[1];
    const c = eq.invariant(z, a); // samples the medium at z on the side the ray moves into
    this.knotRate = eq.sampledElevationRate(z);
    this.knotSlope = eq.heightRate(z, a);
    const drift = Math.abs(c / this.invariant_m - 1);
    if (drift > this.maxInvariantDrift) this.maxInvariantDrift = drift;
    if (z < this.minHeight_m) {
      this.minHeight_m = z;
      this.minHeightRange_m = st.t;
    }
    if (!this.recordKnots) return;
    const rateIn = onKink ? eq.elevationRate(z, a > 0) : this.knotRate;
    this.knots.push(st.t, z, a, this.knotSlope, rateIn, this.knotRate);
  }

  /**
   * Checks the step from this.start to this.end for a crossed level. Returns its index in levels,
   * with the stepper on the crossing; or −1, with the stepper back at this.end.
   */
  private findEvent(): number {
    const st = this.stepper;
    const eq = this.equations;
    const levels = this.levels;
    const s0 = this.start.t;
    const z0 = this.start.y[0];
    const a0 = this.start.y[1];
    const s1 = this.end.t;
    const z1 = this.end.y[0];
    const a1 = this.end.y[1];
    if (!(a0 * a1 < 0)) {
      const dir = a0 > 0 ? 1 : a0 < 0 ? -1 : z1 >= z0 ? 1 : -1;
      const k = nextLevel(levels, z0, dir);
      if (k < 0) return -1;
      const L = levels[k];
      // Arrived on the level (an aimed step), or stopped short of it, or crossed it.
      if (Math.abs(z1 - L) <= heightTolerance(L)) return k;
      if ((z1 - L) * dir < 0) return -1;
      const guess = hermiteCrossing(s0, z0, eq.heightRate(z0, a0), s1, z1, eq.heightRate(z1, a1), L, s0, s1);
      locateEvent(st, eq, this.start, HEIGHT, L, s0, z0 - L, s1, z1 - L, guess);
      return k;
    }
    // A turning point inside the step: find it on the integrated ray first.
    const dir = a0 > 0 ? 1 : -1;
    const d0 = eq.heightRate(z0, a0);
    const d1 = eq.heightRate(z1, a1);
    const guess = hermiteExtremum(s0, z0, d0, s1, z1, d1);
    locateEvent(st, eq, this.start, ELEVATION, 0, s0, a0, s1, a1, guess);
    st.save(this.vertex);
    const sv = this.vertex.t;
    const zv = this.vertex.y[0];
    const k1 = nextLevel(levels, z0, dir);
    if (k1 >= 0 && (zv - levels[k1]) * dir >= 0) {
      const g1 = hermiteCrossing(s0, z0, d0, s1, z1, d1, levels[k1], s0, sv);
      locateEvent(st, eq, this.start, HEIGHT, levels[k1], s0, z0 - levels[k1], sv, zv - levels[k1], g1);
      return k1;
    }
    if (dir < 0) {
      this.turned = true;
      if (zv < this.minHeight_m) {
        this.minHeight_m = zv;
        this.minHeightRange_m = sv;
      }
    }
    const k2 = nextLevel(levels, zv, -dir);
    if (k2 >= 0 && (z1 - levels[k2]) * dir <= 0) {
      const g2 = hermiteCrossing(s0, z0, d0, s1, z1, d1, levels[k2], sv, s1);
      locateEvent(st, eq, this.vertex, HEIGHT, levels[k2], sv, zv - levels[k2], s1, z1 - levels[k2], g2);
      return k2;
    }
    st.restore(this.end);
    return -1;
  }
}
