import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, InputRangeError } from '../../sim/errors.js';
import { birchDownsModel } from '../../sim/refractivity/birch-downs.js';
import { ciddorModel } from '../../sim/refractivity/ciddor.js';
import { edlenModel } from '../../sim/refractivity/edlen.js';
import { checkOpticalOptions, DEFAULTS, INDEX_MODEL_VALIDITY, refractivityModel } from '../../sim/refractivity/models.js';
import { radioModel } from '../../sim/refractivity/radio.js';
import type { IndexModelName } from '../../sim/refractivity/types.js';
import { saturationVapourPressure_Pa } from '../../sim/refractivity/water-vapour.js';
import { expectClose } from '../support/close.js';

const REFRACTING_MODELS: IndexModelName[] = ['ciddor', 'edlen', 'birch-downs', 'radio'];
const OPTICS = { wavelength_um: 0.589, co2_ppm: 420 };
const STATE = { temperature_K: 283.15, pressure_Pa: 98_000, vapour_pressure_Pa: 900 };

describe('refractivityModel', () => {
  it('returns the same function value as each model factory', () => {
    // Internal consistency, no external source.
    expectClose(
      REFRACTING_MODELS.map((name) => refractivityModel(name, OPTICS)(STATE)),
      [ciddorModel(OPTICS)(STATE), edlenModel(OPTICS)(STATE), birchDownsModel(OPTICS)(STATE), radioModel()(STATE)],
      { rel: 1e-15 },
    );
  });

  it("returns n − 1 = 0 for 'none'", () => {
    expect(refractivityModel('none', OPTICS)(STATE)).toBe(0);
  });

  it('defaults to Ciddor at 0.55 µm and 450 ppm CO2', () => {
    // DESIGN.md §4 and the task brief: default model and options.
    expect(DEFAULTS).toEqual({ model: 'ciddor', wavelength_um: 0.55, co2_ppm: 450 });
    expectClose(refractivityModel('ciddor')(STATE), ciddorModel({ wavelength_um: 0.55, co2_ppm: 450 })(STATE), { rel: 1e-15 });
  });

  it('rejects an unknown model name with an InputError naming the field', () => {
    expect(() => refractivityModel('mirage' as IndexModelName, OPTICS)).toThrow(InputError);
    expect(() => refractivityModel('mirage' as IndexModelName, OPTICS)).toThrow(/model.*allowed ciddor/);
  });
});

describe('checkOpticalOptions', () => {
  it('accepts the defaults for every model', () => {
    for (const name of Object.keys(INDEX_MODEL_VALIDITY) as IndexModelName[]) expect(() => checkOpticalOptions(name, DEFAULTS)).not.toThrow();
  });

  it('rejects a wavelength outside 0.3..1.7 µm for the optical models, naming the field and range', () => {
    expect(() => checkOpticalOptions('ciddor', { wavelength_um: 0.25, co2_ppm: 450 }, 'optics.')).toThrow(InputRangeError);
    expect(() => checkOpticalOptions('edlen', { wavelength_um: 2, co2_ppm: 450 })).toThrow(/wavelength_um = 2 .*0\.3\.\.1\.7 µm/);
    expect(() => checkOpticalOptions('birch-downs', { wavelength_um: Number.NaN, co2_ppm: 450 })).toThrow(/wavelength_um = NaN/);
  });

  it('rejects CO2 outside 0..2000 ppm and ignores wavelength and CO2 for the radio model', () => {
    expect(() => checkOpticalOptions('ciddor', { wavelength_um: 0.55, co2_ppm: 2500 })).toThrow(/co2_ppm/);
    expect(() => checkOpticalOptions('radio', { wavelength_um: 1e5, co2_ppm: 2500 })).not.toThrow();
  });
});

describe('refractivity of every model as a function of pressure and temperature', () => {
  // Arbitrary air: T over the accepted column range, relative humidity 0..1, pressure at least
  // twice the vapour pressure and up to 120 kPa.
  const air = fc
    .record({
      temperature_K: fc.double({ min: 180, max: 340, noNaN: true }),
      rh: fc.double({ min: 0, max: 1, noNaN: true }),
      pressureFraction: fc.double({ min: 0, max: 1, noNaN: true }),
      step: fc.double({ min: 0.001, max: 0.2, noNaN: true }),
    })
    .map(({ temperature_K, rh, pressureFraction, step }) => {
      const vapour_pressure_Pa = rh * saturationVapourPressure_Pa(temperature_K);
      const pMin = Math.max(1000, 2 * vapour_pressure_Pa);
      return { state: { temperature_K, pressure_Pa: pMin + pressureFraction * (100_000 - pMin), vapour_pressure_Pa }, step };
    });

  it.each(REFRACTING_MODELS)('%s: n − 1 increases with pressure at fixed temperature and vapour pressure', (name) => {
    // Physical property: refractivity grows with density (Ciddor 1996 Eq. (5); ITU-R P.453 dry term ∝ p).
    const model = refractivityModel(name, DEFAULTS);
    fc.assert(
      fc.property(air, ({ state, step }) => model({ ...state, pressure_Pa: state.pressure_Pa * (1 + step) }) > model(state)),
    );
  });

  it.each(REFRACTING_MODELS)('%s: n − 1 decreases with temperature at fixed pressure and vapour pressure', (name) => {
    // Physical property: at fixed pressure, density falls as 1/T (Ciddor 1996 Eq. (5); ITU-R P.453 terms ∝ 1/T, 1/T²).
    const model = refractivityModel(name, DEFAULTS);
    fc.assert(
      fc.property(air, ({ state, step }) => model({ ...state, temperature_K: state.temperature_K + 20 * step }) < model(state)),
    );
  });

  it.each(['ciddor', 'edlen', 'birch-downs'] as IndexModelName[])('%s: n − 1 decreases with wavelength (normal dispersion)', (name) => {
    // Normal dispersion of air in 0.3..1.7 µm: REFERENCES.md §1.7 columns fall monotonically with wavelength.
    const values = [0.3, 0.4, 0.5, 0.7, 1.0, 1.3, 1.7].map((wavelength_um) => refractivityModel(name, { wavelength_um, co2_ppm: 450 })(STATE));
    for (let i = 1; i < values.length; i++) expect(values[i]).toBeLessThan(values[i - 1]);
  });
});
