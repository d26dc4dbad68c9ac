/**
 * Types for ode45-cash-karp 1.1.0 (scijs; plain CommonJS, no bundled types): an adaptive
 * fifth-order Runge–Kutta integrator with the Cash–Karp embedded error estimate
 * (Cash & Karp 1990, ACM TOMS 16, 201). Only what the package's lib/index.js really does.
 */
declare module 'ode45-cash-karp' {
  namespace ode45 {
    /** Fills dydt with the derivative at (y, t). Must not allocate in hot loops. */
    export type Ode45Derivative<Y> = (dydt: Y, y: Y, t: number) => void;

    export interface Ode45Options {
      /** Accepted error per step (after scaling). Default 1e-8. */
      tol?: number;
      /** Largest growth factor of dt after an accepted step. Default 10. */
      maxIncreaseFactor?: number;
      /** Largest shrink factor of dt per rejected trial. Default 10. */
      maxDecreaseFactor?: number;
      /** Smallest |dt|; reaching it accepts the step anyway (and logs when verbose). Default none. */
      dtMinMag?: number;
      /** Largest |dt|. Default none. */
      dtMaxMag?: number;
      /** Log warnings with console.log. Default true. */
      verbose?: boolean;
      /** Scale of component i's error at the start of a step. Default |y| + |dt·dydt| + 1e-32. */
      errorScaleFunction?: (i: number, dt: number, y: number, dydt: number) => number;
      /** Combines the scaled component errors. Default max(|e|). */
      errorReduceFunction?: (i: number, accumulated: number, errorEstimate: number) => number;
      /** Applied to the combined error. Default identity. */
      errorPostFunction?: (accumulated: number) => number;
      /** Step-size safety factor. Default 0.9. */
      safetyFactor?: number;
  }

  export interface Ode45Integrator<Y> {
    /** Current state (the y0 array given to the factory, updated in place). */
    y: Y;
    /** Current value of the independent variable. */
    t: number;
    /** Step size proposed for the next step. */
    dt: number;
    /** Dimension. */
    readonly n: number;
    tol: number;
    maxIncreaseFactor: number;
    maxDecreaseFactor: number;
    dtMinMag: number;
    dtMaxMag: number | undefined;
    verbose: boolean;
    safetyFactor: number;
    /** One accepted step, never past tLimit; false once t has reached tLimit. */
    step(tLimit?: number): boolean;
    /** Up to n steps; returns false when tLimit is reached, otherwise undefined. */
    steps(n: number, tLimit?: number): false | undefined;
  }

  }

  function ode45<Y extends Float64Array | number[]>(
    y0: Y,
    deriv: ode45.Ode45Derivative<Y>,
    t0: number,
    dt0: number,
    options?: ode45.Ode45Options,
  ): ode45.Ode45Integrator<Y>;

  export = ode45;
}
