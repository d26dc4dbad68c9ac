/**
 * Words for the page, free of the DOM: the findings in plain sentences (with the safety caution
 * whenever a visibility verdict is shown), the model's notes and the status line. Every number
 * comes from the server's results.
 */
import type { PanelData, SessionUpdate } from './session.js';
import type { FindingsJson } from './types.js';

/** One line of the findings panel; `kind` styles it (a caution stands out). */
export interface SummaryLine {
  kind: 'fact' | 'verdict' | 'caution';
  text: string;
}

/** The caution shown whenever a visibility verdict is shown. */
export const SAFETY_CAUTION = 'Model estimate; defer to official observations, local regulations and licensed professionals.';

const SHAPE_WORDS: Record<string, string> = { vessel: 'vessel', tower: 'tower', cliff: 'cliff coast', ice: 'ice block', pole: 'pole', custom: 'target' };

const m = (x: number): string => `${x < 10 ? x.toFixed(1) : x.toFixed(0)} m`;
const km = (x_m: number): string => `${(x_m / 1000).toFixed(x_m < 10_000 ? 2 : 1)} km`;
const arcmin = (x: number): string => `${Math.abs(x).toFixed(1)}′`;

/** The visibility verdict and what qualifies it. */
function targetLines(f: FindingsJson): SummaryLine[] {
  const v = f.visibility;
  const what = `Seen from an eye ${m(f.observer_height_m)} up, the ${m(f.target_height_m)} ${SHAPE_WORDS[f.target_shape ?? ''] ?? 'target'} ${km(f.range_m)} away`;
  const lines: SummaryLine[] = [];
  if (v.status === 'visible') lines.push({ kind: 'verdict', text: `${what} is in full view.` });
  else if (v.status === 'hidden') lines.push({ kind: 'verdict', text: `${what} is hidden: no line of sight from the eye reaches any of it.` });
  else {
    const bands = v.hidden_bands.map((b) => `${m(b.from_height_m)}–${m(b.to_height_m)}`);
    const below = v.hidden_height_m > 0 ? `nothing below ${m(v.hidden_height_m)} is seen` : '';
    const parts = [below, bands.length ? `the band${bands.length > 1 ? 's' : ''} ${bands.join(', ')} ${bands.length > 1 ? 'are' : 'is'} hidden` : ''].filter(Boolean);
    lines.push({ kind: 'verdict', text: `${what} is partly hidden: ${parts.join('; ')}; ${(100 * v.visible_fraction).toFixed(0)} % of its height is seen.` });
  }
  if (v.image_count > 0) {
    const inverted = v.images.filter((i) => i.orientation === 'inverted').length;
    const erect = v.image_count - inverted;
    const stacked = v.image_count > 1 ? ', stacked one above another' : '';
    const kinds = [erect ? `${erect} erect` : '', inverted ? `${inverted} inverted` : ''].filter(Boolean).join(', ');
    lines.push({ kind: 'fact', text: `${v.image_count === 1 ? 'One image' : `${v.image_count} images`} of it (${kinds})${stacked}.` });
    if (!v.resolution.visible_resolvable) {
      lines.push({ kind: 'fact', text: `What is seen spans ${arcmin(v.resolution.visible_extent_arcmin)}, less than the ${arcmin(v.resolution.limit_arcmin)} ${v.resolution.by === 'eye' ? 'the unaided eye' : 'the instrument'} resolves: it would not be made out.` });
    }
  }
  const standard = f.transfer.looming.standard;
  if (standard && (standard.looming === 'looming' || standard.looming === 'sinking')) {
    const shift = standard.top_shift_arcmin ?? 0;
    const tall = standard.towering === 'towering' || standard.towering === 'stooping' ? ` and looks ${(standard.magnification_ratio ?? 1).toFixed(2)} times as tall (${standard.towering})` : '';
    lines.push({ kind: 'fact', text: `Against standard air (US 1976) the scene is ${standard.looming}: the target's top is seen ${arcmin(shift)} ${shift >= 0 ? 'higher' : 'lower'}${tall}.` });
  }
  const geometry = v.compared.geometry;
  if (geometry && geometry.status !== v.status) {
    const would = geometry.status === 'visible' ? 'in full view' : geometry.status === 'hidden' ? 'hidden' : `partly hidden (nothing below ${m(geometry.hidden_height_m)} seen)`;
    lines.push({ kind: 'fact', text: `Along straight lines of sight it would be ${would}.` });
  }
  return lines;
}

/** The findings in plain words; the caution closes every verdict. */
export function summaryLines(data: PanelData): SummaryLine[] {
  const f = data.findings;
  const h = f.horizon;
  const lines = targetLines(f);
  const distance = h.horizon_distance_m === null ? 'far away' : `${km(h.horizon_distance_m)} away`;
  const side = h.horizon_elevation_deg < 0 ? 'below' : 'above';
  lines.push({
    kind: 'fact',
    text: `The ${h.false_horizon ? 'apparent horizon' : "sea's edge"} lies ${arcmin(h.horizon_elevation_deg * 60)} ${side} the horizontal, ${distance}; along straight lines of sight the sea's edge would lie ${arcmin(h.geometry.dip_arcmin)} below the horizontal.`,
  });
  if (h.false_horizon) {
    lines.push({ kind: 'fact', text: `That horizon is a false one: light grazes the top of a duct at ${m(h.grazing_height_m)}, so the visible sea ends before its true edge.` });
  }
  const star = f.refraction.rows.find((r) => r.apparent_elevation_deg === 0);
  if (star && star.refraction_arcmin !== null) lines.push({ kind: 'fact', text: `A star seen on the horizontal is lifted ${arcmin(star.refraction_arcmin)} by the air (astronomical refraction).` });
  lines.push({ kind: 'caution', text: SAFETY_CAUTION });
  return lines;
}

/** Warnings of the model and a note when the plots show an earlier scenario. */
export function panelNotes(data: PanelData, stale: boolean): string[] {
  const notes = [...new Set([...data.profile.warnings, ...data.trace.warnings, ...data.findings.warnings, ...data.view.warnings])];
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
