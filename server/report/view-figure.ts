/** The simulated view as a Plotly heatmap: sky, sea, target and duct cells by apparent direction. */
import type { ViewJson } from '../service/view.js';
import type { FigureSpec } from './figures.js';

/** Colours of the view classes (sky, sea, target, duct), in legend order. */
const CLASS_COLOURS: Record<string, string> = { sky: '#cfe3f5', sea: '#2f5b7c', target: '#2b2b2b', duct: '#8fb3cc' };

/**
 * The simulated view figure.
 * @param view the view JSON (server/service/view.ts).
 * @returns a heatmap of class codes with a discrete colour scale, axes in arcminutes, and the horizon.
 */
export function viewFigure(view: ViewJson): FigureSpec {
  const n = view.legend.length;
  // Discrete colour scale: code k fills [k/n, (k+1)/n] of the normalised range zmin = −0.5 .. zmax = n − 0.5.
  const colorscale = view.legend.flatMap((name, k) => [
    [k / n, CLASS_COLOURS[name] ?? '#999'],
    [(k + 1) / n, CLASS_COLOURS[name] ?? '#999'],
  ]);
  const x = view.azimuths_deg.map((a) => a * 60);
  const y = view.elevations_deg.map((e) => e * 60);
  return {
    id: 'fig-view',
    title: 'Simulated view',
    caption: `What the eye would see toward the target at ${(view.range_m / 1000).toFixed(1)} km (single run, inputs at their central values): sky, sea, the target's silhouette (${view.silhouette.shape}) and, where present, the duct; the dashed line is the apparent horizon${view.false_horizon ? ' (a false horizon)' : ''}.`,
    data: [
      {
        type: 'heatmap',
        x,
        y,
        z: view.classes,
        zmin: -0.5,
        zmax: n - 0.5,
        colorscale,
        showscale: false,
        hovertemplate: '%{x:.2f}′, %{y:.2f}′<extra></extra>',
      },
      { type: 'scatter', mode: 'lines', name: 'apparent horizon', x: [x[0], x[x.length - 1]], y: [view.horizon_elevation_deg * 60, view.horizon_elevation_deg * 60], line: { dash: 'dash', color: '#d62728', width: 1 } },
    ],
    layout: {
      margin: { l: 64, r: 20, t: 16, b: 52 },
      height: 340,
      xaxis: { title: { text: 'angle from the target, arcmin' } },
      yaxis: { title: { text: 'apparent elevation, arcmin' } },
      showlegend: false,
      font: { family: 'system-ui, sans-serif', size: 12 },
    },
  };
}
