/**
 * Shared look of the viewer's figures: one palette (chosen for this project), fonts, margins and
 * the Plotly config (PNG download from the mode bar). Figures are `{ data, layout }` objects.
 */
import type { Config, Data, Layout } from 'plotly.js-dist-min';

/** A Plotly figure as the pure figure functions return it. */
export interface Figure {
  data: Data[];
  layout: Partial<Layout>;
}

/** The viewer's palette. */
export const COLOURS = Object.freeze({
  ink: '#1d2a33',
  muted: '#5d6b75',
  grid: '#e3e8ec',
  sky: '#d7e8f4',
  skyHigh: '#a9cbe6',
  sea: '#31566f',
  seaFar: '#46708c',
  seaShade: 'rgba(49, 86, 111, 0.12)',
  target: '#4a3b2a',
  horizon: '#e07b39',
  temperature: '#c0392b',
  refractivity: '#2c6e9b',
  threshold: '#8e44ad',
  trapping: 'rgba(142, 68, 173, 0.13)',
  erect: 'rgba(39, 158, 122, 0.16)',
  inverted: 'rgba(230, 145, 56, 0.22)',
  hidden: 'rgba(93, 107, 117, 0.22)',
  /** Classes of the simulated view. */
  view: {
    sky: '#cfe4f3',
    sea: '#2e5873',
    target: '#3a2f25',
    duct: '#9db5c7',
  } as Record<string, string>,
  imageErect: '#27a07b',
  imageInverted: '#e08a2e',
  fate: {
    target: '#23967a',
    surface: '#b8693e',
    escaped: '#7b8fd0',
    trapped: '#c23b7d',
  },
});

/** Font of every figure. */
const FONT = { family: 'Inter, "Segoe UI", "Helvetica Neue", Arial, sans-serif', size: 12, color: COLOURS.ink };

/** A layout with the shared fonts, margins and grid; `extra` overrides. */
export function baseLayout(extra: Partial<Layout>): Partial<Layout> {
  return {
    font: FONT,
    margin: { l: 62, r: 16, t: 34, b: 46 },
    paper_bgcolor: '#ffffff',
    plot_bgcolor: '#ffffff',
    hovermode: 'closest',
    showlegend: true,
    legend: { orientation: 'h', x: 0, y: 1.02, yanchor: 'bottom', font: { size: 11 } },
    ...extra,
  };
}

/** An axis with the shared grid. */
export function axis(title: string, extra: Record<string, unknown> = {}): Record<string, unknown> {
  return { title: { text: title, standoff: 6 }, gridcolor: COLOURS.grid, zerolinecolor: '#c9d2d8', linecolor: '#b8c2c9', ticks: 'outside', ...extra };
}

/** Plotly config: responsive, no logo, PNG download named after the panel. */
export function plotConfig(filename: string): Partial<Config> {
  return {
    responsive: true,
    displaylogo: false,
    // No "share to the cloud" button: nothing leaves this machine.
    showSendToCloud: false,
    modeBarButtonsToRemove: ['select2d', 'lasso2d'],
    toImageButtonOptions: { format: 'png', filename: `loomline-${filename}`, scale: 2 },
  };
}

/** Arcminutes per degree. */
export const ARCMIN_PER_DEG = 60;
