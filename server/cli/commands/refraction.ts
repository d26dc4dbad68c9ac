/** `refraction <scenario>`: astronomical refraction at apparent elevations, and bodies at true elevations (DESIGN.md §6). */
import type { Command } from 'commander';
import { DEFAULT_REFRACTION_ELEVATIONS_DEG, REFRACTION_ELEVATION_RANGE_DEG, refractionFinding } from '../../service/refraction.js';
import { refractionText, warningLines } from '../../service/findings-text.js';
import { parseNumberList } from '../parse.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

export interface RefractionCliOptions {
  elevations?: string;
  bodies?: string;
}

/** Adds --elevations and --bodies. */
export function addRefractionOptions(cmd: Command): Command {
  return cmd
    .option('--elevations <list>', 'apparent elevations, degrees, comma-separated', DEFAULT_REFRACTION_ELEVATIONS_DEG.join(','))
    .option('--bodies <list>', 'true elevations of the Sun or Moon (0.53° discs), degrees, comma-separated');
}

/** Parses --elevations and --bodies (degrees, −90..90). */
export function refractionLists(options: RefractionCliOptions): { elevations_deg: number[]; bodies_deg: number[] } {
  const [min, max] = REFRACTION_ELEVATION_RANGE_DEG;
  return {
    elevations_deg: parseNumberList('elevations', options.elevations ?? DEFAULT_REFRACTION_ELEVATIONS_DEG.join(','), min, max, 'degrees'),
    bodies_deg: options.bodies === undefined ? [] : parseNumberList('bodies', options.bodies, min, max, 'degrees'),
  };
}

export function registerRefraction(program: Command): void {
  scenarioCommand<CommonOptions & RefractionCliOptions>(
    program,
    'refraction',
    'astronomical refraction of rays leaving the atmosphere, and how the Sun or Moon at given true elevations appear',
    addRefractionOptions,
    (scenario, options) => {
      const result = refractionFinding(scenario, refractionLists(options));
      return { result, text: () => [`${scenario.name}`, '', refractionText(result), ...warningLines(result.warnings)].join('\n') };
    },
  );
}
