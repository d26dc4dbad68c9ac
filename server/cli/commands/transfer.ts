/** `transfer <scenario>`: heights reached at the target range, images and hidden bands (DESIGN.md §6). */
import type { Command } from 'commander';
import { transferFinding } from '../../service/transfer.js';
import { transferText, warningLines } from '../../service/findings-text.js';
import { addSightOptions, sightOptions, type SightCliOptions } from './sight-options.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

export function registerTransfer(program: Command): void {
  scenarioCommand<CommonOptions & SightCliOptions>(
    program,
    'transfer',
    'the transfer curve at the target range: height reached versus apparent elevation, erect and inverted images, hidden bands, looming and towering',
    (cmd) => addSightOptions(cmd, 'top of the heights reported'),
    (scenario, options) => {
      const result = transferFinding(scenario, sightOptions(options));
      return { result, text: () => [`${scenario.name}`, '', transferText(result), ...warningLines(result.warnings)].join('\n') };
    },
  );
}
