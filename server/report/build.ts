/**
 * Builds the incident report: runs the ensemble and the single-run findings of the scenario,
 * draws the figures and assembles the self-contained page. Pure of files: the caller reads the
 * scenario and writes the outputs (server/report/write.ts).
 */
import { createHash } from 'node:crypto';
import { createRequire } from 'node:module';
import { rangeVisibility } from '../../sim/analysis/ensemble-member.js';
import { sightingSweep, type SightingOptions, type SightingResult } from '../../sim/analysis/sighting.js';
import { buildMedium } from '../../sim/atmosphere/medium.js';
import { DEFAULTS as TRACE_OPTION_DEFAULTS } from '../../sim/trace/options.js';
import type { Scenario } from '../../sim/scenario.js';
import type { ScenarioFile } from '../scenario/schema.js';
import { runEnsemble, type EnsembleHooks, type EnsembleOptions, type EnsembleResult } from '../service/ensemble.js';
import { findings } from '../service/findings.js';
import { profileLevels } from '../service/profile.js';
import { fanElevations, traceRays } from '../service/trace.js';
import { viewFinding } from '../service/view.js';
import { airProfileFigure, ensembleHistogramFigure, lightPathsFigure, sensitivityFigure, sightingFigure, transferFigure, type FigureSpec } from './figures.js';
import { renderReportHtml } from './html.js';
import { inputsSection, limitsSection, methodsSection, reproducibilitySection, summarySection } from './sections.js';
import { viewFigure } from './view-figure.js';

const require = createRequire(import.meta.url);

/** The tool version from package.json. */
export function toolVersion(): string {
  return (require('../../package.json') as { version: string }).version;
}

/** SHA-256 of the scenario file's bytes, hex. */
export function sha256Hex(text: string | Uint8Array): string {
  return createHash('sha256').update(text).digest('hex');
}

/** Rays in the light-path figure. */
const PATH_RAYS = 41;
/** Heights of the air-profile figure: 0 to this many times the larger of eye and target height (at least 60 m). */
const PROFILE_SPAN_FACTOR = 3;
const PROFILE_LEVELS = 61;
/** Grid of the simulated view in the report (rows, columns): coarser than the viewer's, same picture. */
const VIEW_GRID = { rows: 161, columns: 101 };

export interface ReportRequest {
  /** The scenario file's text as read (hashed and shown). */
  scenarioText: string;
  /** The path as given (shown). */
  scenarioPath: string;
  file: ScenarioFile;
  scenario: Scenario;
  ensemble: EnsembleOptions;
  /** Sweep of the point scenario for the visibility-against-range figure. */
  sighting: SightingOptions;
  /** The command line that made the report (shown in the reproducibility block). */
  command: string;
  /** Time stamp shown (ISO 8601). */
  generated_at: string;
}

export interface ReportOutput {
  html: string;
  ensemble: EnsembleResult;
  sighting: SightingResult;
  figures: string[];
}

/**
 * Runs everything the report shows and renders it.
 * @param request the scenario, options and provenance.
 * @param hooks cancellation and progress of the ensemble (a cancelled ensemble gives a report labelled partial).
 * @throws InputError / InputRangeError naming the field for bad options.
 */
export async function buildReport(request: ReportRequest, hooks: EnsembleHooks = {}): Promise<ReportOutput> {
  const { scenario, file } = request;
  const ensemble = await runEnsemble(file, request.ensemble, hooks);
  const medium = buildMedium(scenario);
  const found = findings(scenario, { medium });
  const top = Math.max(60, PROFILE_SPAN_FACTOR * Math.max(scenario.observer.height_m, scenario.target.height_m));
  const levels = profileLevels(scenario, Array.from({ length: PROFILE_LEVELS }, (_, i) => (top * i) / (PROFILE_LEVELS - 1)), medium).levels;
  const w = found.transfer.window;
  const trace = traceRays(scenario, fanElevations(w.from_elevation_deg, w.to_elevation_deg, PATH_RAYS), { medium });
  const view = viewFinding(scenario, { medium, ...VIEW_GRID });
  const sighting = sightingSweep((r) => rangeVisibility(medium, scenario, r), scenario.target.height_m, request.sighting);
  const figures: FigureSpec[] = [
    airProfileFigure(levels),
    lightPathsFigure(trace),
    transferFigure(found.transfer.rays, scenario.target.height_m),
    viewFigure(view),
    ensembleHistogramFigure(ensemble),
    sensitivityFigure(ensemble),
    sightingFigure(sighting.rows, scenario.target.height_m, sighting.light_height_m),
  ];
  const warnings = [...new Set([...found.warnings, ...ensemble.warnings])];
  const html = renderReportHtml({
    title: `Incident report: ${scenario.name}`,
    subtitle: scenario.description ?? 'Could the observer have seen the target? A model estimate over the uncertain inputs.',
    before: [summarySection(ensemble, found.visibility.status), inputsSection(ensemble, request.scenarioText), sightingSection(sighting)],
    figures,
    after: [
      methodsSection({ index_model: scenario.optics.index_model, bulk: scenario.atmosphere.kind === 'bulk', tolerance_m: TRACE_OPTION_DEFAULTS.tolerance_m }, ensemble),
      limitsSection(warnings),
      reproducibilitySection({
        tool_version: toolVersion(),
        seed: ensemble.seed,
        sampling: ensemble.sampling,
        members: ensemble.requested_members,
        workers: ensemble.workers,
        scenario_sha256: sha256Hex(request.scenarioText),
        scenario_file: request.scenarioPath,
        generated_at: request.generated_at,
        command: request.command,
      }),
    ],
  });
  return { html, ensemble, sighting, figures: figures.map((f) => f.id) };
}

const km = (m: number | null) => (m === null ? '—' : `${(m / 1000).toFixed(2)} km`);

/** The sighting ranges of the single run in words. */
function sightingSection(s: SightingResult): string {
  const verb = s.direction === 'approaching' ? 'first seen' : 'last seen';
  const line = (what: string, e: SightingResult['top'] | null) =>
    e === null ? '' : `<li>${what} ${verb} at ${km(e.range_m)}${e.beyond_grid ? ' or farther (seen at the end of the ranges tried)' : ''}${e.range_m === null ? ' (not seen at any range tried)' : ''}.</li>`;
  return `<section id="sighting"><h2>Sighting range (single run)</h2><p>The target ${s.direction === 'approaching' ? 'approaching along' : 'receding along'} the line of sight, between ${km(s.rows[0].range_m)} and ${km(s.rows[s.rows.length - 1].range_m)}, all inputs at their central values:</p>
<ul>${line('Its top was', s.top)}${s.light ? line(`Its light (${s.light_height_m} m) was`, s.light) : ''}${line('Its whole height was', s.whole)}</ul></section>`;
}
