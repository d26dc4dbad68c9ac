/**
 * The viewer's ensemble panel: runs an ensemble of the scenario being edited (its distributions:
 * DESIGN.md §5), shows the progress as the server streams it, draws the outcome probabilities and
 * the hidden height's spread, and downloads the HTML report. The one DOM file of the panel; the
 * numbers come from POST /api/ensemble and /api/report (no physics here). Sets data-ready on the
 * panel once a result is drawn.
 */
import type * as PlotlyT from 'plotly.js-dist-min';
import { ensembleFigure, type EnsembleChartInput } from './figures/ensemble.js';
import { plotConfig } from './figures/theme.js';

declare const Plotly: typeof PlotlyT;

/** Members asked for unless the user sets another count (the server allows 1..2000). */
const DEFAULT_MEMBERS = 100;

interface EnsembleAnswer extends EnsembleChartInput {
  members: number;
  partial: boolean;
  summary: string[];
}

function element<K extends keyof HTMLElementTagNameMap>(tag: K, props: Record<string, string> = {}, text = ''): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(props)) node.setAttribute(k, v);
  if (text) node.textContent = text;
  return node;
}

/** The first problem of an error answer, in words. */
function problemOf(json: unknown, status: number): string {
  const problems = (json as { error?: { problems?: string[] } } | null)?.error?.problems;
  return problems?.slice(0, 3).join('; ') ?? `the server answered ${status}`;
}

/** Reads an NDJSON stream line by line. */
async function readLines(body: ReadableStream<Uint8Array>, onLine: (value: unknown) => void): Promise<void> {
  const reader = body.getReader();
  const decoder = new TextDecoder();
  let buffer = '';
  for (;;) {
    const { done, value } = await reader.read();
    buffer += decoder.decode(value ?? new Uint8Array(), { stream: !done });
    let newline: number;
    while ((newline = buffer.indexOf('\n')) >= 0) {
      const line = buffer.slice(0, newline).trim();
      buffer = buffer.slice(newline + 1);
      if (line) onLine(JSON.parse(line));
    }
    if (done) return;
  }
}

/**
 * Adds the ensemble panel at the end of a container.
 * @param container where the panel goes (the viewer's panel grid).
 * @param scenario returns the scenario being edited.
 */
export function mountEnsemblePanel(container: HTMLElement, scenario: () => unknown): void {
  const panel = element('article', { class: 'panel panel-wide', id: 'panel-ensemble' });
  const head = element('div', { class: 'panel-head' });
  head.append(element('h2', {}, 'Ensemble over the uncertain inputs'));
  const form = element('form', { class: 'fan-form', autocomplete: 'off' });
  const members = element('input', { id: 'ensemble-members', value: String(DEFAULT_MEMBERS), inputmode: 'numeric', size: '5', title: 'runs, 1…2000' });
  const seed = element('input', { id: 'ensemble-seed', value: '1', inputmode: 'numeric', size: '6', title: 'seed of the random generator: the same seed gives the same numbers' });
  const run = element('button', { type: 'submit', id: 'ensemble-run' }, 'Run ensemble');
  const stop = element('button', { type: 'button', id: 'ensemble-stop', disabled: '' }, 'Stop');
  const report = element('button', { type: 'button', id: 'ensemble-report' }, 'Download report');
  const membersLabel = element('label', {}, 'runs ');
  membersLabel.append(members);
  const seedLabel = element('label', {}, 'seed ');
  seedLabel.append(seed);
  form.append(membersLabel, seedLabel, run, stop, report);
  head.append(form);
  const progress = element('progress', { id: 'ensemble-progress', max: '1', value: '0', style: 'width: 100%' });
  const status = element('p', { class: 'description', role: 'status', 'aria-live': 'polite' }, 'Give any number a distribution (normal, uniform or a list of values) in the scenario file, then run: the server samples it with a seeded generator.');
  const summary = element('ul', { class: 'description', id: 'ensemble-summary' });
  const plot = element('div', { class: 'ensemble-plot', id: 'plot-ensemble' });
  panel.append(head, progress, status, summary, plot);
  container.append(panel);

  let running: AbortController | null = null;
  const body = () => ({ scenario: scenario(), members: Number(members.value), seed: Number(seed.value) });

  form.addEventListener('submit', (event) => {
    event.preventDefault();
    running?.abort();
    const controller = new AbortController();
    running = controller;
    run.setAttribute('disabled', '');
    stop.removeAttribute('disabled');
    panel.removeAttribute('data-ready');
    progress.value = 0;
    status.textContent = 'running…';
    void (async () => {
      try {
        const response = await fetch('/api/ensemble', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body()), signal: controller.signal });
        if (!response.ok || !response.body) throw new Error(problemOf(await response.json().catch(() => null), response.status));
        await readLines(response.body, (line) => {
          const l = line as { type: string; finished?: number; total?: number; result?: EnsembleAnswer; error?: { problems?: string[] } };
          if (l.type === 'progress' && l.total) {
            progress.value = (l.finished ?? 0) / l.total;
            status.textContent = `${l.finished} of ${l.total} runs`;
          } else if (l.type === 'result' && l.result) {
            show(l.result);
          } else if (l.type === 'error') {
            throw new Error(problemOf(l, 500));
          }
        });
      } catch (error) {
        status.textContent = controller.signal.aborted ? 'stopped' : `failed: ${(error as Error).message}`;
      } finally {
        run.removeAttribute('disabled');
        stop.setAttribute('disabled', '');
        if (running === controller) running = null;
      }
    })();
  });

  stop.addEventListener('click', () => running?.abort());

  report.addEventListener('click', () => {
    report.setAttribute('disabled', '');
    status.textContent = 'building the report…';
    void (async () => {
      try {
        const response = await fetch('/api/report', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body()) });
        if (!response.ok) throw new Error(problemOf(await response.json().catch(() => null), response.status));
        const url = URL.createObjectURL(await response.blob());
        const link = element('a', { href: url, download: 'loomline-report.html' });
        document.body.append(link);
        link.click();
        link.remove();
        setTimeout(() => URL.revokeObjectURL(url), 10_000);
        status.textContent = 'report downloaded';
      } catch (error) {
        status.textContent = `report failed: ${(error as Error).message}`;
      } finally {
        report.removeAttribute('disabled');
      }
    })();
  });

  function show(result: EnsembleAnswer): void {
    progress.value = 1;
    status.textContent = `${result.members} runs${result.partial ? ' (partial)' : ''}`;
    summary.replaceChildren(...result.summary.map((s) => element('li', {}, s)));
    const figure = ensembleFigure(result);
    void Plotly.react(plot, figure.data, figure.layout, plotConfig('loomline-ensemble')).then(() => panel.setAttribute('data-ready', '1'));
  }
}
