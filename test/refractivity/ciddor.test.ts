import { describe, it } from 'vitest';
import { CELSIUS_OFFSET_K } from '../../sim/constants.js';
import {
  ciddorModel,
  ciddorRefractivity,
  ciddorStandardAirRefractivity,
  ciddorStandardVapourRefractivity,
  compressibility,
} from '../../sim/refractivity/ciddor.js';
import { vapourPressureFromRelativeHumidity_Pa } from '../../sim/refractivity/water-vapour.js';
import { expectClose } from '../support/close.js';
import { loadFixture } from './fixture.js';
import { dispersionTable, nistTable } from './reference-tables.js';

/** n − 1, dimensionless. NIST prints n to 9 decimals; REFERENCES.md §0 row A suggests ±2e-9. */
const NIST_TOL = 2e-9;
/** (n − 1)×10⁸. Ciddor's tables print 0.1; ±0.2 as REFERENCES.md §0 row C suggests. */
const CIDDOR_TABLE_TOL_1E8 = 0.2;
/** (n − 1)×10⁸. Table 2 row 2 is reproduced only to 0.3 (REFERENCES.md §1.4, suspected transcription error). */
const CIDDOR_TABLE2_ROW2_TOL_1E8 = 0.5;
/** (n − 1)×10⁸. §1.7 prints 3 decimals; allow one unit of the last digit. */
const DISPERSION_TOL_1E8 = 0.001;
/** Z, dimensionless. NIST's constant is printed to 10 decimals. */
const Z_TOL = 1e-10;

const CO2_STANDARD_PPM = 450;
const WAVELENGTH_633_UM = 0.633;

describe('Ciddor 1996 against the NIST EMT table', () => {
  it.each(nistTable().map((row) => [row.label, row] as const))('reproduces n at %s', (_label, row) => {
    // NIST EMT "Index of Refraction of Air", Ciddor column (REFERENCES.md §1.3, as transcribed).
    expectClose(ciddorModel(row.optics)(row.state), row.ciddor, { abs: NIST_TOL });
  });
});

describe("Ciddor 1996's own tables at 633 nm", () => {
  it('reproduces Table 1 (dry air, 450 ppm)', () => {
    // Ciddor 1996, Applied Optics 35, 1566, Table 1 (REFERENCES.md §1.4, as transcribed).
    const rows = loadFixture('ciddor-1996-table1-dry-air.csv', ['t_C', 'p_kPa', 'refractivity_1e8'], 5);
    const model = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: CO2_STANDARD_PPM });
    const got = rows.map((r) => model({ temperature_K: r.t_C + CELSIUS_OFFSET_K, pressure_Pa: r.p_kPa * 1000, vapour_pressure_Pa: 0 }) * 1e8);
    expectClose(got, rows.map((r) => r.refractivity_1e8), { abs: CIDDOR_TABLE_TOL_1E8 });
  });

  it('reproduces Table 2 (moist air with measured vapour pressure and CO2)', () => {
    // Ciddor 1996, Table 2 (REFERENCES.md §1.4, as transcribed); row 2 with the wider tolerance.
    const rows = loadFixture('ciddor-1996-table2-moist-air.csv', ['t_C', 'p_Pa', 'pw_Pa', 'co2_ppm', 'refractivity_1e8'], 9);
    rows.forEach((r, i) => {
      const state = { temperature_K: r.t_C + CELSIUS_OFFSET_K, pressure_Pa: r.p_Pa, vapour_pressure_Pa: r.pw_Pa };
      const got = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: r.co2_ppm })(state) * 1e8;
      expectClose(got, r.refractivity_1e8, { abs: i === 1 ? CIDDOR_TABLE2_ROW2_TOL_1E8 : CIDDOR_TABLE_TOL_1E8 });
    });
  });

  it("reproduces Table 3 (extreme conditions) with Ciddor's saturation vapour pressure", () => {
    // Ciddor 1996, Table 3 (REFERENCES.md §1.4, as transcribed; row 3 corrected from the paper's typo 19996.5).
    const rows = loadFixture('ciddor-1996-table3-extreme.csv', ['t_C', 'p_kPa', 'rh_percent', 'refractivity_1e8'], 6);
    const model = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: CO2_STANDARD_PPM });
    const got = rows.map((r) => {
      const temperature_K = r.t_C + CELSIUS_OFFSET_K;
      const vapour_pressure_Pa = vapourPressureFromRelativeHumidity_Pa(r.rh_percent / 100, temperature_K);
      return model({ temperature_K, pressure_Pa: r.p_kPa * 1000, vapour_pressure_Pa }) * 1e8;
    });
    expectClose(got, rows.map((r) => r.refractivity_1e8), { abs: CIDDOR_TABLE_TOL_1E8 });
  });
});

describe('Ciddor 1996 building blocks', () => {
  it('gives the compressibility of dry standard air, Z_a = 0.9995922115', () => {
    // NIST EMT Appendix A-III constant (REFERENCES.md §1.1, as transcribed).
    expectClose(compressibility(101_325, 288.15, 0), 0.9995922115, { abs: Z_TOL });
  });

  it('gives the compressibility of standard water vapour, Z_w = 0.99928232', () => {
    // REFERENCES.md §1.1 intermediate value: independent computation (printed to 8 decimals).
    expectClose(compressibility(1333, 293.15, 1), 0.99928232, { abs: 1e-8 });
  });

  it('reproduces the dispersion of dry standard air and of standard water vapour from 300 to 1550 nm', () => {
    // REFERENCES.md §1.7, Ciddor columns: independent computation from Ciddor 1996 Eqs. (1) and (3).
    const rows = dispersionTable();
    expectClose(rows.map((r) => ciddorStandardAirRefractivity(r.wavelength_um) * 1e8), rows.map((r) => r.ciddorAir), {
      abs: DISPERSION_TOL_1E8,
    });
    expectClose(rows.map((r) => ciddorStandardVapourRefractivity(r.wavelength_um) * 1e8), rows.map((r) => r.ciddorVapour), {
      abs: DISPERSION_TOL_1E8,
    });
  });

  it('returns the standard-air refractivity at 15 °C, 101 325 Pa, dry, 450 ppm', () => {
    // Definition of Ciddor's standard air (Ciddor 1996, Eq. (1)): the density ratio is exactly 1 there.
    const model = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: CO2_STANDARD_PPM });
    expectClose(model({ temperature_K: 288.15, pressure_Pa: 101_325, vapour_pressure_Pa: 0 }), ciddorStandardAirRefractivity(WAVELENGTH_633_UM), {
      rel: 1e-14,
    });
  });

  it('raises dry-air refractivity by 0.534e-6 per ppm of CO2 at standard conditions', () => {
    // Ciddor 1996 Eq. (2): (n_axs − 1) = (n_as − 1)[1 + 0.534e-6 (x_c − 450)].
    const state = { temperature_K: 288.15, pressure_Pa: 101_325, vapour_pressure_Pa: 0 };
    const at450 = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 450 })(state);
    const at1450 = ciddorModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 1450 })(state);
    expectClose(at1450 / at450 - 1, 0.534e-3, { rel: 1e-9 });
  });

  it('gives the same value through the one-off function as through the factory', () => {
    // Internal consistency, no external source.
    const state = { temperature_K: 280, pressure_Pa: 95_000, vapour_pressure_Pa: 800 };
    const optics = { wavelength_um: 0.5, co2_ppm: 420 };
    expectClose(ciddorRefractivity(state, optics), ciddorModel(optics)(state), { rel: 1e-15 });
  });
});
