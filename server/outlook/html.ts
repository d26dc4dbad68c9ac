/**
 * The outlook as a standalone HTML file: the chart of web/figures/outlook.ts with Plotly inlined
 * from node_modules/plotly.js-dist-min, so the file opens offline and fetches nothing. The page
 * sets body[data-ready] once the chart is drawn.
 */
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import { outlookFigure } from '../../web/figures/outlook.js';
import type { OutlookResult } from '../service/outlook.js';

const require = createRequire(import.meta.url);

/** Path of the Plotly bundle that is inlined (plotly.js-dist-min's main file). */
export const PLOTLY_PATH = require.resolve('plotly.js-dist-min');

/** Text safe inside a <script> element: no "</script" and no "<!--" (both only occur inside JS strings in Plotly). */
function scriptSafe(js: string): string {
  return js.replace(/<\/script/gi, '<\\/script').replace(/<!--/g, '<\\!--');
}

/** Text safe inside HTML elements and attributes. */
function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
}

/**
 * The standalone page of an outlook.
 * @param result the outlook JSON.
 * @param caution the safety caution printed under the chart.
 * @param plotlySource Plotly's JavaScript (default: read from PLOTLY_PATH).
 * @returns the whole HTML document.
 */
export async function outlookHtml(result: OutlookResult, caution: string, plotlySource?: string): Promise<string> {
  const plotly = plotlySource ?? (await readFile(PLOTLY_PATH, 'utf8'));
  const figure = outlookFigure(result, { title: '' }); // the page's heading names the site
  const figureJson = JSON.stringify(figure).replace(/</g, '\\u003c');
  const s = result.site;
  const landmark = `${s.landmark.name ?? 'the landmark'}, ${(s.landmark.range_m / 1000).toFixed(1)} km away and ${s.landmark.height_m} m high`;
  const title = `Mirage outlook — ${s.name}`;
  return `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${escapeHtml(title)}</title>
<link rel="icon" href="data:,">
<style>
body { font-family: system-ui, sans-serif; margin: 1.5rem auto; max-width: 70rem; padding: 0 1rem; color: #222; }
h1 { font-size: 1.3rem; margin-bottom: 0.3rem; }
p { margin: 0.3rem 0; line-height: 1.4; }
.note { color: #555; font-size: 0.9rem; }
</style>
</head>
<body>
<h1>${escapeHtml(title)}</h1>
<p>Eye ${s.observer_height_m} m above the sea, watching ${escapeHtml(landmark)}. ${result.rows.length} rows, from ${escapeHtml(result.rows[0]?.time ?? '')} to ${escapeHtml(result.rows[result.rows.length - 1]?.time ?? '')}.</p>
<p class="note">Shifts are measured against the ${escapeHtml(result.reference)}; positive means seen higher.</p>
<div id="outlook-chart"></div>
<p class="note">${escapeHtml(caution)}</p>
<script>${scriptSafe(plotly)}</script>
<script>
const figure = ${figureJson};
Plotly.newPlot('outlook-chart', figure.data, figure.layout, { responsive: true, displaylogo: false }).then(() => { document.body.dataset.ready = '1'; });
</script>
</body>
</html>
`;
}
