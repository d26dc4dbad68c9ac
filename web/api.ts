/**
 * The viewer's client of the Loomline HTTP API: one function per route, typed results, and
 * ApiError carrying the server's field-named issues. Uses fetch only (no DOM).
 */
import type { ErrorJson, FindingsJson, Limits, ProfileResult, ScenarioJson, ScenarioList, TraceResult, ViewJson } from './types.js';

/** A failed request: HTTP status and the server's issues (field as a dotted path in the body). */
export class ApiError extends Error {
  readonly status: number;
  readonly issues: { field: string; message: string }[];
  constructor(status: number, message: string, issues: { field: string; message: string }[]) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.issues = issues;
  }
}

async function request<T>(path: string, body?: unknown, signal?: AbortSignal): Promise<T> {
  const init: RequestInit = body === undefined ? { signal } : { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body), signal };
  let response: Response;
  try {
    response = await fetch(path, init);
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new ApiError(0, 'the server did not answer (is it still running?)', []);
  }
  const text = await response.text();
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    throw new ApiError(response.status, `the server sent something that is not JSON (status ${response.status})`, []);
  }
  if (!response.ok) {
    const error = (json as Partial<ErrorJson>).error;
    throw new ApiError(response.status, error?.message ?? `request failed (status ${response.status})`, error?.issues ?? []);
  }
  return json as T;
}

/** Fan settings of a trace request: automatic span when from/to are absent. */
export interface FanRequest {
  count: number;
  from_deg?: number;
  to_deg?: number;
}

export const api = {
  scenarios: (signal?: AbortSignal) => request<ScenarioList>('/api/scenarios', undefined, signal),
  scenario: (id: string, signal?: AbortSignal) => request<ScenarioJson>(`/api/scenarios/${encodeURIComponent(id)}`, undefined, signal),
  limits: (signal?: AbortSignal) => request<Limits>('/api/limits', undefined, signal),
  profile: (scenario: ScenarioJson, heights_m: number[], signal?: AbortSignal) => request<ProfileResult>('/api/profile', { scenario, heights_m }, signal),
  trace: (scenario: ScenarioJson, fan: FanRequest, path_points: number, signal?: AbortSignal) => request<TraceResult>('/api/trace', { scenario, fan, path_points }, signal),
  findings: (scenario: ScenarioJson, signal?: AbortSignal) => request<FindingsJson>('/api/findings', { scenario, refraction_elevations_deg: [0] }, signal),
  view: (scenario: ScenarioJson, signal?: AbortSignal) => request<ViewJson>('/api/view', { scenario }, signal),
};

export type Api = typeof api;
