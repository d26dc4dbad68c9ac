/**
 * "Heights at the target" figure: the transfer curve (height reached at the target range against
 * apparent elevation at the eye), drawn with elevation upward as in the view, images shaded erect
 * or inverted, hidden bands marked, the target's top as a line. From the findings' `transfer`
 * (DESIGN.md §6), or from a plain trace fan when no findings are at hand.
 */
import type { Data, Shape } from 'plotly.js-dist-min';
import type { TraceResult, TransferJson } from '../types.js';
import { ARCMIN_PER_DEG, COLOURS, axis, baseLayout, type Figure } from './theme.js';

export interface HeightsFigureOptions {
  /** Target's top, m. */
  target_height_m: number;
}

/** The transfer JSON a trace fan gives by itself (no images or hidden bands: those need findings). */
export function transferFromTrace(trace: TraceResult): TransferJson {
  return {
    range_m: trace.range_m,
    rays: trace.rays.map((r) => ({ elevation_deg: r.elevation_deg, height_m: r.height_at_target_m, fate: r.fate })),
    images: [],
    lowest_visible_height_m: null,
    hidden_bands: [],
  };
}

/** Heights shown: 0 to this multiple of the target's top (the automatic fan frames 1.5×). */
const HEIGHT_HEADROOM = 1.6;
/** Images narrower than this share of the elevation axis are shaded but not labelled (labels would overlap). */
export const MIN_LABELLED_SHARE = 0.07;
/** When the lowest height reached is above the target, the axis reaches this multiple of it. */
const LOWEST_HEADROOM = 1.15;
/** Rays up to which each ray is also drawn as a marker (beyond, markers cost more than they show). */
const MARKER_LIMIT = 150;

/** Builds the heights-at-the-target figure. */
export function heightsFigure(transfer: TransferJson, options: HeightsFigureOptions): Figure {
  const rays = [...transfer.rays].sort((a, b) => a.elevation_deg - b.elevation_deg);
  const reached = rays.filter((r) => r.height_m !== null).map((r) => r.height_m as number);
  // Heights to the target's top and beyond; when even the lowest ray passes above it, far enough to show where the curve begins.
  const xMax = Math.max(HEIGHT_HEADROOM * Math.max(options.target_height_m, 1), reached.length ? LOWEST_HEADROOM * Math.min(...reached) : 0);
  const x: (number | null)[] = [];
  const y: (number | null)[] = [];
  for (const ray of rays) {
    x.push(ray.height_m);
    y.push(ray.height_m === null ? null : ray.elevation_deg * ARCMIN_PER_DEG);
  }
  // The curve's own window frames the elevations when the findings give it; else the rays landing within the heights shown.
  const shown = rays.filter((r) => r.height_m !== null && r.height_m <= xMax).map((r) => r.elevation_deg * ARCMIN_PER_DEG);
  const all = rays.map((r) => r.elevation_deg * ARCMIN_PER_DEG);
  const frame = transfer.window ? [transfer.window.from_elevation_deg * ARCMIN_PER_DEG, transfer.window.to_elevation_deg * ARCMIN_PER_DEG] : shown.length ? shown : all;
  const lo = Math.min(...frame);
  const hi = Math.max(...frame);
  const pad = 0.04 * (hi - lo || 1);
  const shapes: Partial<Shape>[] = [];
  const annotations: Record<string, unknown>[] = [];
  for (const image of transfer.images) {
    const y0 = Math.min(image.from_elevation_deg, image.to_elevation_deg) * ARCMIN_PER_DEG;
    const y1 = Math.max(image.from_elevation_deg, image.to_elevation_deg) * ARCMIN_PER_DEG;
    shapes.push({ type: 'rect', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0, y1, fillcolor: image.orientation === 'erect' ? COLOURS.erect : COLOURS.inverted, line: { width: 0 }, layer: 'below' });
    if (y1 - y0 >= MIN_LABELLED_SHARE * (hi - lo)) {
      annotations.push({ xref: 'paper', x: 0.995, yref: 'y', y: (y0 + y1) / 2, text: image.orientation, showarrow: false, xanchor: 'right', font: { size: 10, color: COLOURS.muted } });
    }
  }
  for (const band of transfer.hidden_bands) {
    shapes.push({ type: 'rect', xref: 'x', x0: band.from_height_m, x1: band.to_height_m, yref: 'paper', y0: 0, y1: 1, fillcolor: COLOURS.hidden, line: { width: 0 }, layer: 'below' });
    annotations.push({ xref: 'x', x: (band.from_height_m + band.to_height_m) / 2, yref: 'paper', y: 1, text: 'hidden', showarrow: false, yanchor: 'bottom', font: { size: 10, color: COLOURS.muted } });
  }
  shapes.push({ type: 'line', xref: 'x', x0: options.target_height_m, x1: options.target_height_m, yref: 'paper', y0: 0, y1: 1, line: { color: COLOURS.target, width: 1.5, dash: 'dash' } });
  annotations.push({ xref: 'x', x: options.target_height_m, yref: 'paper', y: 0, text: 'target top', showarrow: false, xanchor: 'right', yanchor: 'bottom', textangle: -90, font: { size: 10, color: COLOURS.target } });
  const data: Data[] = [
    {
      type: 'scatter', mode: rays.length <= MARKER_LIMIT ? 'lines+markers' : 'lines', name: 'height reached at the target range', x, y, connectgaps: false,
      line: { color: COLOURS.fate.target, width: 2 }, marker: { size: 3, color: COLOURS.fate.target },
      hovertemplate: '%{y:.3f}′ sees %{x:.2f} m<extra></extra>',
    },
  ];
  // Legend entries for the shadings that are present.
  const legendSwatch = (name: string, color: string): Data => ({ type: 'scatter', mode: 'markers', name, x: [null], y: [null], marker: { symbol: 'square', size: 12, color }, hoverinfo: 'skip' }) as Data;
  if (transfer.images.some((i) => i.orientation === 'erect')) data.push(legendSwatch('erect image', COLOURS.erect));
  if (transfer.images.some((i) => i.orientation === 'inverted')) data.push(legendSwatch('inverted image', COLOURS.inverted));
  if (transfer.hidden_bands.length > 0) data.push(legendSwatch('hidden band', COLOURS.hidden));
  return {
    data,
    layout: baseLayout({
      xaxis: axis(`height at ${(transfer.range_m / 1000).toFixed(transfer.range_m < 10_000 ? 2 : 1)} km, m`, { range: [0, xMax] }),
      yaxis: axis('apparent elevation, arcmin', { range: [lo - pad, hi + pad] }),
      shapes,
      annotations,
    } as never),
  };
}
