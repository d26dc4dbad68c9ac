/** The options the sight-line commands share: --range, --max-height, --rays (parsed with field-named errors). */
import type { Command } from 'commander';
import { FAN_DEFAULTS } from '../../../sim/analysis/transfer-fan.js';
import { InputRangeError } from '../../../sim/errors.js';
import { SIGHT_LIMITS, type SightOptions } from '../../service/sight.js';
import { parseInteger, parseNumber } from '../parse.js';

export interface SightCliOptions {
  range?: string;
  maxHeight?: string;
  rays?: string;
}

/** Adds --range, --max-height and --rays to a command. */
export function addSightOptions(cmd: Command, maxHeightMeaning: string): Command {
  return cmd
    .option('--range <m>', 'target range override, metres (default: the scenario target.range_m)')
    .option('--max-height <m>', `${maxHeightMeaning}, metres (default: the scenario target.height_m)`)
    .option('--rays <n>', `rays of the first fan before refinement (default ${FAN_DEFAULTS.rays})`);
}

/** Parses the shared options into service options. */
export function sightOptions(options: SightCliOptions): SightOptions {
  const out: SightOptions = {};
  if (options.range !== undefined) out.range_m = parseNumber('range', options.range, SIGHT_LIMITS.range_m[0], SIGHT_LIMITS.range_m[1], 'm');
  if (options.maxHeight !== undefined) {
    const h = parseNumber('max-height', options.maxHeight, SIGHT_LIMITS.max_height_m[0], SIGHT_LIMITS.max_height_m[1], 'm');
    if (!(h > 0)) throw new InputRangeError('--max-height', h, `(0, ${SIGHT_LIMITS.max_height_m[1]}] m`);
    out.max_height_m = h;
  }
  if (options.rays !== undefined) out.rays = parseInteger('rays', options.rays, 3, 100_000);
  return out;
}
