/**
 * Edits of the air that the form's table and kind switch make: temperature nodes (add, remove,
 * edit), switching between the ways the air is given, and the heights at which the air panel
 * samples the server's profile.
 */
import type { ScenarioJson } from '../types.js';
import { airKind, getPath, parseNumberText, setPath, type AirKind } from './model.js';

/** A temperature node as the file holds it (numbers or distributions). */
export interface NodeJson {
  height_m: unknown;
  temperature_C: unknown;
}

/** Node step when adding a node above the last one, m. */
const ADD_NODE_STEP_M = 10;
/** The scenario file's default height of the air temperature reading, m (DESIGN.md §5 bulk). */
const BULK_MEASUREMENT_HEIGHT_M = 10;

/** The scenario's temperature nodes (empty when the air is the standard atmosphere). */
export function nodesOf(scenario: ScenarioJson): NodeJson[] {
  const nodes = getPath(scenario, 'atmosphere.profile');
  return Array.isArray(nodes) ? (nodes as NodeJson[]) : [];
}

const num = (v: unknown, fallback: number): number => (typeof v === 'number' ? v : fallback);

/**
 * Adds a node above the last (same temperature, ADD_NODE_STEP_M higher). The first node goes at
 * 0 m and 15 °C, or for sea and air readings ADD_NODE_STEP_M above the air temperature's height
 * (nodes there continue the surface layer upward), at the air temperature.
 */
export function addNode(scenario: ScenarioJson): ScenarioJson {
  const nodes = nodesOf(scenario);
  const last = nodes[nodes.length - 1];
  const bulk = airKind(scenario) === 'bulk';
  const first = bulk
    ? { height_m: num(getPath(scenario, 'atmosphere.bulk.air_temperature_height_m'), BULK_MEASUREMENT_HEIGHT_M) + ADD_NODE_STEP_M, temperature_C: num(getPath(scenario, 'atmosphere.bulk.air_temperature_C'), 15) }
    : { height_m: 0, temperature_C: 15 };
  const node = last ? { height_m: num(last.height_m, 0) + ADD_NODE_STEP_M, temperature_C: num(last.temperature_C, 15) } : first;
  return setPath(scenario, 'atmosphere.profile', [...nodes, node]);
}

/** Removes node i (the profile keeps at least one node; for bulk air the list may empty and go). */
export function removeNode(scenario: ScenarioJson, i: number): ScenarioJson {
  const nodes = nodesOf(scenario).filter((_, j) => j !== i);
  if (nodes.length === 0) return airKind(scenario) === 'bulk' ? setPath(scenario, 'atmosphere.profile', undefined) : scenario;
  return setPath(scenario, 'atmosphere.profile', nodes);
}

/** Sets one cell of the node table from its text; returns the reason when the text is not a number. */
export function editNode(scenario: ScenarioJson, i: number, key: 'height_m' | 'temperature_C', text: string): { scenario: ScenarioJson } | { error: string } {
  const parsed = parseNumberText(text, false);
  if (!parsed.ok) return { error: parsed.message };
  return { scenario: setPath(scenario, `atmosphere.profile.${i}.${key}`, parsed.value) };
}

/**
 * Switches how the air is given, keeping what carries over (surface pressure, humidity, and the
 * surface temperature as the first node or the standard atmosphere's surface value).
 */
export function switchAir(scenario: ScenarioJson, kind: AirKind): ScenarioJson {
  if (kind === airKind(scenario)) return scenario;
  const atm = (scenario.atmosphere ?? {}) as Record<string, unknown>;
  const bulk = (atm.bulk ?? {}) as Record<string, unknown>;
  const pressure = atm.surface_pressure_hPa ?? bulk.surface_pressure_hPa;
  const humidity = atm.relative_humidity ?? bulk.relative_humidity;
  const nodes = nodesOf(scenario);
  const surfaceT = num(nodes[0]?.temperature_C, num(atm.surface_temperature_C, num(bulk.air_temperature_C, 15)));
  const keep = { ...(pressure !== undefined ? { surface_pressure_hPa: pressure } : {}), ...(humidity !== undefined ? { relative_humidity: humidity } : {}) };
  let atmosphere: Record<string, unknown>;
  if (kind === 'standard') atmosphere = { standard: 'us1976', surface_temperature_C: surfaceT, ...keep };
  else if (kind === 'bulk') atmosphere = { bulk: { sea_temperature_C: surfaceT, air_temperature_C: surfaceT, wind_speed_m_s: 5, ...keep }, above: 'us1976' };
  else atmosphere = { ...keep, profile: [{ height_m: 0, temperature_C: surfaceT }], above: 'us1976' };
  return { ...structuredClone(scenario), atmosphere };
}

/** Levels the air panel asks for. */
export const AIR_SAMPLES = 241;
/** The air panel shows up to this multiple of the highest height of interest. */
const AIR_HEADROOM = 1.6;
/** Lowest top of the air panel, m. */
const AIR_MIN_TOP_M = 10;
/** Highest height the server's profile route accepts, m. */
const AIR_MAX_TOP_M = 100_000;

/**
 * Heights for the air panel: 0 to AIR_HEADROOM × the highest of eye, target and node heights,
 * spaced quadratically (dense near the surface, where the inferior-mirage layers are thin), plus
 * every node height and the eye height exactly.
 */
export function airSampleHeights(scenario: ScenarioJson): number[] {
  const values = [getPath(scenario, 'observer.height_m'), getPath(scenario, 'target.height_m'), ...nodesOf(scenario).map((n) => n.height_m), getPath(scenario, 'atmosphere.bulk.air_temperature_height_m')];
  const finite = values.filter((v): v is number => typeof v === 'number' && Number.isFinite(v) && v >= 0);
  const top = Math.min(AIR_MAX_TOP_M, Math.max(AIR_MIN_TOP_M, AIR_HEADROOM * Math.max(0, ...finite)));
  const heights = Array.from({ length: AIR_SAMPLES }, (_, i) => top * (i / (AIR_SAMPLES - 1)) ** 2);
  for (const v of finite) if (v <= top) heights.push(v);
  return [...new Set(heights.map((h) => Math.round(h * 1e6) / 1e6))].sort((a, b) => a - b);
}
