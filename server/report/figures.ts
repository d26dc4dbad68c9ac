/**
 * The report's figures as Plotly specifications: pure functions (data) => figure, no DOM, no
 * physics. Each figure carries an id, a title and a caption in plain words.
 */
import type { EnsembleResult, MemberRow } from '../service/ensemble.js';

/** A Plotly figure with its place in the report. */
export interface FigureSpec {
  id: string;
  title: string;
  caption: string;
  data: Record<string, unknown>[];
  layout: Record<string, unknown>;
}

/** Shared look of every figure. */
function layout(xTitle: string, yTitle: string, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return {
    margin: { l: 64, r: 20, t: 16, b: 52 },
    height: 340,
    xaxis: { title: { text: xTitle }, zeroline: false },
    yaxis: { title: { text: yTitle }, zeroline: false },
    legend: { orientation: 'h', y: -0.25 },
    font: { family: 'system-ui, sans-serif', size: 12 },
    ...extra,
  };
}

/** Air temperature and modified refractivity against height. */
export function airProfileFigure(levels: readonly { height_m: number; temperature_C: number; modified_refractivity_M: number }[]): FigureSpec {
  const z = levels.map((l) => l.height_m);
  return {
    id: 'fig-air',
    title: 'Air profile',
    caption: 'Temperature (lower axis) and modified refractivity M (upper axis) against height, as the tracer sees the air. M falling with height marks a duct.',
    data: [
      { type: 'scatter', mode: 'lines+markers', name: 'temperature °C', x: levels.map((l) => l.temperature_C), y: z },
      { type: 'scatter', mode: 'lines', name: 'modified refractivity M', x: levels.map((l) => l.modified_refractivity_M), y: z, xaxis: 'x2', line: { dash: 'dot' } },
    ],
    layout: layout('temperature, °C', 'height, m', {
      xaxis2: { title: { text: 'M units' }, overlaying: 'x', side: 'top' },
      margin: { l: 64, r: 20, t: 48, b: 52 },
    }),
  };
}

/** Light paths from the observer: height against range, coloured by fate. */
export function lightPathsFigure(trace: { range_m: number; target_height_m: number; rays: readonly { elevation_deg: number; fate: string; path: readonly [number, number][] }[] }): FigureSpec {
  const colours: Record<string, string> = { target: '#1f77b4', surface: '#8c564b', escaped: '#bbbbbb', trapped: '#d62728' };
  const seen = new Set<string>();
  const data: Record<string, unknown>[] = trace.rays.map((ray) => {
    const first = !seen.has(ray.fate);
    seen.add(ray.fate);
    return {
      type: 'scatter',
      mode: 'lines',
      name: ray.fate,
      legendgroup: ray.fate,
      showlegend: first,
      x: ray.path.map((p) => p[0] / 1000),
      y: ray.path.map((p) => p[1]),
      line: { width: 1, color: colours[ray.fate] ?? '#444' },
      hovertemplate: `${ray.elevation_deg.toFixed(4)}°<extra>${ray.fate}</extra>`,
    };
  });
  data.push({ type: 'scatter', mode: 'lines', name: 'the target', x: [trace.range_m / 1000, trace.range_m / 1000], y: [0, trace.target_height_m], line: { width: 4, color: '#000' } });
  return {
    id: 'fig-paths',
    title: 'Light paths',
    caption: 'Rays traced from the eye outward (the reverse of the light), height above the sea against range; the black bar is the target. Heights are above the curved sea surface.',
    data,
    layout: layout('range, km', 'height above the sea, m'),
  };
}

/** The transfer curve: height reached at the target range against apparent elevation. */
export function transferFigure(rays: readonly { elevation_deg: number; height_m: number | null }[], targetHeight_m: number): FigureSpec {
  const hit = rays.filter((r) => r.height_m !== null);
  return {
    id: 'fig-transfer',
    title: 'Heights at the target',
    caption: 'Height at the target range reached by each apparent elevation at the eye (the transfer curve). Rising pieces are erect images, falling pieces inverted; heights no ray reaches are hidden.',
    data: [
      { type: 'scatter', mode: 'lines', name: 'height at target', x: hit.map((r) => r.height_m), y: hit.map((r) => r.elevation_deg * 60) },
      { type: 'scatter', mode: 'lines', name: 'target top', x: [targetHeight_m, targetHeight_m], y: [Math.min(...hit.map((r) => r.elevation_deg * 60)), Math.max(...hit.map((r) => r.elevation_deg * 60))], line: { dash: 'dash', color: '#000' } },
    ],
    layout: layout('height at the target range, m', 'apparent elevation, arcmin'),
  };
}

/** Histogram of one finding over the members. */
function histogram(rows: readonly MemberRow[], pick: (r: MemberRow) => number | null, name: string, axis: string): Record<string, unknown> {
  return { type: 'histogram', name, x: rows.map(pick).filter((v): v is number => v !== null), xaxis: axis, yaxis: axis.replace('x', 'y'), nbinsx: 30 };
}

/** Histograms of hidden height, horizon elevation and top elevation over the members. */
export function ensembleHistogramFigure(ensemble: EnsembleResult): FigureSpec {
  const rows = ensemble.member_rows;
  return {
    id: 'fig-histograms',
    title: 'Ensemble distributions',
    caption: `Over the ${ensemble.members} finished runs: height hidden at the target, apparent elevation of the sea horizon, and apparent elevation of the target top (runs that see it).`,
    data: [
      histogram(rows, (r) => r.hidden_height_m, 'hidden height, m', 'x'),
      histogram(rows, (r) => (r.horizon_elevation_deg === null ? null : r.horizon_elevation_deg * 60), 'horizon elevation, arcmin', 'x2'),
      histogram(rows, (r) => (r.top_elevation_deg === null ? null : r.top_elevation_deg * 60), 'top elevation, arcmin', 'x3'),
    ],
    layout: {
      ...layout('', 'runs'),
      grid: { rows: 1, columns: 3, pattern: 'independent' },
      xaxis: { title: { text: 'hidden height, m' } },
      xaxis2: { title: { text: 'horizon, arcmin' } },
      xaxis3: { title: { text: 'target top, arcmin' } },
      yaxis: { title: { text: 'runs' } },
      showlegend: false,
    },
  };
}

/** Sensitivity ranking as horizontal bars of the signed rank correlation. */
export function sensitivityFigure(ensemble: EnsembleResult): FigureSpec {
  const ranked = [...ensemble.sensitivity].reverse();
  return {
    id: 'fig-sensitivity',
    title: 'What mattered most',
    caption: 'Spearman rank correlation of each input with the hidden share of the target (or the target top elevation when that never changed); longest bar first. Positive: higher values hide more.',
    data: [
      {
        type: 'bar',
        orientation: 'h',
        x: ranked.map((s) => s.rho ?? 0),
        y: ranked.map((s) => s.label),
        marker: { color: ranked.map((s) => ((s.rho ?? 0) >= 0 ? '#d62728' : '#1f77b4')) },
      },
    ],
    layout: layout('rank correlation ρ', '', { xaxis: { title: { text: 'rank correlation ρ' }, range: [-1, 1] }, margin: { l: 220, r: 20, t: 16, b: 52 } }),
  };
}

/** Visibility against range for a target moving along the line of sight. */
export function sightingFigure(rows: readonly { range_m: number; hidden_height_m: number; visible_fraction: number }[], targetHeight_m: number, light_m: number | null): FigureSpec {
  const km = rows.map((r) => r.range_m / 1000);
  const data: Record<string, unknown>[] = [
    { type: 'scatter', mode: 'lines+markers', name: 'hidden height, m', x: km, y: rows.map((r) => r.hidden_height_m) },
    { type: 'scatter', mode: 'lines', name: 'target top', x: [km[0], km[km.length - 1]], y: [targetHeight_m, targetHeight_m], line: { dash: 'dash', color: '#000' } },
    { type: 'scatter', mode: 'lines', name: 'visible fraction', x: km, y: rows.map((r) => r.visible_fraction), yaxis: 'y2', line: { color: '#2ca02c' } },
  ];
  if (light_m !== null) data.push({ type: 'scatter', mode: 'lines', name: 'light', x: [km[0], km[km.length - 1]], y: [light_m, light_m], line: { dash: 'dot', color: '#ff7f0e' } });
  return {
    id: 'fig-sighting',
    title: 'Visibility against range',
    caption: 'For the target at other ranges along the same line (the point scenario): the height hidden below the horizon or a mirage, and the fraction of the target seen. The target is seen where the hidden height is below its top.',
    data,
    layout: layout('range, km', 'hidden height, m', { yaxis2: { title: { text: 'visible fraction' }, overlaying: 'y', side: 'right', range: [0, 1.05], tickvals: [0, 0.25, 0.5, 0.75, 1], showgrid: false }, margin: { l: 64, r: 64, t: 16, b: 52 } }),
  };
}
