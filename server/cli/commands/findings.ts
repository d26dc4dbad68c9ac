/** `findings <scenario>`: every finding in one (horizon, transfer, looming, visibility, refraction): the main job's text. */
import type { Command } from 'commander';
import { findings } from '../../service/findings.js';
import { findingsText } from '../../service/findings-text.js';
import { addRefractionOptions, refractionLists, type RefractionCliOptions } from './refraction.js';
import { addSightOptions, sightOptions, type SightCliOptions } from './sight-options.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

export function registerFindings(program: Command): void {
  scenarioCommand<CommonOptions & SightCliOptions & RefractionCliOptions>(
    program,
    'findings',
    'all findings of a scenario: horizon, heights at the target, images and hidden bands, looming, visibility, astronomical refraction',
    (cmd) => addRefractionOptions(addSightOptions(cmd, "the target's height (top)")),
    (scenario, options) => {
      const lists = refractionLists(options);
      const result = findings(scenario, { ...sightOptions(options), refraction_elevations_deg: lists.elevations_deg, bodies_deg: lists.bodies_deg });
      return { result, text: () => findingsText(result) };
    },
  );
}
