/**
 * Choosing a refractive-index model by name, its defaults, and the ranges each model accepts.
 */
import { InputError, requireInRange } from '../errors.js';
import { birchDownsModel } from './birch-downs.js';
import { ciddorModel } from './ciddor.js';
import { edlenModel } from './edlen.js';
import { radioModel } from './radio.js';
import type { IndexModelName, OpticalOptions, RefractivityFunction } from './types.js';

/**
 * Defaults of the refractive-index options (DESIGN.md §4):
 * - model: 'ciddor' (Ciddor 1996);
 * - wavelength_um: 0.55 µm (vacuum; middle of the visible band);
 * - co2_ppm: 450 ppm (the CO2 of Ciddor's and Birch & Downs' standard air).
 */
export const DEFAULTS: Readonly<{ model: IndexModelName; wavelength_um: number; co2_ppm: number }> = Object.freeze({
  model: 'ciddor',
  wavelength_um: 0.55,
  co2_ppm: 450,
});

/** A closed interval [min, max] in the unit named by the field. */
export type Interval = readonly [min: number, max: number];

/** Ranges a model accepts; null where the quantity does not enter the model. */
export interface IndexModelValidity {
  /** Vacuum wavelength, µm. */
  readonly wavelength_um: Interval | null;
  /** Air temperature anywhere in the column, K. */
  readonly temperature_K: Interval | null;
  /** Total pressure anywhere in the column, Pa. */
  readonly pressure_Pa: Interval | null;
  /** CO2 mole fraction, ppm. */
  readonly co2_ppm: Interval | null;
  /** Where the ranges come from, for error messages and documentation. */
  readonly source: string;
}

/**
 * Temperatures accepted in the column by every model, K. The published ranges start at −40 °C
 * (233 K), but a column reaches about 187 K near the mesopause; there the pressure is below 1 % of
 * the surface value, the non-ideal terms vanish and n − 1 scales with density, so Loomline accepts
 * 180..340 K (the range stated on AirState in types.ts).
 */
const COLUMN_TEMPERATURE_K: Interval = [180, 340];
/**
 * Pressures accepted in the column, Pa. Upper bound: Ciddor's 120 kPa. Lower bound 0: every model
 * reduces to n − 1 proportional to density as p → 0 (ideal-gas limit, Z → 1), which is exact.
 */
const COLUMN_PRESSURE_PA: Interval = [0, 120_000];

/** Ranges of an optical model (wavelength, column temperature and pressure, CO2). */
function opticalValidity(source: string): IndexModelValidity {
  return { wavelength_um: [0.3, 1.7], temperature_K: COLUMN_TEMPERATURE_K, pressure_Pa: COLUMN_PRESSURE_PA, co2_ppm: [0, 2000], source };
}

/**
 * Ranges per model that the scenario loader checks (with InputRangeError naming the field).
 * Published ranges are in `source`; where Loomline accepts more, the reason is given above.
 */
export const INDEX_MODEL_VALIDITY: Readonly<Record<IndexModelName, IndexModelValidity>> = Object.freeze({
  ciddor: opticalValidity('Ciddor 1996 (Appl. Opt. 35, 1566): 0.3–1.69 µm, −40..100 °C, 80–120 kPa, 0–2000 ppm CO2'),
  edlen: opticalValidity('Edlén 1966 (Metrologia 2, 71): fitted to laboratory air near 15–20 °C and 1 atm; wavelengths as for Ciddor'),
  'birch-downs': opticalValidity(
    'Birch & Downs 1993/1994 (Metrologia 30, 155; 31, 315) as modified by NIST EMT; wavelengths as for Ciddor',
  ),
  radio: {
    wavelength_um: null,
    temperature_K: COLUMN_TEMPERATURE_K,
    pressure_Pa: COLUMN_PRESSURE_PA,
    co2_ppm: null,
    source: 'ITU-R P.453-7 (1999): all radio frequencies, error below 0.5 % up to 100 GHz; wavelength and CO2 unused',
  },
  none: {
    wavelength_um: null,
    temperature_K: null,
    pressure_Pa: null,
    co2_ppm: null,
    source: 'no refraction: n = 1',
  },
});

function unknownModel(field: string, name: unknown): InputError {
  return new InputError(field, `unknown index model ${JSON.stringify(name)}; allowed ${Object.keys(INDEX_MODEL_VALIDITY).join(', ')}`);
}

/** The refractivity function of the 'none' model: vacuum, n − 1 = 0. */
const NO_REFRACTION: RefractivityFunction = () => 0;

/**
 * Checks the optical options against INDEX_MODEL_VALIDITY for the named model.
 * @param name the model.
 * @param optics wavelength_um and co2_ppm to check (fields the model does not use are ignored).
 * @param fieldPrefix prefix for field names in messages, e.g. 'optics.' (default '').
 * @throws InputError for an unknown model; InputRangeError naming the field and its range.
 */
export function checkOpticalOptions(name: IndexModelName, optics: OpticalOptions, fieldPrefix = ''): void {
  if (!Object.hasOwn(INDEX_MODEL_VALIDITY, name)) throw unknownModel(`${fieldPrefix}model`, name);
  const validity = INDEX_MODEL_VALIDITY[name];
  if (validity.wavelength_um) {
    requireInRange(`${fieldPrefix}wavelength_um`, optics.wavelength_um, validity.wavelength_um[0], validity.wavelength_um[1], 'µm');
  }
  if (validity.co2_ppm) {
    requireInRange(`${fieldPrefix}co2_ppm`, optics.co2_ppm, validity.co2_ppm[0], validity.co2_ppm[1], 'ppm');
  }
}

/**
 * The refractivity function (state → n − 1) of the named model.
 *
 * @param name 'ciddor' (default, Ciddor 1996), 'edlen' (Edlén 1966), 'birch-downs' (NIST modified
 *   Edlén), 'radio' (ITU-R P.453, ignores optics), or 'none' (n − 1 = 0).
 * @param optics wavelength_um (default 0.55 µm) and co2_ppm (default 450 ppm); not range-checked
 *   here (call checkOpticalOptions at the entry point).
 * @returns the model's RefractivityFunction.
 * @throws InputError if the name is not a model.
 */
export function refractivityModel(name: IndexModelName, optics: OpticalOptions = DEFAULTS): RefractivityFunction {
  switch (name) {
    case 'ciddor':
      return ciddorModel(optics);
    case 'edlen':
      return edlenModel(optics);
    case 'birch-downs':
      return birchDownsModel(optics);
    case 'radio':
      return radioModel();
    case 'none':
      return NO_REFRACTION;
    default:
      throw unknownModel('model', name);
  }
}
