/**
 * The scenario file format (DESIGN.md §5), as a zod schema: the one definition that the CLI, the
 * HTTP server, the tests and the JSON Schema export all use. Units are those of the file (°C, hPa,
 * nm, m); conversion to SI happens in ./convert.ts.
 *
 * Any number may be replaced by a distribution object (for ensembles):
 *   { "normal": { "mean": 1, "sd": 0.5 } } | { "uniform": { "min": 13, "max": 15 } } | { "choice": [2, 3, 5] }
 * A single run uses the mean, the midpoint or the first choice. The range of a field is checked on
 * the mean / both bounds / every choice.
 */
import * as z from 'zod';

/** Allowed ranges of every numeric field, with units: the single source for messages and docs. */
export const LIMITS = {
  observer_height_m: [0, 10_000, 'm'],
  aperture_mm: [1, 10_000, 'mm'],
  target_range_m: [10, 1_000_000, 'm'],
  target_height_m: [0, 10_000, 'm'],
  light_height_m: [0, 10_000, 'm'],
  surface_pressure_hPa: [500, 1100, 'hPa'],
  relative_humidity: [0, 1, '(fraction)'],
  node_height_m: [0, 80_000, 'm'],
  node_temperature_C: [-90, 60, '°C'],
  lapse_K_per_m: [-0.1, 0.1, 'K/m'],
  surface_temperature_C: [-60, 50, '°C'],
  wavelength_nm: [300, 1700, 'nm'],
  co2_ppm: [0, 2000, 'ppm'],
  radius_m: [1_000_000, 100_000_000, 'm'],
  latitude_deg: [-90, 90, '°'],
  azimuth_deg: [-360, 360, '°'],
  sea_temperature_C: [-2.5, 40, '°C'],
  air_temperature_C: [-40, 45, '°C'],
  measurement_height_m: [0.5, 100, 'm'],
  wind_speed_m_s: [0, 40, 'm/s'],
  outline_m: [0, 10_000, 'm'],
} as const satisfies Record<string, readonly [number, number, string]>;

/** Largest number of temperature nodes in a profile. */
export const MAX_PROFILE_NODES = 500;

type LimitName = keyof typeof LIMITS;

function rangeText(name: LimitName): string {
  const [min, max, unit] = LIMITS[name];
  return `${min}..${max} ${unit}`;
}

function show(value: unknown): string {
  if (typeof value === 'number') return String(value);
  return JSON.stringify(value) ?? String(value);
}

/** A plain number within the named limits. */
export function plainNumber(name: LimitName) {
  const [min, max] = LIMITS[name];
  const outOfRange = (iss: { input: unknown }) => `${show(iss.input)} is out of range: allowed ${rangeText(name)}`;
  return z
    .number({ error: (iss) => `expected a number (${rangeText(name)}), got ${show(iss.input)}` })
    .min(min, { error: outOfRange })
    .max(max, { error: outOfRange });
}

/** A number within the named limits, or a distribution whose parameters lie within them. */
export function uncertainNumber(name: LimitName) {
  const value = plainNumber(name);
  const [min, max] = LIMITS[name];
  const normal = z.strictObject({
    normal: z.strictObject({
      mean: value,
      sd: z.number().min(0, { error: 'standard deviation must be ≥ 0' }).max(max - min, { error: `standard deviation must be ≤ ${max - min}` }),
    }),
  });
  const uniform = z.strictObject({
    uniform: z
      .strictObject({ min: value, max: value })
      .refine((u) => u.max >= u.min, { error: 'uniform.max must be ≥ uniform.min' }),
  });
  const choice = z.strictObject({ choice: z.array(value).min(1, { error: 'choice needs at least one value' }).max(1000) });
  return z.union([value, normal, uniform, choice], {
    error: () =>
      `expected a number (${rangeText(name)}) or a distribution {"normal":{"mean","sd"}} | {"uniform":{"min","max"}} | {"choice":[...]}`,
  });
}

export type UncertainValue = z.infer<ReturnType<typeof uncertainNumber>>;

const profileNode = z.strictObject({
  height_m: uncertainNumber('node_height_m'),
  temperature_C: uncertainNumber('node_temperature_C'),
});

const above = z.union([z.literal('us1976'), z.strictObject({ lapse_K_per_m: uncertainNumber('lapse_K_per_m') })], {
  error: () => 'expected "us1976" or { "lapse_K_per_m": number }',
});

const profile = z.array(profileNode).min(1, { error: 'profile needs at least one node' }).max(MAX_PROFILE_NODES, {
  error: `profile has too many nodes: allowed at most ${MAX_PROFILE_NODES}`,
});

const bulk = z.strictObject({
  sea_temperature_C: uncertainNumber('sea_temperature_C'),
  air_temperature_C: uncertainNumber('air_temperature_C'),
  air_temperature_height_m: uncertainNumber('measurement_height_m').optional(),
  wind_speed_m_s: uncertainNumber('wind_speed_m_s'),
  wind_height_m: uncertainNumber('measurement_height_m').optional(),
  relative_humidity: uncertainNumber('relative_humidity').optional(),
  surface_pressure_hPa: uncertainNumber('surface_pressure_hPa').optional(),
  cool_skin: z.boolean().optional(),
});

const profileAtmosphere = z.strictObject({
  surface_pressure_hPa: uncertainNumber('surface_pressure_hPa').optional(),
  relative_humidity: uncertainNumber('relative_humidity').optional(),
  profile,
  above: above.optional(),
});

const standardAtmosphere = z.strictObject({
  standard: z.literal('us1976', { error: 'the only standard atmosphere is "us1976"' }),
  surface_temperature_C: uncertainNumber('surface_temperature_C').optional(),
  surface_pressure_hPa: uncertainNumber('surface_pressure_hPa').optional(),
  relative_humidity: uncertainNumber('relative_humidity').optional(),
});

const bulkAtmosphere = z.strictObject({
  bulk,
  profile: profile.optional(),
  above: above.optional(),
});

/** Picks the atmosphere variant by its distinguishing key, so errors speak of the right variant. */
const atmosphere = z.custom<unknown>().transform((value, ctx) => {
  const obj = value as Record<string, unknown>;
  const variant =
    obj && typeof obj === 'object' && !Array.isArray(obj)
      ? 'standard' in obj
        ? standardAtmosphere
        : 'bulk' in obj
          ? bulkAtmosphere
          : profileAtmosphere
      : null;
  if (!variant) {
    ctx.addIssue({ code: 'custom', message: 'expected an object with "profile", "standard" or "bulk"' });
    return z.NEVER;
  }
  const result = variant.safeParse(value);
  if (!result.success) {
    for (const issue of result.error.issues) ctx.addIssue({ ...issue, path: issue.path } as never);
    return z.NEVER;
  }
  return result.data;
});

export const TARGET_SHAPES = ['vessel', 'tower', 'cliff', 'ice', 'custom', 'pole'] as const;

const outlinePoint = z.tuple([plainNumber('outline_m'), plainNumber('outline_m')]);

export const scenarioFileSchema = z.strictObject({
  name: z.string().min(1).max(200),
  description: z.string().max(2000).optional(),
  observer: z.strictObject({
    height_m: uncertainNumber('observer_height_m'),
    aperture_mm: plainNumber('aperture_mm').optional(),
  }),
  target: z.strictObject({
    range_m: uncertainNumber('target_range_m'),
    height_m: uncertainNumber('target_height_m'),
    shape: z.enum(TARGET_SHAPES).optional(),
    /** Custom silhouette: [width_m, height_m] pairs from the left edge, for shape "custom". */
    outline: z.array(outlinePoint).min(2).max(500).optional(),
    light_height_m: uncertainNumber('light_height_m').optional(),
  }),
  atmosphere: z.union([profileAtmosphere, standardAtmosphere, bulkAtmosphere]),
  optics: z
    .strictObject({
      wavelength_nm: uncertainNumber('wavelength_nm').optional(),
      index_model: z.enum(['ciddor', 'edlen', 'birch-downs', 'radio', 'none']).optional(),
      co2_ppm: uncertainNumber('co2_ppm').optional(),
    })
    .optional(),
  earth: z
    .strictObject({
      radius_m: uncertainNumber('radius_m').optional(),
      latitude_deg: plainNumber('latitude_deg').optional(),
      azimuth_deg: plainNumber('azimuth_deg').optional(),
    })
    .optional(),
});

/** The atmosphere schema that dispatches on its key (better error messages than a plain union). */
export const scenarioFileSchemaForParsing = scenarioFileSchema.extend({ atmosphere });

export type ScenarioFile = z.infer<typeof scenarioFileSchema>;
