/**
 * Words for the page, free of the DOM: the findings in plain sentences, the model's notes and the
 * status line. Every number comes from the server's results.
 */
import type { PanelData, SessionUpdate } from './session.js';

/** One line of the findings panel; `kind` styles it (a caution stands out). */
export interface SummaryLine {
  kind: 'fact' | 'verdict' | 'caution';
  text: string;
}

/** The caution shown whenever a visibility verdict is shown. */
export const SAFETY_CAUTION = 'Model estimate; defer to official observations, local regulations and licensed professionals.';

const fmt = (x: number, digits = 1): string => x.toFixed(digits);

/** The findings in plain words (from the trace until the findings route is at hand). */
export function summaryLines(data: PanelData): SummaryLine[] {
  const trace = data.trace;
  const lines: SummaryLine[] = [];
  const reached = trace.rays.filter((r) => r.height_at_target_m !== null).map((r) => r.height_at_target_m as number);
  const total = trace.rays.length;
  lines.push({
    kind: 'fact',
    text: `Of ${total} rays from an eye ${fmt(trace.observer_height_m)} m above the surface, ${trace.fates.target} reach the target range of ${fmt(trace.range_m / 1000, 2)} km, ${trace.fates.surface} meet the surface first and ${trace.fates.escaped} leave the top of the air.`,
  });
  if (reached.length > 0) {
    lines.push({ kind: 'fact', text: `At the target range the rays cover heights from ${fmt(Math.min(...reached), 2)} m to ${fmt(Math.max(...reached), 1)} m.` });
  }
  return lines;
}

/** Warnings of the model and a note when the plots show an earlier scenario. */
export function panelNotes(data: PanelData, stale: boolean): string[] {
  const notes = [...new Set([...data.profile.warnings, ...data.trace.warnings])];
  if (stale) notes.unshift('The plots show the last scenario that worked; fix the fields marked in the editor to update them.');
  if (notes.length === 0) notes.push('No warnings: every input is within the ranges the models were made for.');
  return notes;
}

/** The status line after an update. */
export function statusLine(update: SessionUpdate, draw_ms: number): string {
  if (update.failure) return `failed: ${update.failure}`;
  if (update.issues.length > 0) return `${update.issues.length} problem${update.issues.length > 1 ? 's' : ''} in the scenario`;
  const rays = update.data?.trace.rays.length ?? 0;
  return `${rays} rays · server ${Math.round(update.server_ms)} ms · drawn in ${Math.round(draw_ms)} ms`;
}
