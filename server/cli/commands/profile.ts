/** `profile <scenario>`: the resolved air at chosen heights (DESIGN.md §6). */
import type { Command } from 'commander';
import { DEFAULT_PROFILE_HEIGHTS_M, profileLevels } from '../../service/profile.js';
import { parseNumberList } from '../parse.js';
import { renderTable } from '../table.js';
import { scenarioCommand, type CommonOptions } from './shared.js';

interface ProfileOptions extends CommonOptions {
  heights?: string;
}

export function registerProfile(program: Command): void {
  scenarioCommand<ProfileOptions>(
    program,
    'profile',
    'the resolved air (temperature, pressure, refractive index, dn/dz) at chosen heights',
    (cmd) => cmd.option('--heights <list>', 'comma-separated heights in metres', DEFAULT_PROFILE_HEIGHTS_M.join(',')),
    (scenario, options) => {
      const heights = parseNumberList('heights', options.heights ?? DEFAULT_PROFILE_HEIGHTS_M.join(','), 0, 100_000, 'm');
      const { levels, warnings } = profileLevels(scenario, heights);
      const result = { scenario: scenario.name, index_model: scenario.optics.index_model, wavelength_nm: scenario.optics.wavelength_um * 1000, levels, warnings };
      return {
        result,
        text: () =>
          [
            `${scenario.name} — air as traced (${scenario.optics.index_model}${scenario.optics.index_model === 'radio' || scenario.optics.index_model === 'none' ? '' : `, ${Math.round(scenario.optics.wavelength_um * 1000)} nm`})`,
            '',
            renderTable(levels, [
              { header: 'height m', value: (l) => l.height_m },
              { header: 'T °C', value: (l) => l.temperature_C, decimals: 3 },
              { header: 'dT/dz K/m', value: (l) => l.temperature_gradient_K_per_m, decimals: 4 },
              { header: 'p hPa', value: (l) => l.pressure_hPa, decimals: 2 },
              { header: 'e hPa', value: (l) => l.vapour_pressure_hPa, decimals: 2 },
              { header: 'n − 1 (×1e6)', value: (l) => l.refractivity_N, decimals: 3 },
              { header: 'M units', value: (l) => l.modified_refractivity_M, decimals: 2 },
              { header: 'dn/dz per m', value: (l) => l.dn_dz_per_m.toExponential(4) },
            ]),
            ...warnings.map((w) => `warning: ${w}`),
          ].join('\n'),
      };
    },
  );
}
