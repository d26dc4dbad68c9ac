/**
 * Scenario file (edge units, possibly uncertain numbers) → sim Scenario (SI, point values),
 * with the cross-field checks a schema cannot express (node heights increasing, observer inside
 * the modelled air, wavelength valid for the index model).
 */
import { CELSIUS_OFFSET_K, EARTH_RADIUS_M, RAD_PER_DEG } from '../../sim/constants.js';
import { radiusOfCurvature_m } from '../../sim/earth.js';
import type { AboveSpec, AtmosphereSpec, Scenario, TemperatureNode } from '../../sim/scenario.js';
import type { ScenarioFile, UncertainValue } from './schema.js';
import { ScenarioError } from './errors.js';

/** Defaults of the scenario file (DESIGN.md §5), in file units. */
export const SCENARIO_DEFAULTS = {
  surface_pressure_hPa: 1013.25,
  relative_humidity: 0,
  co2_ppm: 450,
  wavelength_nm: 550,
  index_model: 'ciddor',
  radius_m: EARTH_RADIUS_M,
  above: 'us1976',
  standard_surface_temperature_C: 15,
  measurement_height_m: 10,
  bulk_relative_humidity: 0.8,
} as const;

/** Wavelength validity of each optical model, nm (sources in sim/refractivity/*). */
const WAVELENGTH_VALIDITY_NM: Record<string, [number, number]> = {
  ciddor: [300, 1700],
  edlen: [300, 1700],
  'birch-downs': [300, 1700],
};

/** The value a single run uses for a possibly uncertain number: mean, midpoint or first choice. */
export function pointValue(value: UncertainValue): number {
  if (typeof value === 'number') return value;
  if ('normal' in value) return value.normal.mean;
  if ('uniform' in value) return 0.5 * (value.uniform.min + value.uniform.max);
  return value.choice[0];
}

/** A number in the file that carries a distribution, with its path (for ensembles). */
export interface UncertainInput {
  path: string;
  distribution: Exclude<UncertainValue, number>;
}

/** Lists every distribution in a scenario file with its dotted path (e.g. `atmosphere.profile.1.temperature_C`). */
export function listUncertainInputs(file: unknown, prefix = ''): UncertainInput[] {
  const found: UncertainInput[] = [];
  if (file && typeof file === 'object') {
    const obj = file as Record<string, unknown>;
    if ('normal' in obj || 'uniform' in obj || 'choice' in obj) {
      return [{ path: prefix, distribution: obj as UncertainInput['distribution'] }];
    }
    for (const [key, value] of Object.entries(obj)) {
      found.push(...listUncertainInputs(value, prefix ? `${prefix}.${key}` : key));
    }
  }
  return found;
}

const opt = (value: UncertainValue | undefined, fallback: number): number => (value === undefined ? fallback : pointValue(value));

type FileNode = { height_m: UncertainValue; temperature_C: UncertainValue };

function convertNodes(nodes: readonly FileNode[] | undefined, field: string): TemperatureNode[] {
  const out: TemperatureNode[] = [];
  (nodes ?? []).forEach((node, i) => {
    const height_m = pointValue(node.height_m);
    if (i > 0 && !(height_m > out[i - 1].height_m)) {
      throw new ScenarioError(`${field}.${i}.height_m`, `${height_m} must be greater than the previous node's height (${out[i - 1].height_m} m): heights increase strictly`);
    }
    out.push({ height_m, temperature_K: pointValue(node.temperature_C) + CELSIUS_OFFSET_K });
  });
  return out;
}

function convertAbove(above: unknown): AboveSpec {
  if (above === undefined || above === 'us1976') return { kind: 'us1976' };
  return { kind: 'lapse', lapse_K_per_m: pointValue((above as { lapse_K_per_m: UncertainValue }).lapse_K_per_m) };
}

function convertAtmosphere(atm: ScenarioFile['atmosphere']): AtmosphereSpec {
  const hPa = 100;
  if ('standard' in atm) {
    return {
      kind: 'standard',
      surface_temperature_K: opt(atm.surface_temperature_C, SCENARIO_DEFAULTS.standard_surface_temperature_C) + CELSIUS_OFFSET_K,
      surface_pressure_Pa: opt(atm.surface_pressure_hPa, SCENARIO_DEFAULTS.surface_pressure_hPa) * hPa,
      relative_humidity: opt(atm.relative_humidity, SCENARIO_DEFAULTS.relative_humidity),
    };
  }
  if ('bulk' in atm) {
    const b = atm.bulk;
    const air_temperature_height_m = opt(b.air_temperature_height_m, SCENARIO_DEFAULTS.measurement_height_m);
    const nodes = convertNodes(atm.profile, 'atmosphere.profile');
    if (nodes.length > 0 && !(nodes[0].height_m > air_temperature_height_m)) {
      throw new ScenarioError('atmosphere.profile.0.height_m', `${nodes[0].height_m} must be above the air temperature height (${air_temperature_height_m} m): nodes continue the surface layer upward`);
    }
    return {
      kind: 'bulk',
      sea_temperature_K: pointValue(b.sea_temperature_C) + CELSIUS_OFFSET_K,
      air_temperature_K: pointValue(b.air_temperature_C) + CELSIUS_OFFSET_K,
      air_temperature_height_m,
      wind_speed_m_s: pointValue(b.wind_speed_m_s),
      wind_height_m: opt(b.wind_height_m, SCENARIO_DEFAULTS.measurement_height_m),
      relative_humidity: opt(b.relative_humidity, SCENARIO_DEFAULTS.bulk_relative_humidity),
      surface_pressure_Pa: opt(b.surface_pressure_hPa, SCENARIO_DEFAULTS.surface_pressure_hPa) * hPa,
      cool_skin: b.cool_skin ?? false,
      nodes,
      above: convertAbove(atm.above),
    };
  }
  return {
    kind: 'profile',
    surface_pressure_Pa: opt(atm.surface_pressure_hPa, SCENARIO_DEFAULTS.surface_pressure_hPa) * hPa,
    relative_humidity: opt(atm.relative_humidity, SCENARIO_DEFAULTS.relative_humidity),
    nodes: convertNodes(atm.profile, 'atmosphere.profile'),
    above: convertAbove(atm.above),
  };
}

/** Converts a schema-valid scenario file to the SI scenario used by sim/. Throws ScenarioError. */
export function convertScenario(file: ScenarioFile): Scenario {
  const index_model = file.optics?.index_model ?? SCENARIO_DEFAULTS.index_model;
  const wavelength_nm = opt(file.optics?.wavelength_nm, SCENARIO_DEFAULTS.wavelength_nm);
  const validity = WAVELENGTH_VALIDITY_NM[index_model];
  if (validity && (wavelength_nm < validity[0] || wavelength_nm > validity[1])) {
    throw new ScenarioError('optics.wavelength_nm', `${wavelength_nm} is out of range for index model "${index_model}": allowed ${validity[0]}..${validity[1]} nm`);
  }
  let radius_m = opt(file.earth?.radius_m, SCENARIO_DEFAULTS.radius_m);
  if (file.earth?.latitude_deg !== undefined) {
    if (file.earth.radius_m !== undefined) {
      throw new ScenarioError('earth', 'give either radius_m or latitude_deg (with azimuth_deg), not both');
    }
    radius_m = radiusOfCurvature_m(file.earth.latitude_deg * RAD_PER_DEG, (file.earth.azimuth_deg ?? 0) * RAD_PER_DEG);
  }
  const atmosphere = convertAtmosphere(file.atmosphere);
  const observer_height_m = pointValue(file.observer.height_m);
  const target_range_m = pointValue(file.target.range_m);
  const target_height_m = pointValue(file.target.height_m);
  const scenario: Scenario = {
    name: file.name,
    ...(file.description !== undefined ? { description: file.description } : {}),
    observer: {
      height_m: observer_height_m,
      ...(file.observer.aperture_mm !== undefined ? { aperture_m: file.observer.aperture_mm / 1000 } : {}),
    },
    target: {
      range_m: target_range_m,
      height_m: target_height_m,
      ...(file.target.shape !== undefined ? { shape: file.target.shape } : {}),
      ...(file.target.outline !== undefined ? { outline_m: file.target.outline.map(([w, h]) => [w, h] as [number, number]) } : {}),
      ...(file.target.light_height_m !== undefined ? { light_height_m: pointValue(file.target.light_height_m) } : {}),
    },
    atmosphere,
    optics: { wavelength_um: wavelength_nm / 1000, index_model, co2_ppm: opt(file.optics?.co2_ppm, SCENARIO_DEFAULTS.co2_ppm) },
    earth: { radius_m },
  };
  return scenario;
}
