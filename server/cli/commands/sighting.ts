/**
 * `sighting <scenario>`: visibility of the target against range along the line of sight, and the
 * ranges at which its top, its light and its whole height are first seen (approaching) or last
 * seen (receding). For the distribution over uncertain inputs use `ensemble --sighting`.
 */
import type { Command } from 'commander';
import { sightingFinding, type SightingJson } from '../../service/sighting.js';
import { renderPairs, renderTable } from '../table.js';
import { scenarioCommand, type CommonOptions } from './shared.js';
import { parseSightingOptions, sightingOptionFlags, type SightingFlags } from './sighting-options.js';

const km = (m: number | null) => (m === null ? 'not seen' : `${(m / 1000).toFixed(3)} km`);

/** Readable rendering of the sighting JSON. */
export function sightingText(r: SightingJson): string {
  const verb = r.direction === 'approaching' ? 'first seen' : 'last seen';
  const event = (e: SightingJson['top']) => `${km(e.range_m)}${e.beyond_grid ? ' (or farther: seen at the last range)' : ''}`;
  return [
    `${r.scenario} — sighting range, target ${r.direction}`,
    '',
    renderPairs([
      [`top ${verb}`, event(r.top)],
      ...(r.light ? ([[`light at ${r.light_height_m} m ${verb}`, event(r.light)]] as [string, string][]) : []),
      [`whole height ${verb}`, event(r.whole)],
    ]),
    '',
    renderTable(r.rows, [
      { header: 'range km', value: (x) => x.range_m / 1000, decimals: 3 },
      { header: 'hidden m', value: (x) => x.hidden_height_m, decimals: 2 },
      { header: 'seen %', value: (x) => 100 * x.visible_fraction, decimals: 1 },
      { header: 'status', value: (x) => x.status },
      { header: 'top', value: (x) => (x.top_visible ? 'yes' : 'no') },
      ...(r.light ? [{ header: 'light', value: (x: SightingJson['rows'][number]) => (x.light_visible ? 'yes' : 'no') }] : []),
      { header: 'whole', value: (x) => (x.whole_visible ? 'yes' : 'no') },
    ]),
    ...r.warnings.map((w) => `warning: ${w}`),
    '',
    r.caution,
  ].join('\n');
}

/** Registers `sighting <scenario>` on the program. */
export function registerSighting(program: Command): void {
  scenarioCommand<CommonOptions & SightingFlags>(
    program,
    'sighting',
    'visibility against range for a target approaching or receding along the line of sight, and where it is first or last seen',
    (cmd) => sightingOptionFlags(cmd, false),
    (scenario, options) => {
      const result = sightingFinding(scenario, parseSightingOptions(options, scenario, true)!);
      return { result, text: () => sightingText(result) };
    },
  );
}
