import { describe, expect, it } from 'vitest';
import { CELSIUS_OFFSET_K, RAD_PER_DEG } from '../../sim/constants.js';
import {
  MOLAR_MASS_RATIO,
  kinematicViscosityAir_m2_per_s,
  normalGravity_m_per_s2,
  saturationVapourPressureBuck_Pa,
  seaSurfaceSpecificHumidity,
  specificHumidity,
  vapourPressureFromSpecificHumidity_Pa,
} from '../../sim/atmosphere/surface-thermo.js';
import { expectClose } from '../support/close.js';

const K = CELSIUS_OFFSET_K;
/** Values printed with 4 decimals: half a unit of the last digit, relative to values of order 10 (dimensionless). */
const READ_4DP_REL = 1e-5;
/**
 * COARE's qsea uses 622 for M_w/M_d, and the printed qair value also matches 622 although qair now
 * uses 621.97; we use 0.621970: a 5e-5 relative difference, tolerance 1e-4 relative.
 */
const EPSILON_CHOICE_REL = 1e-4;

describe('COARE thermodynamic helpers against the reference code comments (REFERENCES.md §7.3)', () => {
  // Source: NOAA-PSL COARE-algorithm Python/COARE3.5/meteo.py test comments, read in REFERENCES.md §7.3.
  it('gives qsat(25 °C, 1015 mb) = 31.8037 mb (Buck 1981 form)', () => {
    expectClose(saturationVapourPressureBuck_Pa(25 + K, 101_500) / 100, 31.8037, { rel: READ_4DP_REL });
  });
  it('gives qsea(18 °C, 1013 mb) = 12.5615 g/kg', () => {
    expectClose(seaSurfaceSpecificHumidity(18 + K, 101_300) * 1000, 12.5615, { rel: EPSILON_CHOICE_REL });
  });
  it('gives qair(10 °C, 1010 mb, 77 %) = 5.8665 g/kg', () => {
    const e = 0.77 * saturationVapourPressureBuck_Pa(10 + K, 101_000);
    expectClose(specificHumidity(e, 101_000) * 1000, 5.8665, { rel: EPSILON_CHOICE_REL });
  });
  it('gives rhcalc(14 °C, 1013 mb, 9.7121 g/kg) ≈ 98 %', () => {
    const e = vapourPressureFromSpecificHumidity_Pa(9.7121e-3, 101_300);
    // Printed as "98" (integer percent): half a percent.
    expectClose(e / saturationVapourPressureBuck_Pa(14 + K, 101_300), 0.98, { abs: 0.005 });
  });
  it('gives grv(45°) = 9.8062 m/s²', () => {
    expectClose(normalGravity_m_per_s2(45 * RAD_PER_DEG), 9.8062, { abs: 0.5e-4 });
  });
});

describe('COARE thermodynamic helpers: identities', () => {
  it('inverts specific humidity and vapour pressure exactly', () => {
    for (const e of [0, 300, 1500, 4200]) {
      expectClose(vapourPressureFromSpecificHumidity_Pa(specificHumidity(e, 100_800), 100_800), e, { abs: 1e-9 });
    }
  });
  it('uses M_w/M_d = 0.62197 from the molar masses of constants.ts', () => {
    expectClose(MOLAR_MASS_RATIO, 0.62197, { abs: 1e-5 });
  });
  it('gives ν = 1.326e-5 m²/s at 0 °C and a viscosity that grows with temperature', () => {
    expect(kinematicViscosityAir_m2_per_s(K)).toBeCloseTo(1.326e-5, 12);
    expect(kinematicViscosityAir_m2_per_s(30 + K)).toBeGreaterThan(kinematicViscosityAir_m2_per_s(K));
  });
  it('gives equatorial and polar gravity of the GRS 80 series, 9.78033 and 9.83219 m/s²', () => {
    // γe = 9.7803267715 (the series' leading constant); γp = 9.8321863685 (GRS 80, from memory): 1e-6 for the truncated series.
    expectClose(normalGravity_m_per_s2(0), 9.7803267715, { abs: 1e-12 });
    expectClose(normalGravity_m_per_s2(Math.PI / 2), 9.8321863685, { abs: 1e-6 });
  });
});
