/**
 * Reference tables shared by several refractivity tests.
 *
 * nistTable: the NIST EMT 14-row comparison table (REFERENCES.md §1.3) as air states, for the
 * Ciddor and modified-Edlén tests. Humidity follows NIST (REFERENCES.md §1.2): p_v = RH · svp_IAPWS(T); the
 * enhancement factor enters only Ciddor's mole fraction, inside the model.
 *
 * dispersionTable: (n − 1)×10⁸ of the standard airs against wavelength (REFERENCES.md §1.7,
 * independent computation), for the Ciddor, Edlén and Birch & Downs tests.
 */
import { CELSIUS_OFFSET_K } from '../../sim/constants.js';
import type { AirState, OpticalOptions } from '../../sim/refractivity/types.js';
import { saturationVapourPressureIapws_Pa, vapourPressureFromRelativeHumidity_Pa } from '../../sim/refractivity/water-vapour.js';
import { loadFixture } from './fixture.js';

/** CO2 of every NIST table row, ppm (REFERENCES.md §1.3). */
const NIST_TABLE_CO2_PPM = 450;

export interface NistRow {
  label: string;
  state: AirState;
  optics: OpticalOptions;
  /** n − 1 by Ciddor, as NIST prints it. */
  ciddor: number;
  /** n − 1 by NIST's modified Edlén, as NIST prints it. */
  edlen: number;
}

export function nistTable(): NistRow[] {
  const columns = ['t_C', 'rh_percent', 'p_kPa', 'wavelength_nm', 'n_ciddor', 'n_edlen'] as const;
  return loadFixture('nist-index-of-air-ciddor-vs-edlen.csv', columns, 14).map((row) => {
    const temperature_K = row.t_C + CELSIUS_OFFSET_K;
    return {
      label: `${row.t_C} °C, ${row.rh_percent} %RH, ${row.p_kPa} kPa, ${row.wavelength_nm} nm`,
      state: {
        temperature_K,
        pressure_Pa: row.p_kPa * 1000,
        vapour_pressure_Pa: vapourPressureFromRelativeHumidity_Pa(row.rh_percent / 100, temperature_K, saturationVapourPressureIapws_Pa),
      },
      optics: { wavelength_um: row.wavelength_nm / 1000, co2_ppm: NIST_TABLE_CO2_PPM },
      ciddor: row.n_ciddor - 1,
      edlen: row.n_edlen - 1,
    };
  });
}

/** REFERENCES.md §1.7 rows: wavelength in µm and (n − 1)×10⁸ per model's standard air. */
export function dispersionTable(): { wavelength_um: number; ciddorAir: number; ciddorVapour: number; edlenAir: number; birchDownsAir: number }[] {
  const columns = ['wavelength_nm', 'ciddor_air_1e8', 'ciddor_vapour_1e8', 'edlen_air_1e8', 'birch_downs_air_1e8'] as const;
  return loadFixture('standard-air-dispersion.csv', columns, 10).map((r) => ({
    wavelength_um: r.wavelength_nm / 1000,
    ciddorAir: r.ciddor_air_1e8,
    ciddorVapour: r.ciddor_vapour_1e8,
    edlenAir: r.edlen_air_1e8,
    birchDownsAir: r.birch_downs_air_1e8,
  }));
}
