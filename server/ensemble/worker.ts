/**
 * The ensemble worker: one member per task. Runs inside a piscina worker thread (loaded as ES
 * modules through server/ts-worker-entry.mjs, so this file stays TypeScript) or in the main thread
 * when no pool is used.
 */
import { evaluateMember, type MemberOptions } from '../../sim/analysis/ensemble-member.js';
import type { MemberFindings } from '../../sim/analysis/ensemble-summary.js';
import { convertScenario } from '../scenario/convert.js';
import type { ScenarioFile } from '../scenario/schema.js';

/** One member to run: its index, its scenario file (plain numbers) and what to compute. */
export interface MemberTask {
  index: number;
  file: ScenarioFile;
  options: MemberOptions;
}

/** What came back: findings, or the reason the member failed (a sampled input outside what the model accepts, say). */
export interface MemberResult {
  index: number;
  findings: MemberFindings | null;
  error: string | null;
  warnings: string[];
}

/** Runs one member; never throws (a failure is a result with error set). */
export default function runMember(task: MemberTask): MemberResult {
  try {
    const scenario = convertScenario(task.file);
    const { findings, warnings } = evaluateMember(scenario, task.options);
    return { index: task.index, findings, error: null, warnings };
  } catch (error) {
    return { index: task.index, findings: null, error: error instanceof Error ? error.message : String(error), warnings: [] };
  }
}
