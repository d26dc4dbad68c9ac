/** Command-line flags of the sighting sweep, shared by `sighting`, `ensemble --sighting` and `report`. */
import type { Command } from 'commander';
import { SIGHTING_DEFAULTS, defaultSightingGrid, type SightingOptions } from '../../../sim/analysis/sighting.js';
import { InputError } from '../../../sim/errors.js';
import type { Scenario } from '../../../sim/scenario.js';
import { parseNumber, parseNumberList } from '../parse.js';

export interface SightingFlags {
  sighting?: boolean;
  ranges?: string;
  direction?: string;
  lightHeight?: string;
  rangeTolerance?: string;
}

/** Adds --ranges, --direction, --light-height, --range-tolerance (and --sighting, which turns the sweep on per member). */
export function sightingOptionFlags(cmd: Command, withSwitch = true): Command {
  if (withSwitch) cmd.option('--sighting', 'also find, for every member, the ranges at which the target is first seen (costly: a range sweep per member)');
  return cmd
    .option('--ranges <from_m,to_m,count>', 'range grid of the sighting sweep, m, m, points (default: around the straight-line sighting distance)')
    .option('--direction <dir>', 'approaching (first seen) or receding (last seen)', SIGHTING_DEFAULTS.direction)
    .option('--light-height <m>', "height of a light on the target, m (default: the scenario's target.light_height_m)")
    .option('--range-tolerance <m>', 'width to which each sighting range is bisected, m', String(SIGHTING_DEFAULTS.tolerance_m));
}

/**
 * The sighting options from the flags, or null when `--sighting` is absent (and `always` is false).
 * @throws InputError / InputRangeError naming the flag.
 */
export function parseSightingOptions(flags: SightingFlags, scenario: Scenario, always = false): SightingOptions | null {
  if (!always && !flags.sighting) return null;
  const grid = defaultSightingGrid(scenario.observer.height_m, scenario.target.height_m, scenario.earth.radius_m);
  let from_m = grid.from_m;
  let to_m = grid.to_m;
  let count: number = SIGHTING_DEFAULTS.count;
  if (flags.ranges !== undefined) {
    const parts = parseNumberList('ranges', flags.ranges, 0, 1e6);
    if (parts.length !== 3) throw new InputError('--ranges', 'expected FROM_M,TO_M,COUNT (metres, metres, number of ranges)');
    [from_m, to_m, count] = parts;
  }
  const direction = flags.direction ?? SIGHTING_DEFAULTS.direction;
  if (direction !== 'approaching' && direction !== 'receding') throw new InputError('--direction', `"${direction}" is not one of approaching, receding`);
  const light_height_m = flags.lightHeight !== undefined ? parseNumber('light-height', flags.lightHeight, 0, scenario.target.height_m, 'm') : (scenario.target.light_height_m ?? null);
  const tolerance_m = parseNumber('range-tolerance', flags.rangeTolerance ?? String(SIGHTING_DEFAULTS.tolerance_m), 0.01, 1e5, 'm');
  return { from_m, to_m, count, direction, light_height_m, tolerance_m };
}
