import { describe, it } from 'vitest';
import { birchDownsModel, birchDownsStandardAirRefractivity } from '../../sim/refractivity/birch-downs.js';
import { expectClose } from '../support/close.js';
import { dispersionTable, nistTable } from './reference-tables.js';

/** n − 1. NIST prints n to 9 decimals; REFERENCES.md §0 row B suggests ±2e-9. */
const NIST_TOL = 2e-9;
/** (n − 1)×10⁸. REFERENCES.md §1.5/§1.7 print 2–3 decimals; allow one unit of the last digit. */
const BD_TOL_1E8 = 0.01;
/** n − 1. REFERENCES.md §1.5 prints the water term to 4 significant digits (−4.845e-7). */
const WATER_TOL = 0.001e-7;

const WAVELENGTH_633_UM = 0.633;

describe('modified Edlén (Birch & Downs, NIST version) against the NIST EMT table', () => {
  it.each(nistTable().map((row) => [row.label, row] as const))('reproduces n at %s', (_label, row) => {
    // NIST EMT "Index of Refraction of Air", modified-Edlén column (REFERENCES.md §1.3, as transcribed).
    expectClose(birchDownsModel(row.optics)(row.state), row.edlen, { abs: NIST_TOL });
  });
});

describe('modified Edlén building blocks', () => {
  it('gives (n − 1)×10⁸ = 27179.90 for dry air at 20 °C, 101 325 Pa, 633 nm', () => {
    // REFERENCES.md §1.5 check value: independent computation from Birch & Downs 1993/1994.
    const model = birchDownsModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 450 });
    expectClose(model({ temperature_K: 293.15, pressure_Pa: 101_325, vapour_pressure_Pa: 0 }) * 1e8, 27179.9, { abs: BD_TOL_1E8 });
  });

  it("gives Birch & Downs' water term, −4.845e-7 for 1333 Pa at 633 nm, where NIST's 292.75/T factor is 1", () => {
    // REFERENCES.md §1.5: original B&D 1994 water term (independent computation); NIST's factor is 1 at T = 292.75 K.
    const model = birchDownsModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 450 });
    const dry = { temperature_K: 292.75, pressure_Pa: 100_000, vapour_pressure_Pa: 0 };
    expectClose(model({ ...dry, vapour_pressure_Pa: 1333 }) - model(dry), -4.845e-7, { abs: WATER_TOL });
  });

  it('reproduces the dispersion of standard air from 300 to 1550 nm', () => {
    // REFERENCES.md §1.7, B&D column: independent computation.
    const rows = dispersionTable();
    expectClose(rows.map((r) => birchDownsStandardAirRefractivity(r.wavelength_um) * 1e8), rows.map((r) => r.birchDownsAir), {
      abs: 0.001,
    });
  });

  it('scales the dry term by Edlén’s 0.540e-6 per ppm of CO2 away from 450 ppm', () => {
    // Loomline extension documented in birch-downs.ts, coefficient from Edlén 1966 (REFERENCES.md §1.6).
    const state = { temperature_K: 288.15, pressure_Pa: 101_325, vapour_pressure_Pa: 0 };
    const at450 = birchDownsModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 450 })(state);
    const at1450 = birchDownsModel({ wavelength_um: WAVELENGTH_633_UM, co2_ppm: 1450 })(state);
    expectClose(at1450 / at450 - 1, 0.54e-3, { rel: 1e-9 });
  });
});
