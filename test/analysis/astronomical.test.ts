import { describe, expect, it } from 'vitest';
import { apparentFromTrue_rad, astronomicalRefraction_rad, bodyAppearance } from '../../sim/analysis/astronomical.js';
import { horizon } from '../../sim/analysis/dip.js';
import { InputRangeError } from '../../sim/errors.js';
import { expectClose } from '../support/close.js';
import { R_TEST_M } from './analytic-media.js';
import { layeredAtmosphere, standardAtmosphere, tableOf } from './media.js';

const DEG = Math.PI / 180;
const ARCMIN = DEG / 60;
const ARCSEC = DEG / 3600;

describe('astronomical refraction against published ray traces and tables', () => {
  // SOFA/ERFA eraRefco documentation (liberfa/erfa src/refco.c header; REFERENCES.md §4.5 [read]):
  // ray trace for 1005 mb, 280.15 K, 80 % RH, 574 nm, lapse 0.0065 K/m, latitude 50°, sea level.
  // The model atmosphere is Hohenkerk & Sinclair's (NAO Technical Note 63, 1985): troposphere at
  // that lapse up to 11 km, isothermal above (model details from memory). Latitude enters only
  // through gravity (0.2 % of the scale height, about 0.01″ at ZD 76°), ignored here.
  const sofa = tableOf(layeredAtmosphere([[0, 7], [11_000, 7 - 71.5]], { kind: 'lapse', lapse_K_per_m: 0 }, 1005, 0.8), { wavelength_um: 0.574 });
  const SOFA_TABLE: [number, number][] = [
    [10, 10.27], [20, 21.19], [30, 33.61], [40, 48.82], [45, 58.16], [50, 69.28], [55, 82.97], [60, 100.51],
    [65, 124.23], [70, 158.63], [72, 177.32], [74, 200.35], [76, 229.45], [78, 267.44], [80, 319.13],
  ];
  /** REFERENCES.md §0 row F: ±0.3″ to ZD 76° (the table prints 0.01″; model details differ), ±1″ at 78–80°. */
  const SOFA_TOLERANCE_ARCSEC = 0.3;
  const SOFA_TOLERANCE_LOW_ARCSEC = 1;

  it('has all 15 rows of the SOFA/ERFA ray-trace table', () => {
    expect(SOFA_TABLE.length).toBe(15);
  });
  for (const [zd, want] of SOFA_TABLE) {
    it(`gives ${want}″ at zenith distance ${zd}° (SOFA/ERFA refco documentation, REFERENCES.md §4.5)`, () => {
      const got = (astronomicalRefraction_rad(sofa, 0, (90 - zd) * DEG, R_TEST_M) as number) / ARCSEC;
      expectClose(got, want, { abs: zd <= 76 ? SOFA_TOLERANCE_ARCSEC : SOFA_TOLERANCE_LOW_ARCSEC });
    });
  }

  // US 1976 at 15 °C, 1013.25 hPa, dry, 590 nm, sea level: the Pulkovo tables' standard conditions.
  const pulkovo = tableOf(standardAtmosphere(15), { wavelength_um: 0.59 });

  it('gives a horizontal refraction within 5″ of the Pulkovo tables’ 1977.97″ (REFERENCES.md §4.2, row H)', () => {
    // Pulkovo Refraction Tables, 5th ed. (1985), as quoted (read-2nd): 32′57.97″ for these conditions.
    // ±5″ (REFERENCES.md §0 row H): the tables' model atmosphere is not US 1976 near the ground.
    expectClose((astronomicalRefraction_rad(pulkovo, 0, 0, R_TEST_M) as number) / ARCSEC, 1977.97, { abs: 5 });
  });

  it('follows the Pulkovo Laplace fit 57.085″/tan h − 0.0666″/tan³ h above 20° (REFERENCES.md §4.2)', () => {
    // The fit (read-2nd, with the tables) is good to 0.02″ above 20°; a further 0.03″ allows for the
    // tables' refractivity formula against Ciddor's (common practice, no source).
    const FIT_TOLERANCE_ARCSEC = 0.05;
    for (const h of [20, 30, 45, 60, 80]) {
      const t = Math.tan(h * DEG);
      expectClose((astronomicalRefraction_rad(pulkovo, 0, h * DEG, R_TEST_M) as number) / ARCSEC, 57.085 / t - 0.0666 / t ** 3, {
        abs: FIT_TOLERANCE_ARCSEC,
      });
    }
  });

  it('reproduces the independent ray trace of REFERENCES.md §4.3 from the horizon to 45°', () => {
    // Independent computation (REFERENCES.md §4.3, US 1976 + Ciddor, 590 nm), printed to 0.001′ and
    // converged to 0.02″: tolerance half a printed digit plus that, 0.0005′ + 0.0003′ = 0.001′.
    const rows: [number, number][] = [[0, 32.919], [0.5, 27.577], [1, 23.481], [2, 17.739], [5, 9.639]];
    for (const [h, want] of rows) {
      expectClose((astronomicalRefraction_rad(pulkovo, 0, h * DEG, R_TEST_M) as number) / ARCMIN, want, { abs: 0.001 });
    }
    // Arcsecond rows: 312.5″ and 98.5″ printed to 0.1″ (±0.05″ + 0.02″), 57.02″ to 0.01″ (±0.005″ + 0.02″).
    expectClose((astronomicalRefraction_rad(pulkovo, 0, 10 * DEG, R_TEST_M) as number) / ARCSEC, 312.5, { abs: 0.07 });
    expectClose((astronomicalRefraction_rad(pulkovo, 0, 30 * DEG, R_TEST_M) as number) / ARCSEC, 98.5, { abs: 0.07 });
    expectClose((astronomicalRefraction_rad(pulkovo, 0, 45 * DEG, R_TEST_M) as number) / ARCSEC, 57.02, { abs: 0.025 });
  });

  describe("Bennett's formula as a loose cross-check (Bennett 1982, J. Navigation 35, 255; Meeus eq. 16.3, REFERENCES.md §4.1)", () => {
    // Standard conditions of the formula: 1010 mbar, 10 °C, yellow light (574 nm taken), dry.
    const bennettTable = tableOf(standardAtmosphere(10, 1010), { wavelength_um: 0.574 });
    const bennett_arcmin = (h: number): number => 1 / Math.tan((h + 7.31 / (h + 4.4)) * DEG);
    /** Bennett's stated accuracy, "0.07′ from horizon to zenith" (as transcribed, REFERENCES.md §4.1). */
    const BENNETT_ACCURACY_ARCMIN = 0.07;
    /** "Yellow light" is not a wavelength: 550–590 nm changes R by 0.35 %, ≤ 0.015′ above 15°. */
    const WAVELENGTH_ALLOWANCE_ARCMIN = 0.015;

    it('agrees within Bennett’s 0.07′ (plus the wavelength allowance) from 20° to 60°', () => {
      // Above 15–20° refraction hardly depends on the model atmosphere (Meeus's high-altitude forms
      // 16.1–16.2 start there); measured differences: −0.072′ at 20°, −0.030′ at 45°.
      for (const h of [20, 30, 45, 60]) {
        expectClose((astronomicalRefraction_rad(bennettTable, 0, h * DEG, R_TEST_M) as number) / ARCMIN, bennett_arcmin(h), {
          abs: BENNETT_ACCURACY_ARCMIN + WAVELENGTH_ALLOWANCE_ARCMIN,
        });
      }
    });

    it('agrees at 0.5° (28.754′, Meeus Example 16.a) only as closely as the published tables agree near the horizon', () => {
      // Near the horizon refraction depends on the air near the ground, and the tables differ: Bennett
      // scaled to 15 °C, 1013.25 hPa by Meeus's factor (P/1010)·(283/(273 + T)) gives 33.99′ at 0°,
      // Pulkovo 32.97′ (REFERENCES.md §4.1–4.2): a 1.02′ spread, added to Bennett's 0.07′.
      const TABLE_SPREAD_ARCMIN = 34.4775 * (1013.25 / 1010) * (283 / 288) - 1977.97 / 60;
      const got = (astronomicalRefraction_rad(bennettTable, 0, 0.5 * DEG, R_TEST_M) as number) / ARCMIN;
      expectClose(got, 28.754, { abs: BENNETT_ACCURACY_ARCMIN + TABLE_SPREAD_ARCMIN });
    });
  });
});

describe('refraction as a function of apparent elevation', () => {
  const table = tableOf(standardAtmosphere(15));

  it('vanishes at the zenith and for n ≡ 1', () => {
    expectClose(astronomicalRefraction_rad(table, 10, Math.PI / 2, R_TEST_M) as number, 0, { abs: 1e-13 });
    const vacuum = tableOf(standardAtmosphere(15), { index_model: 'none' });
    for (const e of [-0.001, 0, 0.3, 1.2]) expect(astronomicalRefraction_rad(vacuum, 10, e, R_TEST_M)).toBe(0); // dip from 10 m: 0.0018 rad
  });

  it('is defined below the horizontal down to the dip, and null for rays that meet the sea', () => {
    const dip = horizon(table, 10, R_TEST_M).dip_rad;
    const justAbove = astronomicalRefraction_rad(table, 10, -dip + 1e-7, R_TEST_M) as number;
    const horizontal = astronomicalRefraction_rad(table, 10, 0, R_TEST_M) as number;
    expect(justAbove).toBeGreaterThan(horizontal); // the grazing ray crosses the densest air twice
    expect(astronomicalRefraction_rad(table, 10, -dip - 1e-7, R_TEST_M)).toBeNull();
  });

  it('decreases monotonically from the horizon to the zenith in normal air', () => {
    let previous = Infinity;
    for (let e = 0; e <= 90; e += 2.5) {
      const r = astronomicalRefraction_rad(table, 10, e * DEG, R_TEST_M) as number;
      expect(r).toBeLessThan(previous);
      previous = r;
    }
  });

  it('inverts: apparent from true elevation returns the apparent elevation it came from', () => {
    const dip = horizon(table, 10, R_TEST_M).dip_rad;
    for (const apparent of [-dip + 1e-6, -0.05 * DEG, 0, 0.3 * DEG, 5 * DEG, 45 * DEG, 89 * DEG]) {
      const trueElevation = apparent - (astronomicalRefraction_rad(table, 10, apparent, R_TEST_M) as number);
      // The root is bracketed to 1e-13 rad; the refraction's slope near the horizon amplifies that little.
      expectClose(apparentFromTrue_rad(table, 10, trueElevation, R_TEST_M) as number, apparent, { abs: 1e-11 });
    }
  });

  it('returns null for a source below every ray that leaves the atmosphere', () => {
    expect(apparentFromTrue_rad(table, 10, -2 * DEG, R_TEST_M)).toBeNull();
  });

  it('rejects elevations outside ±90° and bad heights, naming the field', () => {
    expect(() => astronomicalRefraction_rad(table, 10, 2, R_TEST_M)).toThrow(InputRangeError);
    expect(() => astronomicalRefraction_rad(table, 10, 2, R_TEST_M)).toThrow(/apparentElevation_rad/);
    expect(() => apparentFromTrue_rad(table, 10, Number.NaN, R_TEST_M)).toThrow(/trueElevation_rad/);
    expect(() => astronomicalRefraction_rad(table, -5, 0, R_TEST_M)).toThrow(/observerHeight_m/);
  });
});

describe('the appearance of the Sun and the Moon near the horizon', () => {
  const table = tableOf(standardAtmosphere(15));
  const SUN_AND_MOON = [{ true_elevation_rad: -0.4 * DEG }, { true_elevation_rad: 0.4 * DEG }]; // 180° apart

  it('shows both of two bodies 180° apart when refraction lifts the lower one, though geometry alone would hide it', () => {
    const [sun, moon] = bodyAppearance(table, 2, SUN_AND_MOON, R_TEST_M);
    expect(sun.above_horizon).toBe(true);
    expect(moon.above_horizon).toBe(true);
    const vacuum = tableOf(standardAtmosphere(15), { index_model: 'none' });
    const [sunNoAir, moonNoAir] = bodyAppearance(vacuum, 2, SUN_AND_MOON, R_TEST_M);
    expect(sunNoAir.above_horizon).toBe(false); // upper limb at −0.135°, below the 0.045° dip from 2 m
    expect(moonNoAir.above_horizon).toBe(true);
  });

  it('places each limb where true = apparent − refraction, and flattens the disc near the horizon', () => {
    const [, moon] = bodyAppearance(table, 2, SUN_AND_MOON, R_TEST_M);
    const half = moon.angular_diameter_rad / 2;
    for (const [limb, trueElevation] of [
      [moon.upper_limb_elevation_rad as number, 0.4 * DEG + half],
      [moon.lower_limb_elevation_rad as number, 0.4 * DEG - half],
    ]) {
      const refraction = astronomicalRefraction_rad(table, 2, limb, R_TEST_M) as number;
      expectClose(limb - refraction, trueElevation, { abs: 1e-11 });
    }
    // Refraction falls by several arcminutes across a low disc (REFERENCES.md §4.3: 32.9′ at 0°, 27.6′ at 0.5°).
    expect(moon.flattening as number).toBeGreaterThan(0.75);
    expect(moon.flattening as number).toBeLessThan(0.95);
  });

  it('reports a hidden lower limb as null and no flattening', () => {
    // From 2 m the lowest escaping ray comes from about −0.62° true (dip 2.5′ + refraction ≈ 34.5′).
    const [low] = bodyAppearance(table, 2, [{ true_elevation_rad: -0.7 * DEG }], R_TEST_M);
    expect(low.above_horizon).toBe(true);
    expect(low.lower_limb_elevation_rad).toBeNull();
    expect(low.flattening).toBeNull();
  });
});
