/**
 * The ensemble panel's figure: a histogram of the hidden height over the members and the
 * probabilities of each outcome with their standard errors (pure: answer → figure, no DOM).
 */
import type { Data } from 'plotly.js-dist-min';
import { COLOURS, type Figure } from './theme.js';

/** The part of the `ensemble` JSON (DESIGN.md §6) the figure reads. */
export interface EnsembleChartInput {
  probabilities: { visible: number; partly_hidden: number; hidden: number };
  standard_errors: { visible: number; partly_hidden: number; hidden: number };
  member_rows: { hidden_height_m: number | null }[];
}

/**
 * Two side-by-side plots: outcome probabilities (bars with ±1 standard error) and the hidden height's histogram.
 * @param e the ensemble answer.
 * @returns the Plotly figure.
 */
export function ensembleFigure(e: EnsembleChartInput): Figure {
  const outcomes = ['fully visible', 'partly hidden', 'hidden'];
  const p = [e.probabilities.visible, e.probabilities.partly_hidden, e.probabilities.hidden].map((v) => 100 * v);
  const se = [e.standard_errors.visible, e.standard_errors.partly_hidden, e.standard_errors.hidden].map((v) => 100 * v);
  const data: Data[] = [
    { type: 'bar', x: outcomes, y: p, error_y: { type: 'data', array: se, visible: true }, marker: { color: [COLOURS.imageErect, COLOURS.horizon, COLOURS.muted] }, name: 'probability', xaxis: 'x', yaxis: 'y' } as Data,
    { type: 'histogram', x: e.member_rows.map((m) => m.hidden_height_m).filter((h): h is number => h !== null), nbinsx: 30, marker: { color: COLOURS.sea }, name: 'hidden height', xaxis: 'x2', yaxis: 'y2' } as Data,
  ];
  return {
    data,
    layout: {
      grid: { rows: 1, columns: 2, pattern: 'independent' },
      showlegend: false,
      height: 320,
      margin: { l: 56, r: 16, t: 12, b: 48 },
      yaxis: { title: { text: 'probability, %' }, range: [0, 100] },
      xaxis2: { title: { text: 'hidden height at the target, m' } },
      yaxis2: { title: { text: 'runs' } },
    },
  };
}
