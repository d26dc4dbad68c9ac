/**
 * The scenario editor's model, free of the DOM: which fields the form shows for a scenario, how a
 * field's text is read and written, and the edits of the temperature-node table. The scenario is
 * kept as the file's own JSON (DESIGN.md §5) so sections the form does not show survive edits.
 */
import type { ScenarioJson } from '../types.js';

/** Lapse offered when the user picks a constant lapse above the nodes, K/m (the US 1976 troposphere's). */
const DEFAULT_LAPSE_K_PER_M = -0.0065;

/** How the air is given: temperature nodes, the standard atmosphere, or sea and air observations. */
export type AirKind = 'profile' | 'standard' | 'bulk';

/** One input of the form. `path` is the dotted path in the scenario file (also what errors name). */
export interface FieldSpec {
  path: string;
  label: string;
  unit: string;
  kind: 'number' | 'text' | 'select' | 'above' | 'outline' | 'boolean';
  /** Choices of a select: [value, label]. */
  options?: [string, string][];
  /** May be left empty (the key is then removed and the file's default applies). */
  optional?: boolean;
  /** Name of the range in GET /api/limits `scenario` (for the hint beside the field). */
  limit?: string;
}

export interface FieldSection {
  title: string;
  fields: FieldSpec[];
}

/** Result of reading a field's text. */
export type Parsed = { ok: true; value: unknown } | { ok: false; message: string };

export const AIR_KINDS: [AirKind, string][] = [
  ['profile', 'temperature nodes'],
  ['standard', 'standard (US 1976)'],
  ['bulk', 'sea & air readings'],
];

const INDEX_MODELS: [string, string][] = [
  ['ciddor', 'Ciddor 1996'],
  ['edlen', 'Edlén 1966'],
  ['birch-downs', 'Birch & Downs'],
  ['radio', 'radio (P.453)'],
  ['none', 'none (straight)'],
];

const SHAPES: [string, string][] = [
  ['', '(plain bar)'],
  ['vessel', 'vessel'],
  ['tower', 'tower'],
  ['cliff', 'cliff coast'],
  ['ice', 'ice block'],
  ['pole', 'pole'],
  ['custom', 'custom outline'],
];

/** Which way the air is given in a scenario. */
export function airKind(scenario: ScenarioJson): AirKind {
  const atm = scenario.atmosphere as Record<string, unknown> | undefined;
  if (atm && 'standard' in atm) return 'standard';
  if (atm && 'bulk' in atm) return 'bulk';
  return 'profile';
}

/** The form's sections for a scenario (they depend on the air kind, index model and shape). */
export function fieldSections(scenario: ScenarioJson): FieldSection[] {
  const model = (getPath(scenario, 'optics.index_model') as string | undefined) ?? 'ciddor';
  const shape = getPath(scenario, 'target.shape');
  const kind = airKind(scenario);
  const sight: FieldSpec[] = [
    { path: 'name', label: 'Name', unit: '', kind: 'text' },
    { path: 'observer.height_m', label: 'Eye height', unit: 'm', kind: 'number', limit: 'observer_height_m' },
    { path: 'target.range_m', label: 'Target range', unit: 'm', kind: 'number', limit: 'target_range_m' },
    { path: 'target.height_m', label: 'Target height', unit: 'm', kind: 'number', limit: 'target_height_m' },
    { path: 'target.shape', label: 'Target shape', unit: '', kind: 'select', options: SHAPES, optional: true },
  ];
  if (shape === 'custom') sight.push({ path: 'target.outline', label: 'Outline (width height; …)', unit: 'm', kind: 'outline', limit: 'outline_m' });
  const light: FieldSpec[] = [{ path: 'optics.index_model', label: 'Index model', unit: '', kind: 'select', options: INDEX_MODELS, optional: true }];
  if (model !== 'radio' && model !== 'none') light.push({ path: 'optics.wavelength_nm', label: 'Wavelength', unit: 'nm', kind: 'number', optional: true, limit: 'wavelength_nm' });
  const air: FieldSpec[] = [];
  if (kind === 'bulk') {
    const b = 'atmosphere.bulk.';
    air.push(
      { path: `${b}sea_temperature_C`, label: 'Sea temperature', unit: '°C', kind: 'number', limit: 'sea_temperature_C' },
      { path: `${b}air_temperature_C`, label: 'Air temperature', unit: '°C', kind: 'number', limit: 'air_temperature_C' },
      { path: `${b}air_temperature_height_m`, label: '…measured at', unit: 'm', kind: 'number', optional: true, limit: 'measurement_height_m' },
      { path: `${b}wind_speed_m_s`, label: 'Wind speed', unit: 'm/s', kind: 'number', limit: 'wind_speed_m_s' },
      { path: `${b}wind_height_m`, label: '…measured at', unit: 'm', kind: 'number', optional: true, limit: 'measurement_height_m' },
      { path: `${b}relative_humidity`, label: 'Relative humidity', unit: '0–1', kind: 'number', optional: true, limit: 'relative_humidity' },
      { path: `${b}surface_pressure_hPa`, label: 'Surface pressure', unit: 'hPa', kind: 'number', optional: true, limit: 'surface_pressure_hPa' },
      { path: `${b}cool_skin`, label: 'Cool skin', unit: '', kind: 'boolean', optional: true },
    );
  } else {
    if (kind === 'standard') air.push({ path: 'atmosphere.surface_temperature_C', label: 'Surface temperature', unit: '°C', kind: 'number', optional: true, limit: 'surface_temperature_C' });
    air.push(
      { path: 'atmosphere.surface_pressure_hPa', label: 'Surface pressure', unit: 'hPa', kind: 'number', optional: true, limit: 'surface_pressure_hPa' },
      { path: 'atmosphere.relative_humidity', label: 'Relative humidity', unit: '0–1', kind: 'number', optional: true, limit: 'relative_humidity' },
    );
  }
  if (kind !== 'standard') {
    air.push({ path: 'atmosphere.above', label: 'Above the nodes', unit: '', kind: 'above', options: [['us1976', 'US 1976 lapse rates'], ['lapse', 'constant lapse']] });
    if (typeof getPath(scenario, 'atmosphere.above') === 'object') {
      air.push({ path: 'atmosphere.above.lapse_K_per_m', label: 'Lapse', unit: 'K/m', kind: 'number', limit: 'lapse_K_per_m' });
    }
  }
  return [
    { title: 'Sight line', fields: sight },
    { title: 'Light', fields: light },
    { title: 'Air', fields: air },
  ];
}

/** Reads a dotted path ("atmosphere.profile.1.height_m"); undefined where absent. */
export function getPath(value: unknown, path: string): unknown {
  let at: unknown = value;
  for (const key of path.split('.')) {
    if (at === null || typeof at !== 'object') return undefined;
    at = (at as Record<string, unknown>)[key];
  }
  return at;
}

/** A copy of the scenario with the path set (undefined removes the key); creates objects on the way. */
export function setPath(scenario: ScenarioJson, path: string, value: unknown): ScenarioJson {
  const copy = structuredClone(scenario);
  const keys = path.split('.');
  let at = copy as Record<string, unknown>;
  for (const key of keys.slice(0, -1)) {
    if (at[key] === null || typeof at[key] !== 'object') at[key] = {};
    at = at[key] as Record<string, unknown>;
  }
  const last = keys[keys.length - 1];
  if (value === undefined) {
    if (Array.isArray(at)) at.splice(Number(last), 1);
    else delete at[last];
  } else {
    at[last] = value;
  }
  return copy;
}

/** The text a field shows for its value. Distributions show as JSON. */
export function formatField(scenario: ScenarioJson, spec: FieldSpec): string {
  const value = getPath(scenario, spec.path);
  if (spec.kind === 'above') return typeof value === 'object' && value !== null ? 'lapse' : 'us1976';
  if (spec.kind === 'boolean') return value === true ? 'yes' : 'no';
  if (spec.kind === 'outline') return Array.isArray(value) ? value.map((p) => (p as number[]).join(' ')).join('; ') : '';
  if (value === undefined || value === null) return '';
  if (typeof value === 'object') return JSON.stringify(value);
  return String(value);
}

/** Reads a number typed by a user, or a distribution written as JSON ({"normal": …}). */
export function parseNumberText(text: string, optional: boolean): Parsed {
  const t = text.trim();
  if (t === '') return optional ? { ok: true, value: undefined } : { ok: false, message: 'required' };
  if (t.startsWith('{')) {
    try {
      return { ok: true, value: JSON.parse(t) };
    } catch {
      return { ok: false, message: 'not valid JSON for a distribution' };
    }
  }
  const value = Number(t.replace(/\u2212/g, '-'));
  if (!Number.isFinite(value)) return { ok: false, message: `"${t.slice(0, 20)}" is not a number` };
  return { ok: true, value };
}

/** Reads "w h; w h; …" (metres) as outline pairs. */
export function parseOutline(text: string): Parsed {
  const pairs = text.split(/[;\n]/).map((p) => p.trim()).filter(Boolean);
  const out: [number, number][] = [];
  for (const pair of pairs) {
    const parts = pair.split(/[\s,]+/).map(Number);
    if (parts.length !== 2 || !parts.every(Number.isFinite)) return { ok: false, message: `"${pair.slice(0, 20)}" is not a "width height" pair` };
    out.push([parts[0], parts[1]]);
  }
  if (out.length < 2) return { ok: false, message: 'give at least two "width height" pairs, separated by ";"' };
  return { ok: true, value: out };
}

/** Applies a field's text to the scenario; returns the new scenario or the reason it cannot. */
export function applyField(scenario: ScenarioJson, spec: FieldSpec, text: string): { scenario: ScenarioJson } | { error: string } {
  let parsed: Parsed;
  if (spec.kind === 'number') parsed = parseNumberText(text, spec.optional ?? false);
  else if (spec.kind === 'outline') parsed = parseOutline(text);
  else if (spec.kind === 'boolean') parsed = { ok: true, value: text === 'yes' };
  else if (spec.kind === 'above') {
    const current = getPath(scenario, spec.path);
    const keep = text === 'lapse' && typeof current === 'object' && current !== null;
    parsed = { ok: true, value: keep ? current : text === 'lapse' ? { lapse_K_per_m: DEFAULT_LAPSE_K_PER_M } : 'us1976' };
  }
  else if (spec.kind === 'select' && spec.optional && text === '') parsed = { ok: true, value: undefined };
  else parsed = { ok: true, value: text };
  if (!parsed.ok) return { error: parsed.message };
  const next = setPath(scenario, spec.path, parsed.value);
  if (spec.path === 'target.shape' && parsed.value === 'custom' && getPath(next, 'target.outline') === undefined) {
    return { scenario: setPath(next, 'target.outline', startingOutline(getPath(next, 'target.height_m'))) };
  }
  return { scenario: next };
}

/** Outline offered when the user first picks a custom shape: a block as wide as half its height, m. */
export function startingOutline(height: unknown): [number, number][] {
  const h = typeof height === 'number' && height > 0 ? height : 10;
  return [[0, 0], [0, h], [h / 2, h], [h / 2, 0]];
}
