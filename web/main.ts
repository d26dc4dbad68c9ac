/**
 * The page: the one file that touches the DOM. It builds the editor form from the editor model,
 * passes edits to the session, and draws the session's updates with Plotly (figures come from the
 * pure functions in ./figures). When every plot of an update is drawn it sets body[data-ready] to
 * the update's generation (tests and the bench wait on it).
 */
import type * as PlotlyT from 'plotly.js-dist-min';
import { api } from './api.js';
import { addNode, editNode, nodesOf, removeNode, switchAir } from './editor/air.js';
import { placeIssues } from './editor/issues.js';
import { AIR_KINDS, airKind, applyField, fieldSections, formatField, type AirKind, type FieldSpec } from './editor/model.js';
import { airFigure } from './figures/air.js';
import { heightsFigure } from './figures/heights.js';
import { pathsFigure } from './figures/paths.js';
import { mountOutlookPanel } from './outlook-panel.js';
import { plotConfig, type Figure } from './figures/theme.js';
import { viewFigure } from './figures/view.js';
import { mountEnsemblePanel } from './ensemble-panel.js';
import { panelNotes, statusLine, summaryLines } from './summary.js';
import { DEFAULT_VIEWER_RAYS, EDIT_DEBOUNCE_MS, Session, type PanelData, type SessionUpdate } from './session.js';
import type { Limits, ScenarioJson } from './types.js';

declare const Plotly: typeof PlotlyT;

const byId = <T extends HTMLElement = HTMLElement>(id: string) => document.getElementById(id) as T;
const el = <K extends keyof HTMLElementTagNameMap>(tag: K, props: Record<string, string> = {}, text = ''): HTMLElementTagNameMap[K] => {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(props)) node.setAttribute(k, v);
  if (text) node.textContent = text;
  return node;
};

let limits: Limits | null = null;
let specs = new Map<string, FieldSpec>();
/** Inputs whose text could not be read, by path (these edits are not sent). */
const localErrors = new Map<string, string>();
let lastIssues: SessionUpdate['issues'] = [];

const session = new Session(
  api,
  (update) => void draw(update),
  (busy) => {
    document.body.toggleAttribute('data-busy', busy);
    if (busy) byId('status').textContent = 'tracing…';
  },
  EDIT_DEBOUNCE_MS,
  (generation, data) => {
    drawChain = drawChain.then(() => drawPanels(generation, data));
  },
);

// ── Editor ────────────────────────────────────────────────────────────────────────────────────

function rangeHint(spec: FieldSpec): string {
  const range = spec.limit ? (limits as unknown as { scenario?: Record<string, { min: number; max: number; unit: string }> })?.scenario?.[spec.limit] : undefined;
  return range ? `allowed ${range.min}…${range.max} ${range.unit}` : '';
}

function fieldInput(spec: FieldSpec, value: string): HTMLElement {
  if (spec.kind === 'select' || spec.kind === 'above' || spec.kind === 'boolean') {
    const select = el('select', { 'data-path': spec.path });
    const options = spec.kind === 'boolean' ? [['no', 'no'], ['yes', 'yes']] : spec.options ?? [];
    for (const [v, label] of options) select.append(el('option', { value: v }, label));
    select.value = value;
    return select;
  }
  if (spec.kind === 'outline') return Object.assign(el('textarea', { 'data-path': spec.path, rows: '2' }), { value });
  return el('input', { 'data-path': spec.path, value, inputmode: spec.kind === 'number' ? 'decimal' : 'text', title: rangeHint(spec) });
}

function renderEditor(): void {
  const scenario = session.scenario;
  const form = byId<HTMLFormElement>('editor');
  form.replaceChildren();
  specs = new Map();
  for (const section of fieldSections(scenario)) {
    const box = el('fieldset', { class: 'editor-section' });
    box.append(el('legend', {}, section.title));
    if (section.title === 'Air') {
      const kind = el('select', { 'data-air-kind': '' });
      for (const [v, label] of AIR_KINDS) kind.append(el('option', { value: v }, label));
      kind.value = airKind(scenario);
      box.append(row('Air given as', kind, '', 'atmosphere'));
    }
    for (const spec of section.fields) {
      specs.set(spec.path, spec);
      box.append(row(spec.label, fieldInput(spec, formatField(scenario, spec)), spec.unit, spec.path, rangeHint(spec)));
    }
    form.append(box);
  }
  byId('scenario-description').textContent = typeof scenario.description === 'string' ? scenario.description : '';
  renderNodes();
  showErrors();
}

function row(label: string, input: HTMLElement, unit: string, path: string, hint = ''): HTMLElement {
  const wrap = el('div', { class: unit ? 'field' : 'field wide' });
  const name = el('label', { class: 'field-label' }, label);
  const id = `f-${path.replace(/\W+/g, '-')}`;
  input.id = id;
  name.setAttribute('for', id);
  wrap.append(name, input, el('span', { class: 'unit', title: hint }, unit), el('div', { class: 'field-error', 'data-error-for': path }));
  return wrap;
}

function renderNodes(): void {
  const nodes = nodesOf(session.scenario);
  const section = byId('nodes').closest('section') as HTMLElement;
  section.hidden = airKind(session.scenario) === 'standard';
  byId('nodes').classList.toggle('empty', nodes.length === 0);
  const body = byId('nodes').querySelector('tbody') as HTMLElement;
  body.replaceChildren();
  nodes.forEach((node, i) => {
    const tr = el('tr');
    for (const key of ['height_m', 'temperature_C'] as const) {
      const path = `atmosphere.profile.${i}.${key}`;
      const value = node[key];
      const input = el('input', { 'data-node': String(i), 'data-key': key, 'data-path': path, inputmode: 'decimal', 'aria-label': `node ${i + 1} ${key}` });
      input.value = typeof value === 'object' ? JSON.stringify(value) : String(value ?? '');
      const td = el('td');
      td.append(input, el('div', { class: 'field-error', 'data-error-for': path }));
      tr.append(td);
    }
    const remove = el('button', { type: 'button', class: 'small remove', 'data-remove': String(i), title: 'remove this node' }, '×');
    if (nodes.length <= 1 && airKind(session.scenario) !== 'bulk') remove.setAttribute('disabled', '');
    const td = el('td');
    td.append(remove);
    tr.append(td);
    body.append(tr);
  });
}

/** Shows local and server problems beside their fields (and the rest above the form). */
function showErrors(): void {
  for (const slot of document.querySelectorAll<HTMLElement>('[data-error-for]')) slot.textContent = '';
  for (const input of document.querySelectorAll<HTMLElement>('[aria-invalid]')) input.removeAttribute('aria-invalid');
  const fanIssues = lastIssues.filter((i) => i.field.startsWith('fan') || i.field === 'path_points');
  const paths = [...document.querySelectorAll<HTMLElement>('[data-error-for]')].map((s) => s.dataset.errorFor as string);
  const placed = placeIssues(lastIssues.filter((i) => !fanIssues.includes(i)), paths);
  for (const [path, message] of localErrors) placed.byField.set(path, [message, ...(placed.byField.get(path) ?? [])]);
  if (fanIssues.length) placed.byField.set('fan', fanIssues.map((i) => `${i.field}: ${i.message}`));
  for (const [path, messages] of placed.byField) {
    const slot = document.querySelector<HTMLElement>(`[data-error-for="${CSS.escape(path)}"]`);
    if (slot) slot.textContent = messages.join('; ');
    document.querySelector(`[data-path="${CSS.escape(path)}"]`)?.setAttribute('aria-invalid', 'true');
  }
  const general = byId('general-errors');
  general.hidden = placed.general.length === 0;
  general.textContent = placed.general.join('\n');
}

function onEdit(event: Event, commit: boolean): void {
  const target = event.target as HTMLInputElement | HTMLSelectElement;
  let next: ScenarioJson | null = null;
  let structural = target instanceof HTMLSelectElement;
  if (target.dataset.airKind !== undefined) {
    next = switchAir(session.scenario, target.value as AirKind);
  } else if (target.dataset.node !== undefined) {
    const result = editNode(session.scenario, Number(target.dataset.node), target.dataset.key as 'height_m' | 'temperature_C', target.value);
    next = recordLocal(target.dataset.path as string, result);
  } else if (target.dataset.path && specs.has(target.dataset.path)) {
    const spec = specs.get(target.dataset.path) as FieldSpec;
    next = recordLocal(spec.path, applyField(session.scenario, spec, target.value));
  } else {
    return;
  }
  if (next === null) {
    showErrors();
    return;
  }
  session.scenario = next;
  if (structural) renderEditor();
  else showErrors();
  if (localErrors.size === 0) session.schedule(commit || structural);
}

function recordLocal(path: string, result: { scenario: ScenarioJson } | { error: string }): ScenarioJson | null {
  if ('error' in result) {
    localErrors.set(path, result.error);
    return null;
  }
  localErrors.delete(path);
  return result.scenario;
}

function onFan(): void {
  const count = Number(byId<HTMLInputElement>('fan-count').value || DEFAULT_VIEWER_RAYS);
  const from = byId<HTMLInputElement>('fan-from').value.trim();
  const to = byId<HTMLInputElement>('fan-to').value.trim();
  const span = from !== '' && to !== '' ? { from_deg: Number(from), to_deg: Number(to) } : {};
  session.setFan({ count, ...span });
}

async function openScenario(id: string): Promise<void> {
  const scenario = await api.scenario(id);
  localErrors.clear();
  lastIssues = [];
  session.scenario = scenario;
  renderEditor();
  session.schedule(true);
}

// ── Drawing ───────────────────────────────────────────────────────────────────────────────────

function plot(id: string, figure: Figure, name: string): Promise<unknown> {
  return Plotly.react(byId(id), figure.data, figure.layout, plotConfig(name));
}

/** Panels drawn for the current generation; drawing runs in one chain so panels never interleave. */
let drawnGeneration = -1;
const drawnPanels = new Set<string>();
let drawChain: Promise<void> = Promise.resolve();
let draw_ms = 0;

/**
 * Draws every panel whose data has arrived and that is not yet drawn for this generation (the
 * session reports each panel's data as it arrives, so the first plots appear while the server
 * still computes the rest).
 */
async function drawPanels(generation: number, data: Partial<PanelData>): Promise<void> {
  if (generation !== drawnGeneration) {
    drawnGeneration = generation;
    drawnPanels.clear();
    draw_ms = 0;
  }
  const started = performance.now();
  /** True once per panel and generation, when its data is there. */
  const first = (name: string, ready: unknown): boolean => {
    if (!ready || drawnPanels.has(name)) return false;
    drawnPanels.add(name);
    return true;
  };
  const sight = data.trace ?? data.findings;
  if (first('air', data.profile && sight)) {
    const observer_height_m = sight!.observer_height_m;
    const target_height_m = data.trace?.target_height_m ?? data.findings!.target_height_m;
    await plot('plot-air', airFigure(data.profile!, { observer_height_m, target_height_m }), 'air');
  }
  if (first('paths', data.trace)) {
    const trace = data.trace!;
    await plot('plot-paths', pathsFigure(trace), 'light-paths');
    if (trace.fan) {
      byId<HTMLInputElement>('fan-from').placeholder = trace.fan.from_deg.toFixed(3);
      byId<HTMLInputElement>('fan-to').placeholder = trace.fan.to_deg.toFixed(3);
    }
  }
  if (first('heights', data.findings)) {
    await plot('plot-heights', heightsFigure(data.findings!.transfer, { target_height_m: data.findings!.target_height_m }), 'heights-at-target');
  }
  if (first('view', data.view && data.findings)) {
    await plot('plot-view', viewFigure(data.view!, { images: data.findings!.visibility.images }), 'view');
  }
  draw_ms += performance.now() - started;
}

/** The session's update after every request has answered: the rest of the panels, words, status, ready marker. */
async function draw(update: SessionUpdate): Promise<void> {
  lastIssues = update.issues;
  showErrors();
  document.body.classList.toggle('stale', update.stale);
  const data = update.data;
  if (data && !update.stale) {
    const done = drawChain.then(() => drawPanels(update.generation, data));
    drawChain = done;
    await done;
    const started = performance.now();
    byId('findings').replaceChildren(...summaryLines(data).map((line) => el('p', { class: `finding ${line.kind}` }, line.text)));
    draw_ms += performance.now() - started;
  }
  if (data) byId('warnings').replaceChildren(...panelNotes(data, update.stale).map((n) => el('li', {}, n)));
  const drawn_ms = update.stale ? 0 : draw_ms;
  byId('status').textContent = statusLine(update, drawn_ms);
  document.body.dataset.serverMs = update.server_ms.toFixed(1);
  document.body.dataset.drawMs = drawn_ms.toFixed(1);
  document.body.dataset.ready = String(update.generation);
}

// ── Start ─────────────────────────────────────────────────────────────────────────────────────

function saveScenario(): void {
  const name = typeof session.scenario.name === 'string' ? session.scenario.name : 'scenario';
  const blob = new Blob([JSON.stringify(session.scenario, null, 2) + '\n'], { type: 'application/json' });
  const link = el('a', { href: URL.createObjectURL(blob), download: `${name.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '') || 'scenario'}.json` });
  link.click();
  setTimeout(() => URL.revokeObjectURL(link.href), 1000);
}

async function loadFile(file: File): Promise<void> {
  let value: unknown;
  try {
    value = JSON.parse(await file.text());
  } catch {
    lastIssues = [{ field: '', message: `${file.name} is not a JSON file` }];
    showErrors();
    return;
  }
  if (value === null || typeof value !== 'object' || Array.isArray(value)) {
    lastIssues = [{ field: '', message: `${file.name} does not hold a scenario object` }];
    showErrors();
    return;
  }
  const picker = byId<HTMLSelectElement>('scenario-picker');
  if (!picker.querySelector('option[value=""]')) picker.prepend(el('option', { value: '' }, '(opened from a file)'));
  picker.value = '';
  localErrors.clear();
  session.scenario = value as ScenarioJson;
  renderEditor();
  session.schedule(true);
}

async function start(): Promise<void> {
  mountOutlookPanel(document.querySelector<HTMLElement>('.panels')!);
  mountEnsemblePanel(document.querySelector('.panels') as HTMLElement, () => session.scenario);
  const form = byId('editor');
  form.addEventListener('input', (e) => onEdit(e, false));
  form.addEventListener('change', (e) => onEdit(e, true));
  form.addEventListener('submit', (e) => e.preventDefault());
  const nodes = byId('nodes');
  nodes.addEventListener('input', (e) => onEdit(e, false));
  nodes.addEventListener('change', (e) => onEdit(e, true));
  nodes.addEventListener('click', (e) => {
    const index = (e.target as HTMLElement).dataset.remove;
    if (index === undefined) return;
    session.scenario = removeNode(session.scenario, Number(index));
    renderEditor();
    session.schedule(true);
  });
  byId('add-node').addEventListener('click', () => {
    session.scenario = addNode(session.scenario);
    renderEditor();
    session.schedule(true);
  });
  byId('fan-form').addEventListener('change', onFan);
  byId('fan-form').addEventListener('submit', (e) => {
    e.preventDefault();
    onFan();
  });
  byId<HTMLInputElement>('fan-count').value = String(DEFAULT_VIEWER_RAYS);
  byId('save-button').addEventListener('click', saveScenario);
  byId('load-button').addEventListener('click', () => byId('load-file').click());
  byId<HTMLInputElement>('load-file').addEventListener('change', (e) => {
    const file = (e.target as HTMLInputElement).files?.[0];
    if (file) void loadFile(file);
  });
  const picker = byId<HTMLSelectElement>('scenario-picker');
  picker.addEventListener('change', () => {
    if (picker.value) void openScenario(picker.value);
  });

  const [list, fetchedLimits] = await Promise.all([api.scenarios(), api.limits()]);
  limits = fetchedLimits;
  for (const entry of list.scenarios) picker.append(el('option', { value: entry.id, title: entry.description }, entry.name));
  const wanted = new URLSearchParams(location.search).get('scenario');
  const id = wanted && list.scenarios.some((s) => s.id === wanted) ? wanted : list.default_id;
  picker.value = id;
  await openScenario(id);
}

start().catch((error: unknown) => {
  byId('status').textContent = `could not start: ${error instanceof Error ? error.message : String(error)}`;
  document.body.dataset.ready = 'failed';
});
