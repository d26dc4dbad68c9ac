/** The ray tracer (DESIGN.md §3): one ray, a fan, the ODE layer and the quadrature check. */
export { traceRay } from './ray.js';
export type { RayPath, RayPoint, RayResult } from './ray.js';
export { traceFan, MAX_FAN_RAYS, MAX_FAN_SAMPLES, PATH_FIELDS } from './fan.js';
export type { FanResult } from './fan.js';
export { DEFAULTS, MAX_ELEVATION_RAD, resolveTraceOptions } from './options.js';
export type { TraceOptions, TraceSettings } from './options.js';
export { FATES, FATE_ESCAPED, FATE_SURFACE, FATE_TARGET, FATE_TRAPPED, RayKernel } from './kernel.js';
export type { Fate } from './kernel.js';
export { RayEquations } from './equations.js';
export { OdeStepper, createOdeState } from './ode.js';
export type { Derivative, OdeOptions, OdeState } from './ode.js';
export { quadratureRange } from './quadrature.js';
export { InvariantExcess } from './invariant-excess.js';
export type { QuadratureOptions } from './quadrature.js';
export { integrateAdaptive } from './gauss-kronrod.js';
