/**
 * Assembles the self-contained report page: Plotly inlined (no network needed), the text
 * sections, and the figures drawn on load. When every figure is drawn the page sets
 * `body[data-ready]` to the number of figures (browser tests wait for it).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import type { FigureSpec } from './figures.js';
import { escapeHtml } from './sections.js';

const require = createRequire(import.meta.url);

let plotlySource: string | null = null;

/** The Plotly bundle's source, read once (plotly.js-dist-min, a UMD build that sets window.Plotly). */
function plotly(): string {
  if (plotlySource === null) plotlySource = readFileSync(require.resolve('plotly.js-dist-min'), 'utf8').replace(/<\/script/gi, '<\\/script');
  return plotlySource;
}

/** JSON that is safe inside a <script> element. */
function scriptJson(value: unknown): string {
  return JSON.stringify(value).replace(/</g, '\\u003c').replace(/\u2028/g, '\\u2028').replace(/\u2029/g, '\\u2029');
}

const STYLE = `
body { font-family: system-ui, sans-serif; max-width: 980px; margin: 0 auto; padding: 16px 24px 48px; color: #222; line-height: 1.45; }
h1 { font-size: 1.6em; margin-bottom: 0.2em; } h2 { border-bottom: 1px solid #ccc; padding-bottom: 4px; margin-top: 1.8em; }
table { border-collapse: collapse; margin: 8px 0; } th, td { border: 1px solid #ddd; padding: 4px 8px; text-align: left; vertical-align: top; }
td.num { text-align: right; font-variant-numeric: tabular-nums; } .caution { background: #fff4e0; border-left: 4px solid #e0a030; padding: 8px 12px; }
.warn { color: #a33; } figure { margin: 16px 0 28px; } figcaption { font-size: 0.9em; color: #555; } pre { background: #f6f6f6; padding: 8px; overflow-x: auto; }
.figure-missing { padding: 16px; background: #f6f6f6; color: #666; }
@media print { figure { break-inside: avoid; } }`;

/** One figure's place: heading, plot and caption. */
function figureBlock(f: FigureSpec): string {
  return `<figure><h3>${escapeHtml(f.title)}</h3><div id="${f.id}" class="plot" data-figure="${f.id}"></div><figcaption>${escapeHtml(f.caption)}</figcaption></figure>`;
}

/** The page parts in reading order. */
export interface ReportPage {
  title: string;
  subtitle: string;
  /** HTML fragments before the figures (summary, inputs). */
  before: string[];
  figures: FigureSpec[];
  /** HTML fragments after the figures (methods, limits, reproducibility). */
  after: string[];
}

/**
 * Renders the report as one HTML document that works offline.
 * @param page the title, sections and figures.
 * @returns the HTML text (about 5 MB, most of it the Plotly bundle).
 */
export function renderReportHtml(page: ReportPage): string {
  const draw = `
(function () {
  var figures = ${scriptJson(page.figures.map((f) => ({ id: f.id, data: f.data, layout: f.layout })))};
  var config = { displaylogo: false, responsive: true };
  Promise.all(figures.map(function (f) { return Plotly.newPlot(f.id, f.data, f.layout, config); }))
    .then(function () { document.body.setAttribute('data-ready', String(figures.length)); })
    .catch(function (e) { document.body.setAttribute('data-error', String(e)); });
})();`;
  return `<!DOCTYPE html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<link rel="icon" href="data:,"><title>${escapeHtml(page.title)}</title><style>${STYLE}</style>
<script>${plotly()}</script></head>
<body><header><h1>${escapeHtml(page.title)}</h1><p>${escapeHtml(page.subtitle)}</p></header>
${page.before.join('\n')}
<section id="figures"><h2>Figures</h2>${page.figures.map(figureBlock).join('\n')}</section>
${page.after.join('\n')}
<script>${draw}</script></body></html>
`;
}
