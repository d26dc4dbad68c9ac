/** `trace <scenario>`: chosen rays or a fan, with fates, heights at the target range and paths (DESIGN.md §6). */
import type { Command } from 'commander';
import { automaticFan, fanElevations, traceRays, type TracedRay } from '../../service/trace.js';
import { buildMedium } from '../../../sim/atmosphere/medium.js';
import { InputError } from '../../../sim/errors.js';
import { parseFan, parseInteger, parseNumberList } from '../parse.js';
import { renderTable } from '../table.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

/** Largest number of rays one `trace` command traces. */
export const MAX_CLI_RAYS = 10_001;
/** Rays of the automatic fan when neither --elevations nor --fan is given. */
export const DEFAULT_FAN_RAYS = 21;
/** Path points per ray in the JSON (uniform in range, plus the end point) unless --path-points says otherwise. */
export const DEFAULT_PATH_POINTS = 41;
/** Fractions of the target range at which the text table shows each ray's height. */
const TEXT_PATH_FRACTIONS = [0.25, 0.5, 0.75];

interface TraceOptions extends CommonOptions {
  elevations?: string;
  fan?: string;
  pathPoints?: string;
}

/** Height of a ray's path at a range, by linear interpolation of its down-sampled path; null past its end. */
function heightAt(ray: TracedRay, range_m: number): number | null {
  const path = ray.path;
  for (let i = 1; i < path.length; i++) {
    if (path[i][0] >= range_m) {
      const [s0, z0] = path[i - 1];
      const [s1, z1] = path[i];
      return s1 === s0 ? z1 : z0 + ((z1 - z0) * (range_m - s0)) / (s1 - s0);
    }
  }
  return null;
}

export function registerTrace(program: Command): void {
  scenarioCommand<TraceOptions>(
    program,
    'trace',
    'trace chosen rays or a fan toward the target: fates, heights at the target range, paths',
    (cmd) =>
      cmd
        .option('--elevations <list>', 'apparent elevations in degrees, comma-separated (e.g. -0.1,0,0.1)')
        .option('--fan <from,to,count>', 'a fan of COUNT rays from FROM to TO degrees (default: an automatic fan of 21 rays framing the target)')
        .option('--path-points <n>', `points per ray path in the output (2..10000, default ${DEFAULT_PATH_POINTS})`),
    (scenario, options) => {
      if (options.elevations && options.fan) throw new InputError('--elevations', 'give either --elevations or --fan, not both');
      const medium = buildMedium(scenario);
      let elevations_deg: number[];
      if (options.elevations) elevations_deg = parseNumberList('elevations', options.elevations, -80, 80, 'degrees');
      else if (options.fan) elevations_deg = parseFan(options.fan, MAX_CLI_RAYS, 80);
      else {
        const fan = automaticFan(scenario, medium);
        elevations_deg = fanElevations(fan.from_deg, fan.to_deg, DEFAULT_FAN_RAYS);
      }
      if (elevations_deg.length > MAX_CLI_RAYS) throw new InputError('--elevations', `too many rays: allowed at most ${MAX_CLI_RAYS}`);
      const path_points = options.pathPoints ? parseInteger('path-points', options.pathPoints, 2, 10_000) : DEFAULT_PATH_POINTS;
      const result = traceRays(scenario, elevations_deg, { medium, path_points });
      const D = result.range_m;
      return {
        result,
        text: () =>
          [
            `${scenario.name} — ${result.rays.length} rays from ${scenario.observer.height_m} m toward ${(D / 1000).toFixed(1)} km`,
            `fates: ${Object.entries(result.fates).map(([k, v]) => `${k} ${v}`).join(', ')}`,
            '',
            renderTable(result.rays, [
              { header: 'elevation °', value: (r) => r.elevation_deg.toFixed(5) },
              { header: 'fate', value: (r) => r.fate },
              ...TEXT_PATH_FRACTIONS.map((f) => ({ header: `h at ${((f * D) / 1000).toFixed(1)} km`, value: (r: TracedRay) => heightAt(r, f * D), decimals: 2 })),
              { header: 'h at target m', value: (r) => r.height_at_target_m, decimals: 3 },
              { header: 'ends at km', value: (r) => r.end_range_m / 1000, decimals: 3 },
            ]),
            ...result.warnings.map((w) => `warning: ${w}`),
          ].join('\n'),
      };
    },
  );
}
