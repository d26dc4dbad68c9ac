/** Option handling shared by the commands: the scenario argument, --json, and output. */
import type { Command } from 'commander';
import { loadScenarioFile } from '../../scenario/load.js';
import type { Scenario } from '../../../sim/scenario.js';
import type { ScenarioFile } from '../../scenario/schema.js';
import { printResult, reportError } from '../run.js';

export interface CommonOptions {
  json?: boolean;
}

export { SAFETY_CAUTION } from '../../service/caution.js';

/**
 * Adds a command taking a scenario file, with --json, and runs `compute` on the loaded scenario.
 * `compute` returns the JSON result and its text rendering.
 */
export function scenarioCommand<O extends CommonOptions>(
  program: Command,
  name: string,
  summary: string,
  configure: (cmd: Command) => Command,
  compute: (scenario: Scenario, options: O, file: ScenarioFile) => Promise<{ result: unknown; text: () => string }> | { result: unknown; text: () => string },
): Command {
  const cmd = program.command(name).description(summary).argument('<scenario>', 'scenario JSON file').option('--json', 'print one JSON object on stdout and nothing else');
  configure(cmd);
  cmd.action(async (path: string, options: O) => {
    try {
      const { scenario, file } = await loadScenarioFile(path);
      const { result, text } = await compute(scenario, options, file);
      printResult(Boolean(options.json), result, text);
    } catch (error) {
      process.exitCode = reportError(error);
    }
  });
  return cmd;
}
