/**
 * "What the eye sees" figure: the server's simulated view (POST /api/view) as a heatmap of
 * classes (sky, sea, target, duct) over apparent elevation and horizontal angle, both in arcmin,
 * with the apparent horizon (marked when it is a false one) and, beside it, the images of the
 * target from the findings: a bar over each image's elevations, labelled erect or inverted.
 */
import type { Data, Shape } from 'plotly.js-dist-min';
import type { FindingsImage, ViewJson } from '../types.js';
import { MIN_LABELLED_SHARE } from './heights.js';
import { ARCMIN_PER_DEG, COLOURS, axis, baseLayout, type Figure } from './theme.js';

export interface ViewFigureOptions {
  /** Images of the target (findings visibility.images), drawn as bars at the right edge. */
  images?: readonly FindingsImage[];
}

/** What each class is called in the legend. */
const CLASS_LABELS: Record<string, string> = { sky: 'sky', sea: 'sea', target: 'target', duct: 'light along a duct' };

/** A discrete colour scale: code k (0..n−1) gets the k-th class colour. */
export function classColourScale(legend: readonly string[]): [number, string][] {
  const n = legend.length;
  return legend.flatMap((name, k) => {
    const colour = COLOURS.view[name] ?? '#888888';
    return [[k / n, colour], [(k + 1) / n, colour]] as [number, string][];
  });
}

/** Padding around the images when the view is framed on them: a share of their span, and at least an arcminute. */
const IMAGE_FRAME_PADDING = 0.6;
const IMAGE_FRAME_MIN_PAD_ARCMIN = 1;

/**
 * Elevations shown, arcmin: the images with some sky and sea around them (the view's own window
 * spans every height up to the target's top, so the target may fill only a sliver of it), or
 * the whole window when nothing of the target is seen. Plotly's zoom still reaches all of it.
 */
export function viewFrame(rows_arcmin: readonly number[], images: readonly FindingsImage[]): [number, number] {
  const bottom = rows_arcmin[0];
  const top = rows_arcmin[rows_arcmin.length - 1];
  if (images.length === 0) return [bottom, top];
  const ends = images.flatMap((i) => [i.from_elevation_deg, i.to_elevation_deg]).map((e) => e * ARCMIN_PER_DEG);
  const lo = Math.min(...ends);
  const hi = Math.max(...ends);
  const pad = Math.max(IMAGE_FRAME_MIN_PAD_ARCMIN, IMAGE_FRAME_PADDING * (hi - lo));
  return [Math.max(bottom, lo - pad), Math.min(top, hi + pad)];
}

/** Builds the simulated-view figure. */
export function viewFigure(view: ViewJson, options: ViewFigureOptions = {}): Figure {
  const x = view.azimuths_deg.map((a) => a * ARCMIN_PER_DEG);
  const y = view.elevations_deg.map((e) => e * ARCMIN_PER_DEG);
  const n = view.legend.length;
  const present = new Set(view.classes.flat());
  const data: Data[] = [
    {
      type: 'heatmap', x, y, z: view.classes, zmin: -0.5, zmax: n - 0.5, colorscale: classColourScale(view.legend), showscale: false, name: 'view',
      hovertemplate: 'elevation %{y:.2f}′, %{x:.2f}′ from the target\'s centre<extra></extra>',
    } as Data,
  ];
  view.legend.forEach((name, k) => {
    if (!present.has(k)) return;
    data.push({ type: 'scatter', mode: 'markers', name: CLASS_LABELS[name] ?? name, x: [null], y: [null], marker: { symbol: 'square', size: 12, color: COLOURS.view[name], line: { color: '#9aa7b0', width: 1 } }, hoverinfo: 'skip' } as Data);
  });
  const horizon = view.horizon_elevation_deg * ARCMIN_PER_DEG;
  const shapes: Partial<Shape>[] = [{ type: 'line', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0: horizon, y1: horizon, line: { color: COLOURS.horizon, width: 1.5, dash: 'dash' } }];
  const annotations: Record<string, unknown>[] = [
    { xref: 'paper', x: 0.01, yref: 'y', y: horizon, text: view.false_horizon ? 'false horizon' : 'horizon', showarrow: false, xanchor: 'left', yanchor: 'bottom', font: { size: 10, color: COLOURS.horizon } },
  ];
  const [frameLo, frameHi] = viewFrame(y, options.images ?? []);
  for (const image of options.images ?? []) {
    const y0 = Math.min(image.from_elevation_deg, image.to_elevation_deg) * ARCMIN_PER_DEG;
    const y1 = Math.max(image.from_elevation_deg, image.to_elevation_deg) * ARCMIN_PER_DEG;
    const colour = image.orientation === 'erect' ? COLOURS.imageErect : COLOURS.imageInverted;
    shapes.push({ type: 'rect', xref: 'paper', x0: 1.01, x1: 1.03, yref: 'y', y0, y1, fillcolor: colour, line: { width: 0 } });
    if (y1 - y0 >= MIN_LABELLED_SHARE * (frameHi - frameLo)) {
      annotations.push({ xref: 'paper', x: 1.04, yref: 'y', y: (y0 + y1) / 2, text: image.orientation === 'erect' ? 'erect ↑' : 'inverted ↓', showarrow: false, xanchor: 'left', font: { size: 10, color: colour } });
    }
  }
  return {
    data,
    layout: baseLayout({
      margin: { l: 62, r: 78, t: 34, b: 46 },
      xaxis: axis('horizontal angle from the target, arcmin', { range: [x[0], x[x.length - 1]], showgrid: false, zeroline: false }),
      yaxis: axis('apparent elevation, arcmin', { range: [frameLo, frameHi], showgrid: false, zeroline: false }),
      shapes,
      annotations,
    } as never),
  };
}
