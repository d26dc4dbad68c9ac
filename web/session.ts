/**
 * The viewer's session, free of the DOM: holds the scenario being edited and the fan settings,
 * debounces edits, asks the server for every panel's data at once (aborting stale requests), and
 * hands one update to the page: the results, or the problems with the scenario by field.
 */
import { ApiError, type Api, type FanRequest } from './api.js';
import { airSampleHeights } from './editor/air.js';
import type { Issue } from './editor/issues.js';
import type { FindingsJson, ProfileResult, ScenarioJson, TraceResult, ViewJson } from './types.js';

/** Quiet time after the last keystroke before re-tracing, ms. A committed edit (Enter, leaving the field) traces at once. */
export const EDIT_DEBOUNCE_MS = 250;
/** Points per ray path the viewer asks for (enough for a smooth 1000-pixel-wide plot). */
export const VIEWER_PATH_POINTS = 61;
/** Rays in the viewer's fan unless the user sets another count. */
export const DEFAULT_VIEWER_RAYS = 501;

/** Data of every panel from one computation. */
export interface PanelData {
  profile: ProfileResult;
  trace: TraceResult;
  findings: FindingsJson;
  view: ViewJson;
}

/** What the page receives after each computation. */
export interface SessionUpdate {
  /** Counts computations; the page marks itself ready with it. */
  generation: number;
  /** The latest good data (from this computation, or the last one that succeeded). */
  data: PanelData | null;
  /** True when `data` is from an earlier scenario because this one failed. */
  stale: boolean;
  /** Problems with the scenario or the fan, by field (from the server's 400 answer). */
  issues: Issue[];
  /** A failure that is not about the input (server down, internal error). */
  failure: string | null;
  /** Time the server took to answer, ms. */
  server_ms: number;
}

type Timer = ReturnType<typeof setTimeout>;

export class Session {
  scenario: ScenarioJson = {};
  fan: FanRequest = { count: DEFAULT_VIEWER_RAYS };
  private generation = 0;
  private lastGood: PanelData | null = null;
  private timer: Timer | null = null;
  private inFlight: AbortController | null = null;

  constructor(
    private readonly api: Api,
    private readonly onUpdate: (update: SessionUpdate) => void,
    private readonly onBusy: (busy: boolean) => void = () => {},
    private readonly debounce_ms = EDIT_DEBOUNCE_MS,
    /** Called as each panel's data arrives (the page may draw it at once); the full update follows. */
    private readonly onPartial: (generation: number, data: Partial<PanelData>) => void = () => {},
  ) {}

  /** Replaces the scenario; recomputes after the debounce, or at once when `now`. */
  setScenario(scenario: ScenarioJson, now: boolean): void {
    this.scenario = scenario;
    this.schedule(now);
  }

  /** Replaces the fan settings and recomputes at once. */
  setFan(fan: FanRequest): void {
    this.fan = fan;
    this.schedule(true);
  }

  /** Recomputes after the debounce (or now), cancelling a pending one. */
  schedule(now: boolean): void {
    if (this.timer !== null) clearTimeout(this.timer);
    this.timer = null;
    if (now) void this.compute();
    else this.timer = setTimeout(() => void this.compute(), this.debounce_ms);
  }

  /** Asks the server for every panel's data; aborts a computation still running. */
  async compute(): Promise<void> {
    this.timer = null;
    this.inFlight?.abort();
    const controller = new AbortController();
    this.inFlight = controller;
    const generation = ++this.generation;
    const scenario = this.scenario;
    const started = performance.now();
    this.onBusy(true);
    const signal = controller.signal;
    const partial: Partial<PanelData> = {};
    const arrived = <K extends keyof PanelData>(key: K) => (value: PanelData[K]) => {
      partial[key] = value;
      if (!signal.aborted && generation === this.generation) this.onPartial(generation, { ...partial });
      return value;
    };
    const results = await Promise.allSettled([
      this.api.profile(scenario, airSampleHeights(scenario), signal).then(arrived('profile')),
      this.api.trace(scenario, this.fan, VIEWER_PATH_POINTS, signal).then(arrived('trace')),
      this.api.findings(scenario, signal).then(arrived('findings')),
      this.api.view(scenario, signal).then(arrived('view')),
    ]);
    if (signal.aborted || generation !== this.generation) return;
    this.inFlight = null;
    this.onBusy(false);
    const server_ms = performance.now() - started;
    const failures = results.filter((r): r is PromiseRejectedResult => r.status === 'rejected').map((r) => r.reason as unknown);
    if (failures.length === 0) {
      const [profile, trace, findings, view] = results.map((r) => (r as PromiseFulfilledResult<unknown>).value) as [ProfileResult, TraceResult, FindingsJson, ViewJson];
      this.lastGood = { profile, trace, findings, view };
      this.onUpdate({ generation, data: this.lastGood, stale: false, issues: [], failure: null, server_ms });
      return;
    }
    const inputError = failures.find((f): f is ApiError => f instanceof ApiError && f.status === 400);
    const issues = inputError ? inputError.issues : [];
    const other = failures.find((f) => !(f instanceof ApiError && f.status === 400));
    const failure = inputError ? null : other instanceof Error ? other.message : String(other);
    this.onUpdate({ generation, data: this.lastGood, stale: this.lastGood !== null, issues, failure, server_ms });
  }
}
