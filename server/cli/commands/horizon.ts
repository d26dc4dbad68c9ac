/** `horizon <scenario>`: the apparent horizon, dip, distance and false horizon (DESIGN.md §6). */
import type { Command } from 'commander';
import { horizonFinding } from '../../service/horizon.js';
import { horizonText, warningLines } from '../../service/findings-text.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

export function registerHorizon(program: Command): void {
  scenarioCommand<CommonOptions>(
    program,
    'horizon',
    'the apparent sea horizon: elevation, dip, distance, whether it is a false horizon, trapped elevations and ducts',
    (cmd) => cmd,
    (scenario) => {
      const result = horizonFinding(scenario);
      return { result, text: () => [`${scenario.name}`, '', horizonText(result), ...warningLines(result.warnings)].join('\n') };
    },
  );
}
