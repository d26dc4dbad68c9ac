/**
 * The outlook's pool worker (piscina): computes one row. Runs in a worker thread that loads it as
 * ES modules through tsx (server/ts-worker-entry.mjs, options from server/ts-worker.ts); pure
 * computation, no I/O.
 */
import { outlookForObservation, type OutlookFinding, type OutlookObservation, type OutlookSite } from '../../sim/analysis/outlook.js';

/** One task: an observation and its site (plain data, structured-cloned into the worker). */
export interface OutlookTask {
  observation: OutlookObservation;
  site: OutlookSite;
}

/** Computes one row's finding (plain data, cloned back to the caller). */
export default function computeOutlookRow(task: OutlookTask): OutlookFinding {
  return outlookForObservation(task.observation, task.site);
}
