/**
 * The viewer's outlook panel: an hour-by-hour mirage outlook for a site (DESIGN.md §6 `outlook`),
 * from the demo files of profiles/ or from a series CSV and a site JSON the user opens. The one
 * DOM file of the outlook; the chart is the pure figure of ./figures/outlook.ts, the numbers come
 * from POST /api/outlook (no physics here). Sets data-ready on the panel once a chart is drawn.
 */
import type * as PlotlyT from 'plotly.js-dist-min';
import { outlookFigure, type OutlookChartInput } from './figures/outlook.js';
import { plotConfig } from './figures/theme.js';

declare const Plotly: typeof PlotlyT;

/** Height of the outlook chart in the panel, px (three stacked plots need more than the other panels' 360). */
const PANEL_HEIGHT_PX = 600;

/** The outlook JSON as the panel reads it (the chart's part, the count of skipped rows and the caution). */
interface OutlookAnswer extends OutlookChartInput {
  skipped_rows: unknown[];
  caution: string;
}

/** Sends a request and returns its JSON, or throws an Error with the server's first problem. */
async function requestJson<T>(path: string, body?: unknown): Promise<T> {
  const init: RequestInit = body === undefined ? {} : { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) };
  const response = await fetch(path, init);
  const json = await response.json().catch(() => null);
  if (!response.ok) {
    const problems: string[] = json?.error?.problems ?? [`the server answered ${response.status}`];
    throw new Error(problems.slice(0, 3).join('; ') + (problems.length > 3 ? ` (and ${problems.length - 3} more)` : ''));
  }
  return json as T;
}

function element<K extends keyof HTMLElementTagNameMap>(tag: K, props: Record<string, string> = {}, text = ''): HTMLElementTagNameMap[K] {
  const node = document.createElement(tag);
  for (const [k, v] of Object.entries(props)) node.setAttribute(k, v);
  if (text) node.textContent = text;
  return node;
}

/**
 * Adds the outlook panel at the end of a container (the viewer's panel grid).
 * @param container where the panel goes.
 */
export function mountOutlookPanel(container: HTMLElement): void {
  const panel = element('article', { class: 'panel panel-wide', id: 'panel-outlook' });
  const head = element('div', { class: 'panel-head' });
  head.append(element('h2', {}, 'Mirage outlook for a site'));
  const controls = element('form', { class: 'fan-form', autocomplete: 'off' });
  const demo = element('button', { type: 'button', id: 'outlook-demo' }, 'Demo outlook');
  const series = element('input', { type: 'file', id: 'outlook-series', accept: '.csv,text/csv', title: 'series CSV' });
  const site = element('input', { type: 'file', id: 'outlook-site', accept: '.json,application/json', title: 'site JSON' });
  const run = element('button', { type: 'submit', id: 'outlook-run' }, 'Outlook for these files');
  const seriesLabel = element('label', {}, 'series CSV ');
  seriesLabel.append(series);
  const siteLabel = element('label', {}, 'site JSON ');
  siteLabel.append(site);
  controls.append(demo, seriesLabel, siteLabel, run);
  head.append(controls);
  const status = element('p', { class: 'description', role: 'status', 'aria-live': 'polite' }, 'An hour-by-hour outlook from air and sea temperature, wind, humidity and pressure: the demo uses an invented site and two invented days.');
  const plot = element('div', { class: 'plot', id: 'plot-outlook', style: `height: ${PANEL_HEIGHT_PX}px` });
  const caution = element('p', { class: 'description' });
  // The chart takes its space only once there is an outlook to draw.
  plot.hidden = true;
  panel.append(head, status, plot, caution);
  container.append(panel);

  const show = async (load: () => Promise<{ series_csv: string; site: unknown }>) => {
    panel.removeAttribute('data-ready');
    status.textContent = 'computing the outlook…';
    try {
      const body = await load();
      const result = await requestJson<OutlookAnswer>('/api/outlook', { ...body, skip_bad_rows: true });
      plot.hidden = false;
      await Plotly.react(plot, ...figureParts(result));
      const skipped = result.skipped_rows.length;
      status.textContent = `${result.rows.length} rows for ${result.site.name}${skipped > 0 ? `; ${skipped} bad value${skipped > 1 ? 's' : ''} left out` : ''}. Shifts against the US 1976 atmosphere; positive: seen higher.`;
      caution.textContent = result.caution;
      panel.dataset.ready = '1';
    } catch (error) {
      status.textContent = `no outlook: ${error instanceof Error ? error.message : String(error)}`;
      panel.dataset.ready = 'failed';
    }
  };

  demo.addEventListener('click', () => void show(() => requestJson('/api/outlook/demo')));
  controls.addEventListener('submit', (event) => {
    event.preventDefault();
    const seriesFile = series.files?.[0];
    const siteFile = site.files?.[0];
    if (!seriesFile || !siteFile) {
      status.textContent = 'choose a series CSV and a site JSON first';
      return;
    }
    void show(async () => {
      const [series_csv, siteText] = await Promise.all([seriesFile.text(), siteFile.text()]);
      let siteJson: unknown;
      try {
        siteJson = JSON.parse(siteText);
      } catch {
        throw new Error(`${siteFile.name} is not valid JSON`);
      }
      return { series_csv, site: siteJson };
    });
  });
}

/** Plotly.react's arguments after the element: data, layout and the shared config. */
function figureParts(result: OutlookChartInput): [PlotlyT.Data[], Partial<PlotlyT.Layout>, Partial<PlotlyT.Config>] {
  // The panel's heading names the outlook; the chart needs no title of its own here.
  const figure = outlookFigure(result, { height_px: PANEL_HEIGHT_PX, title: '' });
  return [figure.data, figure.layout, plotConfig('outlook')];
}
