/**
 * "The air" figure: temperature and refractivity against height, side by side on one height axis,
 * from POST /api/profile. Optical models show N = (n − 1)·10⁶ with a dashed line of the ducting
 * threshold gradient (dN/dz at which a horizontal ray follows the Earth) drawn from the surface
 * value; the radio model shows modified refractivity M, whose threshold is dM/dz = 0 (a vertical
 * line). Layers steeper than the threshold (M falling with height: trapping layers) are shaded.
 */
import type { Data, Shape } from 'plotly.js-dist-min';
import type { ProfileResult } from '../types.js';
import { COLOURS, axis, baseLayout, type Figure } from './theme.js';

export interface AirFigureOptions {
  /** Eye height, m (a dotted line). */
  observer_height_m?: number;
  /** Height of the target's top, m (a dotted line). */
  target_height_m?: number;
}

/** Height intervals where M decreases with height (trapping layers), merged, from consecutive levels. */
export function trappingLayers(profile: ProfileResult): [number, number][] {
  const layers: [number, number][] = [];
  const levels = profile.levels;
  for (let i = 0; i + 1 < levels.length; i++) {
    if (levels[i + 1].modified_refractivity_M < levels[i].modified_refractivity_M) {
      const last = layers[layers.length - 1];
      if (last && last[1] === levels[i].height_m) last[1] = levels[i + 1].height_m;
      else layers.push([levels[i].height_m, levels[i + 1].height_m]);
    }
  }
  return layers;
}

function heightLine(y: number, label: string): { shape: Partial<Shape>; annotation: Record<string, unknown> } {
  return {
    shape: { type: 'line', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0: y, y1: y, line: { color: COLOURS.muted, width: 1, dash: 'dot' } },
    annotation: { xref: 'paper', x: 1, yref: 'y', y, text: label, showarrow: false, xanchor: 'right', yanchor: 'bottom', font: { size: 10, color: COLOURS.muted } },
  };
}

/**
 * Builds the air figure.
 * @param profile POST /api/profile result (levels sorted by height).
 * @param options eye and target heights for reference lines.
 */
export function airFigure(profile: ProfileResult, options: AirFigureOptions = {}): Figure {
  const levels = profile.levels;
  const heights = levels.map((l) => l.height_m);
  const radio = profile.index_model === 'radio';
  const refractivity = levels.map((l) => (radio ? l.modified_refractivity_M : l.refractivity_N));
  const top = heights[heights.length - 1] ?? 0;
  const base = refractivity[0] ?? 0;
  const thresholdX = radio ? [base, base] : [base, base + profile.duct_threshold_dN_dz_per_m * top];
  const data: Data[] = [
    {
      type: 'scatter', mode: 'lines', name: 'temperature', x: levels.map((l) => l.temperature_C), y: heights, xaxis: 'x', yaxis: 'y',
      line: { color: COLOURS.temperature, width: 2 }, hovertemplate: '%{x:.2f} °C at %{y:.2f} m<extra></extra>',
    },
    {
      type: 'scatter', mode: 'lines', name: radio ? 'modified refractivity M' : 'refractivity N', x: refractivity, y: heights, xaxis: 'x2', yaxis: 'y',
      line: { color: COLOURS.refractivity, width: 2 }, hovertemplate: `${radio ? 'M' : 'N'} %{x:.3f} at %{y:.2f} m<extra></extra>`,
    },
    {
      x: thresholdX, y: [0, top], type: 'scatter', mode: 'lines', name: radio ? 'ducting threshold (dM/dz = 0)' : 'ducting threshold gradient', xaxis: 'x2', yaxis: 'y',
      line: { color: COLOURS.threshold, width: 1.5, dash: 'dash' }, hoverinfo: 'skip',
    },
  ];
  const shapes: Partial<Shape>[] = trappingLayers(profile).map(([y0, y1]) => ({
    type: 'rect', xref: 'paper', x0: 0, x1: 1, yref: 'y', y0, y1, fillcolor: COLOURS.trapping, line: { width: 0 }, layer: 'below',
  }));
  const annotations: Record<string, unknown>[] = [];
  if (shapes.length > 0) {
    data.push({ type: 'scatter', mode: 'markers', name: 'trapping layer', x: [null], y: [null], marker: { symbol: 'square', size: 12, color: COLOURS.trapping }, hoverinfo: 'skip' } as Data);
  }
  for (const [y, label] of [[options.observer_height_m, 'eye'], [options.target_height_m, 'target top']] as const) {
    if (y !== undefined && y <= top) {
      const line = heightLine(y, label);
      shapes.push(line.shape);
      annotations.push(line.annotation);
    }
  }
  return {
    data,
    layout: baseLayout({
      xaxis: axis('temperature, °C', { domain: [0, 0.46] }),
      xaxis2: axis(radio ? 'modified refractivity M' : 'refractivity N = (n − 1)·10⁶', { domain: [0.54, 1] }),
      yaxis: axis('height, m', { rangemode: 'tozero' }),
      shapes,
      annotations,
    } as never),
  };
}
