/**
 * A scenario as the simulation sees it: validated, SI units, defaults filled in.
 * The JSON scenario file (DESIGN.md §5, °C/hPa/nm at the edge) is parsed and converted to this by
 * server/scenario; nothing in sim/ reads files.
 */
import type { IndexModelName } from './refractivity/types.js';

/** How temperature continues above the last profile node (DESIGN.md §5 `above`). */
export type AboveSpec =
  | { kind: 'us1976' }
  | { kind: 'lapse'; lapse_K_per_m: number };

/** A temperature node of a layered profile. */
export interface TemperatureNode {
  height_m: number;
  temperature_K: number;
}

/** Layered atmosphere given by temperature nodes, linear between them. */
export interface ProfileAtmosphere {
  kind: 'profile';
  surface_pressure_Pa: number;
  /** Relative humidity 0..1, held constant with height. */
  relative_humidity: number;
  nodes: TemperatureNode[];
  above: AboveSpec;
}

/** The US Standard Atmosphere 1976 shifted to a surface temperature. */
export interface StandardAtmosphere {
  kind: 'standard';
  surface_temperature_K: number;
  surface_pressure_Pa: number;
  relative_humidity: number;
}

/** Routine marine observations turned into a surface layer (Monin-Obukhov / COARE-style). */
export interface BulkAtmosphere {
  kind: 'bulk';
  sea_temperature_K: number;
  air_temperature_K: number;
  air_temperature_height_m: number;
  wind_speed_m_s: number;
  wind_height_m: number;
  relative_humidity: number;
  surface_pressure_Pa: number;
  cool_skin: boolean;
  /** Optional nodes above the surface layer (an elevated inversion). */
  nodes: TemperatureNode[];
  above: AboveSpec;
}

export type AtmosphereSpec = ProfileAtmosphere | StandardAtmosphere | BulkAtmosphere;

export interface OpticsSpec {
  wavelength_um: number;
  index_model: IndexModelName;
  co2_ppm: number;
}

export interface Scenario {
  name: string;
  description?: string;
  observer: { height_m: number; aperture_m?: number };
  target: {
    range_m: number;
    height_m: number;
    /** Silhouette for the simulated view: vessel, tower, cliff, ice, pole or custom. */
    shape?: string;
    /** Custom silhouette as [width_m, height_m] pairs from the left edge (shape "custom"). */
    outline_m?: [number, number][];
    /** Height of a light on the target, m (sighting range of lights). */
    light_height_m?: number;
  };
  atmosphere: AtmosphereSpec;
  optics: OpticsSpec;
  earth: { radius_m: number };
}
