/**
 * "Light paths" figure: the traced fan as height above the curved surface against ground range,
 * one trace per fate (rays joined with gaps, so 500 rays cost four traces), the target drawn as a
 * bar at its range and the eye as a marker. From POST /api/trace.
 */
import type { Data, Shape } from 'plotly.js-dist-min';
import type { Fate, TraceResult } from '../types.js';
import { COLOURS, axis, baseLayout, type Figure } from './theme.js';

/** Words for each fate in the legend. */
export const FATE_LABELS: Record<Fate, string> = {
  target: 'reaches the target range',
  surface: 'meets the surface',
  escaped: 'leaves the top of the air',
  trapped: 'stopped (step limit)',
};

const FATE_ORDER: Fate[] = ['surface', 'escaped', 'trapped', 'target'];

export interface PathsFigureOptions {
  /** Highest height shown, m. Default: 1.25 × the highest of eye, target top and heights reached at the target. */
  top_m?: number;
}

/** Metres per kilometre (the x axis is in km). */
const M_PER_KM = 1000;
/** Alpha of the ray colours, as two hex digits (0xbf ≈ 75 %). */
const PATH_ALPHA_HEX = 'bf';
/** Headroom above the highest height of interest. */
const HEADROOM = 1.25;

/**
 * Rays of one fate as one polyline with null gaps (x in km). No per-point hover data: for a
 * 500-ray fan it costs more drawing time than it is worth (the heights plot gives each
 * elevation's height at the target).
 */
export function fateTrace(trace: TraceResult, fate: Fate): { x: (number | null)[]; y: (number | null)[]; count: number } {
  const x: (number | null)[] = [];
  const y: (number | null)[] = [];
  let count = 0;
  for (const ray of trace.rays) {
    if (ray.fate !== fate) continue;
    count++;
    for (const [s, z] of ray.path) {
      x.push(s / M_PER_KM);
      y.push(z);
    }
    x.push(null);
    y.push(null);
  }
  return { x, y, count };
}

/** Builds the light-paths figure. */
export function pathsFigure(trace: TraceResult, options: PathsFigureOptions = {}): Figure {
  const reached = trace.rays.map((r) => r.height_at_target_m ?? 0);
  const top = options.top_m ?? HEADROOM * Math.max(trace.target_height_m, trace.observer_height_m, ...reached, 1);
  const range_km = trace.range_m / M_PER_KM;
  const data: Data[] = [];
  for (const fate of FATE_ORDER) {
    const t = fateTrace(trace, fate);
    if (t.count === 0) continue;
    // A translucent colour rather than trace opacity: the same look, a fraction of the drawing time.
    data.push({
      type: 'scatter', mode: 'lines', name: `${FATE_LABELS[fate]} (${t.count})`, x: t.x, y: t.y,
      line: { color: `${COLOURS.fate[fate]}${PATH_ALPHA_HEX}`, width: 1 }, connectgaps: false,
      hovertemplate: `%{y:.2f} m at %{x:.2f} km<extra>${fate}</extra>`,
    } as Data);
  }
  data.push({
    type: 'scatter', mode: 'lines', name: 'target', x: [range_km, range_km], y: [0, trace.target_height_m],
    line: { color: COLOURS.target, width: 7 }, hovertemplate: `target: ${trace.target_height_m} m at ${range_km} km<extra></extra>`,
  });
  data.push({
    type: 'scatter', mode: 'markers', name: 'eye', x: [0], y: [trace.observer_height_m],
    marker: { color: COLOURS.ink, size: 9, symbol: 'diamond' }, hovertemplate: `eye at ${trace.observer_height_m} m<extra></extra>`,
  });
  const sea: Partial<Shape> = { type: 'rect', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0: -top, y1: 0, fillcolor: COLOURS.seaShade, line: { width: 0 }, layer: 'below' };
  return {
    data,
    layout: baseLayout({
      xaxis: axis('ground range, km', { range: [0, range_km * 1.02] }),
      yaxis: axis('height above the surface, m', { range: [-0.04 * top, top] }),
      shapes: [sea, { type: 'line', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0: 0, y1: 0, line: { color: COLOURS.sea, width: 1.5 } }],
    } as never),
  };
}
