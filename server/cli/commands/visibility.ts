/** `visibility <scenario>`: hidden height, visible fraction, images and status of the target (DESIGN.md §6). */
import type { Command } from 'commander';
import { visibilityFinding } from '../../service/visibility.js';
import { visibilityText, warningLines } from '../../service/findings-text.js';
import { addSightOptions, sightOptions, type SightCliOptions } from './sight-options.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

export function registerVisibility(program: Command): void {
  scenarioCommand<CommonOptions & SightCliOptions>(
    program,
    'visibility',
    'whether the target is seen: hidden height, visible fraction, image count, status, resolvability; compared with straight lines and US 1976 air',
    (cmd) => addSightOptions(cmd, "the target's height (top)"),
    (scenario, options) => {
      const result = visibilityFinding(scenario, sightOptions(options));
      return { result, text: () => [`${scenario.name}`, '', visibilityText(result), ...warningLines(result.warnings)].join('\n') };
    },
  );
}
