/**
 * The uncertain inputs of a scenario file (DESIGN.md §5 distributions) as sim/ sampling sees them,
 * and member scenario files with the sampled values written in.
 */
import type { InputDistribution } from '../../sim/analysis/ensemble-sampling.js';
import { InputError } from '../../sim/errors.js';
import { listUncertainInputs } from '../scenario/convert.js';
import { LIMITS, type ScenarioFile, type UncertainValue } from '../scenario/schema.js';

type LimitName = keyof typeof LIMITS;

/** One uncertain input of a scenario file. */
export interface EnsembleInput {
  /** Dotted path in the scenario file, e.g. `atmosphere.bulk.sea_temperature_C`. */
  path: string;
  /** Plain words, e.g. "sea temperature". */
  label: string;
  /** Unit as written in the file (°C, m, hPa ...). */
  unit: string;
  /** The distribution as written in the file. */
  file_distribution: Exclude<UncertainValue, number>;
  /** The same for sampling; a normal is truncated to the field's allowed range (LIMITS). */
  distribution: InputDistribution;
}

/** Which LIMITS entry governs a path, by its last key (and its parent for the ambiguous height_m). */
function limitName(path: string): LimitName {
  const keys = path.split('.');
  const last = keys[keys.length - 1];
  const parent = keys[0];
  if (last === 'height_m') {
    if (parent === 'observer') return 'observer_height_m';
    if (parent === 'target') return 'target_height_m';
    return 'node_height_m';
  }
  if (last === 'range_m') return 'target_range_m';
  if (last === 'temperature_C') return 'node_temperature_C';
  if (last === 'air_temperature_height_m' || last === 'wind_height_m') return 'measurement_height_m';
  if (last in LIMITS) return last as LimitName;
  throw new InputError(path, 'this field cannot carry a distribution');
}

/** Plain-words names of the fields that may carry a distribution. */
const LABELS: Record<string, string> = {
  'observer.height_m': 'observer (eye) height',
  'target.range_m': 'target range',
  'target.height_m': 'target height',
  'target.light_height_m': 'height of the light',
  sea_temperature_C: 'sea temperature',
  air_temperature_C: 'air temperature',
  air_temperature_height_m: 'air temperature measurement height',
  wind_speed_m_s: 'wind speed',
  wind_height_m: 'wind measurement height',
  relative_humidity: 'relative humidity',
  surface_pressure_hPa: 'surface pressure',
  surface_temperature_C: 'surface temperature',
  lapse_K_per_m: 'lapse rate above the profile',
  wavelength_nm: 'wavelength',
  co2_ppm: 'CO2 content',
  radius_m: 'Earth radius',
};

/** Plain-words label of a path, e.g. "profile node 2 temperature" for atmosphere.profile.1.temperature_C. */
export function inputLabel(path: string): string {
  const keys = path.split('.');
  const profileAt = keys.indexOf('profile');
  if (profileAt >= 0 && keys.length === profileAt + 3) {
    const node = Number(keys[profileAt + 1]) + 1;
    return `profile node ${node} ${keys[profileAt + 2] === 'height_m' ? 'height' : 'temperature'}`;
  }
  return LABELS[path] ?? LABELS[keys[keys.length - 1]] ?? path;
}

/** Converts a file distribution to a sampling distribution, truncating normals to [min, max]. */
function toSampling(d: Exclude<UncertainValue, number>, min: number, max: number): InputDistribution {
  if ('normal' in d) return { kind: 'normal', mean: d.normal.mean, sd: d.normal.sd, min, max };
  if ('uniform' in d) return { kind: 'uniform', min: d.uniform.min, max: d.uniform.max };
  return { kind: 'choice', values: d.choice };
}

/**
 * Lists the uncertain inputs of a validated scenario file, in file order.
 * @param file a schema-valid scenario file.
 * @returns the inputs with labels, units and sampling distributions.
 * @throws InputError naming the path when a distribution stands where none is allowed.
 */
export function ensembleInputs(file: ScenarioFile): EnsembleInput[] {
  return listUncertainInputs(file).map(({ path, distribution }) => {
    const [min, max, unit] = LIMITS[limitName(path)];
    return { path, label: inputLabel(path), unit, file_distribution: distribution, distribution: toSampling(distribution, min, max) };
  });
}

/**
 * A member's scenario file: a copy of the file with each input's distribution replaced by its
 * sampled value. Fields without a distribution are kept as they are.
 * @param file the scenario file with distributions.
 * @param inputs its inputs (ensembleInputs).
 * @param values one value per input, in the inputs' units.
 * @returns a scenario file holding plain numbers at every input path.
 */
export function memberFile(file: ScenarioFile, inputs: readonly EnsembleInput[], values: readonly number[]): ScenarioFile {
  const copy = structuredClone(file) as unknown as Record<string, unknown>;
  inputs.forEach((input, j) => {
    const keys = input.path.split('.');
    let node = copy as Record<string, unknown>;
    for (const key of keys.slice(0, -1)) node = node[key] as Record<string, unknown>;
    node[keys[keys.length - 1]] = values[j];
  });
  return copy as unknown as ScenarioFile;
}
