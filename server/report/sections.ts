/**
 * The report's text sections as HTML fragments: summary, inputs and uncertainties, methods and
 * sources, assumptions and limits, caution, reproducibility. Pure functions of the report data.
 */
import type { EnsembleResult } from '../service/ensemble.js';

/** Escapes text for HTML element content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c] as string);
}

const pct = (p: number) => `${(100 * p).toFixed(1)} %`;

/** The caution every report carries (plain words; the CLI's SAFETY_CAUTION says the same at more length). */
export const REPORT_CAUTION = 'Model estimate; defer to official observations, local regulations and licensed professionals.';

/** Summary: the plain-words sentences and the probability table. */
export function summarySection(e: EnsembleResult, pointStatus: string | null): string {
  const rows = (
    [
      ['fully visible', e.probabilities.visible, e.standard_errors.visible],
      ['partly hidden', e.probabilities.partly_hidden, e.standard_errors.partly_hidden],
      ['hidden', e.probabilities.hidden, e.standard_errors.hidden],
    ] as const
  )
    .map(([name, p, se]) => `<tr><td>${name}</td><td class="num">${pct(p)}</td><td class="num">± ${pct(se)}</td></tr>`)
    .join('');
  const partial = e.partial ? `<p class="warn"><strong>Partial:</strong> cancelled after ${e.members + e.failed} of ${e.requested_members} runs; the figures cover the finished runs only.</p>` : '';
  return `<section id="summary"><h2>Summary</h2>${partial}
<ul>${e.summary.map((s) => `<li>${escapeHtml(s)}</li>`).join('')}</ul>
<table class="probabilities"><thead><tr><th>outcome</th><th>probability</th><th>standard error</th></tr></thead><tbody>${rows}</tbody></table>
${pointStatus ? `<p>With every input at its central value (mean, midpoint or first choice) the single run finds the target <strong>${escapeHtml(pointStatus)}</strong>.</p>` : ''}
<p class="caution">${escapeHtml(REPORT_CAUTION)}</p></section>`;
}

function distributionText(d: unknown): string {
  const x = d as { normal?: { mean: number; sd: number }; uniform?: { min: number; max: number }; choice?: number[] };
  if (x.normal) return `normal, mean ${x.normal.mean}, standard deviation ${x.normal.sd} (kept within the field's allowed range)`;
  if (x.uniform) return `uniform between ${x.uniform.min} and ${x.uniform.max}`;
  if (x.choice) return `one of ${x.choice.join(', ')}, equally likely`;
  return JSON.stringify(d);
}

/** Inputs and their uncertainties, plus the scenario file itself. */
export function inputsSection(e: EnsembleResult, scenarioText: string): string {
  const rows = e.inputs
    .map((i) => `<tr><td>${escapeHtml(i.label)}</td><td><code>${escapeHtml(i.path)}</code></td><td>${escapeHtml(i.unit)}</td><td>${escapeHtml(distributionText(i.distribution))}</td></tr>`)
    .join('');
  const table = e.inputs.length
    ? `<table><thead><tr><th>input</th><th>field</th><th>unit</th><th>uncertainty</th></tr></thead><tbody>${rows}</tbody></table>`
    : '<p>The scenario has no uncertain inputs: every run is the same.</p>';
  return `<section id="inputs"><h2>Inputs and their uncertainties</h2>${table}
<p>Sampling: ${e.sampling === 'monte-carlo' ? 'Monte Carlo (independent draws)' : 'Latin hypercube (each input\'s range cut into equal-probability strata, each used once)'}, ${e.requested_members} runs requested, seed ${e.seed}.</p>
<details><summary>The scenario file</summary><pre>${escapeHtml(scenarioText)}</pre></details></section>`;
}

/** What the report needs to say about the methods used. */
export interface MethodFacts {
  index_model: string;
  bulk: boolean;
  tolerance_m: number;
}

const INDEX_SOURCES: Record<string, string> = {
  ciddor: 'Ciddor 1996, "Refractive index of air: new equations for the visible and near infrared", Applied Optics 35(9), 1566–1573',
  edlen: 'Edlén 1966, "The refractive index of air", Metrologia 2(2), 71–80',
  'birch-downs': 'Birch & Downs 1993, Metrologia 30, 155–162, and correction 1994, Metrologia 31, 315–316',
  radio: 'ITU-R Recommendation P.453, "The radio refractive index: its formula and refractivity data"',
  none: 'none: n ≡ 1 (straight lines, pure geometry)',
};

/** Methods and their sources. */
export function methodsSection(m: MethodFacts, e: EnsembleResult): string {
  const items = [
    `Refractive index of air: ${INDEX_SOURCES[m.index_model] ?? m.index_model} (the model in use); Ciddor 1996 is the default.`,
    'Pressure: hydrostatic integration of the temperature profile; above the given air, the US Standard Atmosphere 1976 lapse rates.',
    m.bulk
      ? 'Air near the sea from routine observations: Monin–Obukhov similarity with the COARE 3.5 bulk flux algorithm (Fairall et al. 2003, J. Climate 16, 571–591; Edson et al. 2013, J. Phys. Oceanogr. 43, 1589–1610).'
      : 'Air near the sea: the temperature profile as given (Monin–Obukhov similarity / COARE 3.5 are used when a scenario gives bulk sea and air observations instead).',
    'Ray paths: spherically stratified air over a sphere; Bouguer\'s invariant n·r·cos α is constant along every ray and is used for the horizon, the dip and as a check on the integration.',
    `Integrator: embedded Runge–Kutta 4(5) of Cash & Karp 1990 (ACM Trans. Math. Software 16(3), 201–222) with adaptive steps, local error tolerance ${m.tolerance_m.toExponential()} m per step, steps stopped at the kinks of the profile.`,
    `Ensemble: ${e.sampling === 'monte-carlo' ? 'Monte Carlo' : 'Latin hypercube (McKay, Beckman & Conover 1979)'} sampling from a seeded xoshiro128** generator (Blackman & Vigna 2021) seeded by SplitMix64 (Steele, Lea & Flood 2014); normal values by inversion with Wichura's AS241 (1988). Probabilities are fractions of runs with binomial standard errors sqrt(p(1−p)/n); percentiles by Hyndman & Fan (1996) definition 7.`,
    `Sensitivity: ${e.sensitivity_method} (Spearman 1904).`,
  ];
  return `<section id="methods"><h2>Methods and sources</h2><ul>${items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul></section>`;
}

/** Assumptions and limits, and the caution. */
export function limitsSection(warnings: readonly string[]): string {
  const items = [
    'The air is horizontally uniform (stratified): the same profile at every range along the line of sight.',
    'The sea is a smooth sphere; waves, swell and the target\'s own motion are ignored.',
    'The probabilities describe the model under the stated input uncertainties only. They do not include errors of the model itself, of the observations, or turbulence (shimmer), haze, fog, light level and contrast, which can hide a target that the geometry would show.',
    'A target counts as seen where any ray reaches it; whether a person would notice it (contrast, size on the retina, attention) is not modelled.',
    'Runs whose sampled inputs the model cannot accept are left out and counted.',
  ];
  const w = warnings.length ? `<h3>Warnings from this run</h3><ul>${warnings.map((x) => `<li>${escapeHtml(x)}</li>`).join('')}</ul>` : '';
  return `<section id="limits"><h2>Assumptions and limits</h2><ul>${items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>${w}
<p class="caution"><strong>Caution:</strong> ${escapeHtml(REPORT_CAUTION)}</p></section>`;
}

/** Facts that let someone reproduce the report. */
export interface Reproducibility {
  tool_version: string;
  seed: number;
  sampling: string;
  members: number;
  workers: number;
  scenario_sha256: string;
  scenario_file: string;
  generated_at: string;
  command: string;
}

/** Reproducibility block. */
export function reproducibilitySection(r: Reproducibility): string {
  const rows: [string, string][] = [
    ['tool', `loomline ${r.tool_version}`],
    ['scenario file', r.scenario_file],
    ['scenario SHA-256', r.scenario_sha256],
    ['seed', String(r.seed)],
    ['sampling', r.sampling],
    ['runs requested', String(r.members)],
    ['worker threads', `${r.workers} (results do not depend on it)`],
    ['generated', r.generated_at],
    ['command', r.command],
  ];
  return `<section id="reproducibility"><h2>Reproducibility</h2><table>${rows
    .map(([k, v]) => `<tr><th>${escapeHtml(k)}</th><td><code>${escapeHtml(v)}</code></td></tr>`)
    .join('')}</table><p>The same tool version, scenario file (same SHA-256), seed, sampling and number of runs give the same numbers on any machine.</p></section>`;
}
