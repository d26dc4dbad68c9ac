/**
 * The outlook chart as a Plotly figure: a pure function of the outlook JSON (DESIGN.md §6
 * `outlook`), used by the viewer's outlook panel and by the standalone HTML file the CLI writes
 * (server/outlook/html.ts). No DOM, no physics: it only draws the numbers it is given.
 *
 * Three panels over time: (1) how much higher (+) or lower (−) the landmark's top and the horizon
 * are seen than in the reference air, arcmin; (2) the landmark's vertical magnification (log
 * scale, 1 = as usual) and its image count; (3) the strength of the effect (bars, the label in the
 * hover text) with the air − sea temperature difference.
 */
import type { Data, Layout } from 'plotly.js-dist-min';
import { COLOURS, axis, baseLayout, type Figure } from './theme.js';

/** The parts of an outlook row the chart reads (the server's OutlookRowJson has more). */
export interface OutlookChartRow {
  time: string;
  horizon_shift_arcmin: number;
  landmark_shift_arcmin: number | null;
  landmark_magnification: number | null;
  resolvable_image_count: number;
  air_sea_difference_K: number;
  label: string;
  strength: number;
}

/** The parts of the outlook result the chart reads. */
export interface OutlookChartInput {
  site: { name: string; landmark: { name?: string } };
  rows: OutlookChartRow[];
}

/** Options of outlookFigure; defaults in OUTLOOK_FIGURE_DEFAULTS. */
export interface OutlookFigureOptions {
  /** Height of the whole figure, px. Default 720. */
  height_px?: number;
  /** Title above the chart. Default: the site's name. */
  title?: string;
}

export const OUTLOOK_FIGURE_DEFAULTS = Object.freeze({ height_px: 720 });

/** Colours of the chart, from the viewer's palette (theme.ts). */
const PALETTE = Object.freeze({
  landmark: COLOURS.target,
  horizon: COLOURS.horizon,
  magnification: COLOURS.threshold,
  images: COLOURS.muted,
  strength: COLOURS.skyHigh,
  airSea: COLOURS.temperature,
  unity: '#c9d2d8',
});

/**
 * Plotly date axes take wall-clock times without a zone: the time as written at the site, with its
 * zone dropped (the axis title says so) and "T" replaced by a space.
 */
export function wallClock(time: string): string {
  return time.replace(/(Z|[+-]\d{2}:?\d{2})$/, '').replace('T', ' ');
}

/** The zone suffix shared by every row's time ("" when none or mixed). */
function commonZone(rows: readonly OutlookChartRow[]): string {
  const zones = new Set(rows.map((r) => /(Z|[+-]\d{2}:?\d{2})$/.exec(r.time)?.[1] ?? ''));
  return zones.size === 1 ? [...zones][0] : '';
}

/**
 * The outlook chart.
 * @param result the outlook JSON (rows in time order).
 * @param options height and title (OutlookFigureOptions).
 * @returns a Plotly figure { data, layout } (plain JSON; the viewer's fonts and palette).
 */
export function outlookFigure(result: OutlookChartInput, options: OutlookFigureOptions = {}): Figure {
  const rows = result.rows;
  const x = rows.map((r) => wallClock(r.time));
  const zone = commonZone(rows);
  const landmarkName = result.site.landmark.name ?? 'landmark';
  const hover = rows.map((r) => `${r.label} (strength ${r.strength.toFixed(2)})`);
  const data = [
    { type: 'scatter', mode: 'lines+markers', name: `${landmarkName}: top seen higher (+) / lower (−)`, x, y: rows.map((r) => r.landmark_shift_arcmin), line: { color: PALETTE.landmark }, connectgaps: false, xaxis: 'x', yaxis: 'y', text: hover, hovertemplate: '%{y:.2f}′<br>%{text}<extra></extra>' },
    { type: 'scatter', mode: 'lines', name: 'horizon seen higher (+) / lower (−)', x, y: rows.map((r) => r.horizon_shift_arcmin), line: { color: PALETTE.horizon, dash: 'dash' }, xaxis: 'x', yaxis: 'y', hovertemplate: 'horizon %{y:.2f}′<extra></extra>' },
    { type: 'scatter', mode: 'lines+markers', name: 'vertical magnification', x, y: rows.map((r) => (r.landmark_magnification !== null && r.landmark_magnification > 0 ? r.landmark_magnification : null)), line: { color: PALETTE.magnification }, xaxis: 'x', yaxis: 'y2', hovertemplate: '×%{y:.2f}<extra></extra>' },
    { type: 'scatter', mode: 'lines', name: 'magnification 1 (as usual)', x: [x[0], x[x.length - 1]], y: [1, 1], line: { color: PALETTE.unity, width: 1, dash: 'dot' }, xaxis: 'x', yaxis: 'y2', hoverinfo: 'skip', showlegend: false },
    { type: 'scatter', mode: 'lines', name: 'images of the landmark (told apart)', x, y: rows.map((r) => r.resolvable_image_count), line: { color: PALETTE.images, shape: 'hv' }, xaxis: 'x', yaxis: 'y3', hovertemplate: '%{y} image(s)<extra></extra>' },
    { type: 'bar', name: 'strength (0–1)', x, y: rows.map((r) => r.strength), marker: { color: PALETTE.strength }, customdata: rows.map((r) => r.label), textposition: 'none', xaxis: 'x', yaxis: 'y4', hovertemplate: '%{y:.2f}: %{customdata}<extra></extra>' },
    { type: 'scatter', mode: 'lines', name: 'air − sea temperature, K', x, y: rows.map((r) => r.air_sea_difference_K), line: { color: PALETTE.airSea, width: 1.5 }, xaxis: 'x', yaxis: 'y5', hovertemplate: '%{y:.1f} K<extra></extra>' },
  ];
  const layout = baseLayout({
    title: { text: options.title ?? result.site.name, y: 0.99, yanchor: 'top' },
    height: options.height_px ?? OUTLOOK_FIGURE_DEFAULTS.height_px,
    hovermode: 'x unified',
    legend: { orientation: 'h', x: 0, y: -0.12, yanchor: 'top', font: { size: 11 } },
    margin: { l: 62, r: 62, t: 40, b: 110 },
    xaxis: axis(zone ? `time (UTC${zone === 'Z' ? '' : zone})` : 'time (as written)', { type: 'date', anchor: 'y4' }),
    yaxis: axis('seen higher, ′', { domain: [0.62, 1], zeroline: true }),
    yaxis2: axis('magnification', { domain: [0.33, 0.57], type: 'log' }),
    yaxis3: axis('images', { overlaying: 'y2', side: 'right', rangemode: 'tozero', dtick: 1, showgrid: false }),
    yaxis4: axis('strength', { domain: [0, 0.28], range: [0, 1] }),
    // tickmode 'auto': an overlaying axis otherwise takes its tick positions from the axis under it.
    yaxis5: axis('air − sea, K', { overlaying: 'y4', side: 'right', showgrid: false, zeroline: true, tickmode: 'auto' }),
  } as Partial<Layout>);
  return { data: data as Data[], layout };
}
