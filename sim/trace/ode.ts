/**
 * A small layer over ode45-cash-karp (STYLE.md §9): derivative functions that fill preallocated
 * typed arrays, the tolerance and step limits as options, exact arrival at a limit of the
 * independent variable, and saving / restoring the integrator's state so that a caller can go back
 * to the start of a step and re-integrate to an event (the library has no events of its own).
 *
 * Method: Cash & Karp (1990), "A variable order Runge–Kutta method for initial value problems
 * with rapidly varying right-hand sides", ACM TOMS 16, 201–222: fifth-order solution with an
 * embedded fourth-order error estimate (the library propagates the fifth-order solution).
 */
import createIntegrator from 'ode45-cash-karp';
import type { Ode45Integrator } from 'ode45-cash-karp';

/** Fills dydt (preallocated) with dy/dt at (y, t). Must not keep references to y. */
export type Derivative = (dydt: Float64Array, y: Float64Array, t: number) => void;

/** Step control of the integrator. */
export interface OdeOptions {
  /**
   * Largest accepted error estimate per step, after dividing component i's error by
   * errorScale[i]. With errorScale given this is an absolute local error in those units.
   */
  tolerance: number;
  /**
   * Absolute error scale per component (same unit as y[i] per unit of tolerance). Omitted: the
   * library's mixed scale |y| + |dt·dy/dt| (a relative error).
   */
  errorScale?: ArrayLike<number>;
  /** Largest step (same unit as t). Default: none. */
  maxStep?: number;
  /** Largest growth of the step after an accepted step. Default 10 (the library's). */
  maxIncreaseFactor?: number;
  /** Largest shrink of the step per rejected trial. Default 10 (the library's). */
  maxDecreaseFactor?: number;
}

/** A saved integrator state: y, t and the step proposed for the next step. */
export interface OdeState {
  readonly y: Float64Array;
  t: number;
  dt: number;
}

/** Allocates a state buffer of the given dimension. */
export function createOdeState(dimension: number): OdeState {
  return { y: new Float64Array(dimension), t: 0, dt: 0 };
}

/** A step that lands this close to its limit (relative to the step) is snapped onto the limit. */
const LIMIT_SNAP_FRACTION = 1e-9;

/**
 * An adaptive Cash–Karp integrator over a fixed-dimension state. Allocates once; every method is
 * allocation-free. Integrates forward only (t increasing).
 */
export class OdeStepper {
  /** The current state, updated in place by every step. */
  readonly y: Float64Array;
  /** Steps taken since construction or the last resetCount (accepted steps of the library). */
  stepCount = 0;
  private readonly integrator: Ode45Integrator<Float64Array>;
  private readonly scale: Float64Array;

  /**
   * @param dimension number of state components (≥ 1).
   * @param derivative fills dydt at (y, t).
   * @param options tolerance and step limits.
   */
  constructor(dimension: number, derivative: Derivative, options: OdeOptions) {
    this.y = new Float64Array(dimension);
    this.scale = new Float64Array(dimension).fill(1);
    const scale = this.scale;
    const absolute = options.errorScale !== undefined;
    if (options.errorScale) this.scale.set(options.errorScale);
    this.integrator = createIntegrator(this.y, derivative, 0, 1, {
      tol: options.tolerance,
      verbose: false,
      dtMaxMag: options.maxStep !== undefined && Number.isFinite(options.maxStep) ? options.maxStep : undefined,
      maxIncreaseFactor: options.maxIncreaseFactor ?? 10,
      maxDecreaseFactor: options.maxDecreaseFactor ?? 10,
      ...(absolute ? { errorScaleFunction: (i: number) => scale[i] } : {}),
    });
  }

  /** Current value of the independent variable. */
  get t(): number {
    return this.integrator.t;
  }

  /** Step size proposed for the next step. */
  get dt(): number {
    return this.integrator.dt;
  }

  set dt(value: number) {
    this.integrator.dt = value;
  }

  /** Changes the tolerance (same meaning as OdeOptions.tolerance). */
  setTolerance(tolerance: number): void {
    this.integrator.tol = tolerance;
  }

  /** Changes the absolute error scale of component i (only when created with errorScale). */
  setErrorScale(i: number, value: number): void {
    this.scale[i] = value;
  }

  /** Starts again from y0 at t0 with a first trial step dt0 (> 0). */
  reset(y0: ArrayLike<number>, t0: number, dt0: number): void {
    for (let i = 0; i < this.y.length; i++) this.y[i] = y0[i];
    this.integrator.t = t0;
    this.integrator.dt = dt0;
  }

  /**
   * Takes one accepted step, never past tLimit, and lands exactly on tLimit when it gets there.
   * @returns true while t < tLimit after the step; false once t = tLimit (no step taken if already there).
   */
  step(tLimit: number): boolean {
    const it = this.integrator;
    const rest = tLimit - it.t;
    if (!(rest > 0)) return false;
    const proposal = it.dt;
    // The library refuses to move when the rest is below 1e-10·dt; shorten dt so it always moves.
    if (rest < proposal * 1e-6) it.dt = rest;
    it.step(tLimit);
    this.stepCount++;
    if (tLimit - it.t <= rest * LIMIT_SNAP_FRACTION) {
      it.t = tLimit;
      // A step shortened by the limit says nothing against the proposed size: keep it (the
      // library would shrink the proposal by up to maxDecreaseFactor after every short step).
      if (rest < proposal && it.dt < proposal) it.dt = proposal;
      return false;
    }
    return true;
  }

  /** Integrates to exactly tLimit (≥ t). */
  advanceTo(tLimit: number): void {
    while (this.step(tLimit)) {
      /* each call is one accepted step */
    }
  }

  /** Copies y, t and the proposed step into state. */
  save(state: OdeState): void {
    state.y.set(this.y);
    state.t = this.integrator.t;
    state.dt = this.integrator.dt;
  }

  /** Restores y, t and the proposed step from state. */
  restore(state: OdeState): void {
    this.y.set(state.y);
    this.integrator.t = state.t;
    this.integrator.dt = state.dt;
  }
}
