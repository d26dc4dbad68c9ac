/** Plain-words sentences about an ensemble: probabilities, hidden height and what mattered most. */
import type { Percentiles } from '../../sim/analysis/ensemble-stats.js';

/** One ranked input, as the words need it. */
export interface RankedInput {
  label: string;
  score: number;
  rho: number | null;
}

/** Below this |ρ| an input is said to make little difference (a rank correlation of 0.1 explains about 1 % of rank variance). */
export const NEGLIGIBLE_RHO = 0.1;

const pct = (p: number) => `${(100 * p).toFixed(1)} %`;

/** "fully visible in 12.5 % (± 1.0 %) of runs, ..." */
export function probabilityWords(
  count: number,
  method: string,
  seed: number,
  p: { visible: number; partly_hidden: number; hidden: number },
  se: { visible: number; partly_hidden: number; hidden: number },
): string {
  if (count === 0) return 'No model run finished, so no probability can be given.';
  return (
    `In ${count} model run${count === 1 ? '' : 's'} (${method}, seed ${seed}) the target was fully visible in ${pct(p.visible)} (± ${pct(se.visible)}), ` +
    `partly hidden in ${pct(p.partly_hidden)} (± ${pct(se.partly_hidden)}) and hidden in ${pct(p.hidden)} (± ${pct(se.hidden)}) of runs ` +
    `(± one standard error of the estimate).`
  );
}

/** "Below 3.2 m (median) ... between 0.5 and 6.1 m in 90 % of runs." */
export function hiddenHeightWords(h: Percentiles | null): string {
  if (!h) return 'No run gave a hidden height.';
  if (h.p95 === 0) return 'In at least 95 % of runs nothing of the target was cut off at the bottom (hidden height 0 m).';
  return `The height hidden at the target (nothing below it seen) was ${h.p50.toFixed(1)} m in the median run and between ${h.p5.toFixed(1)} m and ${h.p95.toFixed(1)} m in 90 % of runs.`;
}

/** One sentence per input that matters, most influential first, and one for the rest. */
export function sensitivityWords(ranked: readonly RankedInput[], output: 'hidden_fraction' | 'top_elevation_rad' | null): string[] {
  if (output === null || ranked.length === 0) return ['No input changed the outcome in these runs, so no ranking of the inputs can be given.'];
  const what = output === 'hidden_fraction' ? 'hidden share of the target' : 'apparent elevation of the target top';
  const effect = (rho: number) =>
    output === 'hidden_fraction' ? (rho > 0 ? 'higher values hide more of the target' : 'higher values hide less of the target') : rho > 0 ? 'higher values lift the top' : 'higher values lower the top';
  const matters = ranked.filter((r) => r.rho !== null && r.score >= NEGLIGIBLE_RHO);
  const lines = matters.map((r, k) => {
    const lead = k === 0 ? `The ${r.label} mattered most` : `Then the ${r.label}`;
    return `${lead}: rank correlation ${(r.rho as number) >= 0 ? '+' : ''}${(r.rho as number).toFixed(2)} with the ${what} (${effect(r.rho as number)}).`;
  });
  const rest = ranked.filter((r) => !matters.includes(r));
  if (rest.length > 0) lines.push(`Little difference (|rank correlation| < ${NEGLIGIBLE_RHO}): ${rest.map((r) => r.label).join(', ')}.`);
  return lines;
}

const arcmin = (deg: number) => `${(deg * 60).toFixed(1)}′`;

/** "The sea horizon appeared at −2.1′ (median; 5–95 %: …) and the target's top at …" (inputs in degrees). */
export function elevationWords(horizon_deg: Percentiles | null, top_deg: Percentiles | null, seeTop: number, count: number): string {
  if (!horizon_deg) return '';
  const band = (p: Percentiles) => `${arcmin(p.p50)} (median; 5–95 %: ${arcmin(p.p5)} … ${arcmin(p.p95)})`;
  const top = top_deg ? ` and the target's top at ${band(top_deg)} in the ${seeTop} of ${count} runs that see it` : '';
  return `Seen from the eye, the sea horizon lay at ${band(horizon_deg)} above the horizontal${top} (arcminutes; negative: below the horizontal).`;
}

/** "Approaching, its top was first seen at 24.1 km (median; 5–95 %: …)" for the ensemble's sighting ranges. */
export function sightingWords(s: { top: Percentiles | null; light: Percentiles | null; whole: Percentiles | null } | null): string {
  if (!s) return '';
  const km = (m: number) => `${(m / 1000).toFixed(1)} km`;
  const part = (what: string, p: Percentiles | null) => (p ? `${what} ${km(p.p50)} (5–95 %: ${km(p.p5)} … ${km(p.p95)})` : `${what} never`);
  return `Along the line of sight, the target's top was first seen at ${part('', s.top).trim()}, its light at ${part('', s.light).trim()} and its whole height at ${part('', s.whole).trim()} (median over the runs; the outermost range at which each is seen).`;
}
