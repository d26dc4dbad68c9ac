/**
 * Compile-time contract between the server's result types and the viewer's copies of them
 * (web/types.ts): `npm run typecheck` fails when a field is renamed, retyped or dropped on either
 * side. No runtime code (the viewer cannot import server modules into its bundle).
 */
import type { ProfileLevel as ServerProfileLevel } from '../../server/service/profile.js';
import type { TraceResult as ServerTraceResult, TracedRay as ServerTracedRay } from '../../server/service/trace.js';
import type { ViewJson as ServerViewJson } from '../../server/service/view.js';
import type { ProfileLevel, TraceRay, TraceResult, ViewJson } from '../../web/types.js';

type Same<A, B> = [A] extends [B] ? ([B] extends [A] ? true : false) : false;
type Assert<T extends true> = T;

export type ContractChecks = [
  Assert<Same<Omit<ServerProfileLevel, 'vapour_pressure_hPa'>, ProfileLevel>>,
  Assert<Same<ServerTracedRay, TraceRay>>,
  Assert<Same<ServerTraceResult, Omit<TraceResult, 'fan'>>>,
  Assert<Same<Omit<ServerViewJson, 'legend'>, Omit<ViewJson, 'legend'>>>,
];
